import path from "node:path";
import type { DataSource } from "typeorm";
import type { GridGeometry } from "../../shared/grid/geometry-types.ts";
import { FieldInfoEntity } from "../entities/field-info.entity.ts";
import type { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { readFieldFile } from "../grids/field-file.ts";

/** A frame's stored fields, read from disk once each and kept while the frame is being evaluated. */
export class FrameFields {
  private readonly loaded = new Map<string, Float32Array>();
  private available: Map<string, string> | null = null;
  readonly geometry: GridGeometry;
  readonly pointCount: number;

  constructor(
    private readonly dataSource: DataSource,
    private readonly dataDir: string,
    readonly frame: GridFrameEntity,
  ) {
    this.geometry = JSON.parse(frame.geometry) as GridGeometry;
    this.pointCount = this.geometry.nx * this.geometry.ny;
  }

  /** Loads the given keys; returns the ones the frame does not have. */
  async load(keys: readonly string[]): Promise<string[]> {
    if (!this.available) {
      const infos = await this.dataSource.getRepository(FieldInfoEntity).find({ where: { frameId: this.frame.id }, select: { key: true, file: true } });
      this.available = new Map(infos.map((i) => [i.key, i.file]));
    }
    const missing: string[] = [];
    for (const key of keys) {
      if (this.loaded.has(key)) continue;
      const file = this.available.get(key);
      if (!file) {
        missing.push(key);
        continue;
      }
      this.loaded.set(key, readFieldFile(path.join(this.dataDir, this.frame.folder, file), this.pointCount));
    }
    return missing;
  }

  /** A loaded field (call load first). */
  get(key: string): Float32Array | undefined {
    return this.loaded.get(key);
  }
}
