import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** Metadata of one stored field of a frame (the values are a little-endian Float32 file). */
@Entity({ name: "field_infos" })
@Index("idx_field_infos_frame_key", ["frameId", "key"], { unique: true })
export class FieldInfoEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ name: "frame_id", type: "integer" })
  frameId!: number;

  /** Catalogue key, or an input-field key such as `t_500` for stored model fields. */
  @Column({ type: "varchar", length: 60 })
  key!: string;

  @Column({ type: "varchar", length: 30 })
  unit!: string;

  @Column({ type: "real", nullable: true })
  min!: number | null;

  @Column({ type: "real", nullable: true })
  max!: number | null;

  @Column({ name: "nan_count", type: "integer" })
  nanCount!: number;

  @Column({ type: "varchar", length: 300 })
  file!: string;
}
