import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** A model run, named by its model and initial (run) time. */
@Entity({ name: "model_runs" })
@Index("idx_model_runs_model_time", ["model", "runTime"], { unique: true })
export class ModelRunEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ type: "varchar", length: 60 })
  model!: string;

  /** ISO UTC initial time. */
  @Column({ name: "run_time", type: "varchar", length: 30 })
  runTime!: string;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;
}
