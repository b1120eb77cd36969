import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** A forecast zone: a GeoJSON polygon with the office's own code and name. */
@Entity({ name: "zones" })
export class ZoneEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Index("idx_zones_code", { unique: true })
  @Column({ type: "varchar", length: 20 })
  code!: string;

  @Column({ type: "varchar", length: 120 })
  name!: string;

  /** GeoJSON Polygon or MultiPolygon geometry. */
  @Column({ type: "text" })
  geometry!: string;

  @Column({ type: "boolean", default: false })
  archived!: boolean;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;

  /** Changes with the shape, so cached masks know when they are stale. */
  @Column({ name: "updated_at", type: "varchar", length: 30 })
  updatedAt!: string;
}
