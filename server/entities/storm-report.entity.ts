import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import type { StormReportKind } from "../../shared/storm-reports/storm-report-kinds.ts";

/** One observed severe-weather report (tornado, hail or wind), the ground truth rules are scored against. */
@Entity({ name: "storm_reports" })
@Index("idx_storm_reports_kind_time", ["kind", "time"])
export class StormReportEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  /** ISO instant, UTC. */
  @Index("idx_storm_reports_time")
  @Column({ type: "varchar", length: 30 })
  time!: string;

  @Column({ type: "real" })
  latitude!: number;

  @Column({ type: "real" })
  longitude!: number;

  @Column({ type: "varchar", length: 12 })
  kind!: StormReportKind;

  /** As reported, in `magnitudeUnit`. */
  @Column({ type: "real", nullable: true })
  magnitude!: number | null;

  @Column({ name: "magnitude_unit", type: "varchar", length: 8, nullable: true })
  magnitudeUnit!: string | null;

  /** Hail diameter (m), wind gust (m/s) or tornado EF rating. */
  @Column({ name: "magnitude_si", type: "real", nullable: true })
  magnitudeSi!: number | null;

  @Column({ type: "varchar", length: 500 })
  remarks!: string;

  /** The uploaded file's name, or "demo". */
  @Column({ type: "varchar", length: 200 })
  source!: string;

  /** Invented demo data, marked so on every screen. */
  @Column({ type: "boolean", default: false })
  invented!: boolean;

  @Column({ name: "uploaded_by", type: "varchar", length: 64, nullable: true })
  uploadedBy!: string | null;

  @Column({ name: "uploaded_at", type: "varchar", length: 30 })
  uploadedAt!: string;
}
