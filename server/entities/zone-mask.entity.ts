import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** A zone's grid mask for one grid geometry, computed once and kept. */
@Entity({ name: "zone_masks" })
@Index("idx_zone_masks_zone_grid", ["zoneId", "geometryKey"], { unique: true })
export class ZoneMaskEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ name: "zone_id", type: "integer" })
  zoneId!: number;

  @Column({ name: "geometry_key", type: "varchar", length: 200 })
  geometryKey!: string;

  /** The zone's updatedAt when the mask was made; a different value means the mask is stale. */
  @Column({ name: "zone_updated_at", type: "varchar", length: 30 })
  zoneUpdatedAt!: string;

  @Column({ name: "point_count", type: "integer" })
  pointCount!: number;

  /** One byte per grid point, canonical order. */
  @Column({ type: "blob" })
  mask!: Buffer;
}
