import type { DataSource, EntityManager } from "typeorm";
import { In } from "typeorm";
import type { GridGeometry } from "../../shared/grid/geometry-types.ts";
import { geometryKey } from "../../shared/grid/geometry-key.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";
import { zoneGeometryProblems, zoneMask, type ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import type { CreateZoneInput, UpdateZoneInput, ZoneDto } from "../../shared/api/zones.ts";
import { ZoneEntity } from "../entities/zone.entity.ts";
import { ZoneMaskEntity } from "../entities/zone-mask.entity.ts";
import { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { ConflictError, NotFoundError, ValidationError } from "../errors.ts";

const view = (z: ZoneEntity) => ({ code: z.code, name: z.name, geometry: JSON.parse(z.geometry) as ZoneGeometry });

function assertValidGeometry(label: string, geometry: ZoneGeometry): void {
  const problems = zoneGeometryProblems(geometry);
  if (problems.length > 0) throw new ValidationError(`Zone ${label}: ${problems[0]}`, { problems });
}

/** Forecast zones, and their grid masks computed once per grid geometry. */
export class ZoneService {
  /** In-memory copy of masks in use: key = zoneId|updatedAt|geometryKey. */
  private readonly masks = new Map<string, Uint8Array>();

  constructor(
    private readonly dataSource: DataSource,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async list(): Promise<ZoneDto[]> {
    const zones = await this.dataSource.getRepository(ZoneEntity).find({ where: { archived: false }, order: { code: "ASC" } });
    const grids = await this.storedGrids();
    const result: ZoneDto[] = [];
    for (const z of zones) result.push(await this.toDto(z, grids));
    return result;
  }

  async get(id: number): Promise<ZoneDto> {
    return this.toDto(await this.find(id), await this.storedGrids());
  }

  async create(actor: AuditActor, input: CreateZoneInput): Promise<ZoneDto> {
    assertValidGeometry(input.code, input.geometry);
    const zone = await writeTransaction(this.dataSource, (m) => this.insert(m, actor, input));
    return this.get(zone.id);
  }

  /** Creates every zone of a FeatureCollection, or none of them if any is invalid. */
  async importMany(actor: AuditActor, zones: CreateZoneInput[]): Promise<ZoneDto[]> {
    const problems = zones.flatMap((z) => zoneGeometryProblems(z.geometry).map((p) => `${z.code}: ${p}`));
    const codes = zones.map((z) => z.code.toUpperCase());
    const repeated = codes.filter((c, i) => codes.indexOf(c) !== i);
    if (repeated.length) problems.push(`The collection repeats the code(s) ${[...new Set(repeated)].join(", ")}`);
    if (problems.length > 0) throw new ValidationError(`The upload was refused: ${problems[0]}`, { problems });
    const created = await writeTransaction(this.dataSource, async (m) => {
      const out: ZoneEntity[] = [];
      for (const z of zones) out.push(await this.insert(m, actor, z));
      return out;
    });
    const grids = await this.storedGrids();
    return Promise.all(created.map((z) => this.toDto(z, grids)));
  }

  async update(actor: AuditActor, id: number, input: UpdateZoneInput): Promise<ZoneDto> {
    if (input.geometry) assertValidGeometry(input.code ?? String(id), input.geometry);
    await writeTransaction(this.dataSource, async (m) => {
      const repo = m.getRepository(ZoneEntity);
      const zone = await repo.findOne({ where: { id, archived: false } });
      if (!zone) throw new NotFoundError(`Zone ${id}`);
      const before = view(zone);
      if (input.code !== undefined && input.code.toUpperCase() !== zone.code) await this.assertCodeFree(m, input.code.toUpperCase());
      if (input.code !== undefined) zone.code = input.code.toUpperCase();
      if (input.name !== undefined) zone.name = input.name;
      if (input.geometry !== undefined) {
        zone.geometry = JSON.stringify(input.geometry);
        zone.updatedAt = this.now().toISOString();
        await m.getRepository(ZoneMaskEntity).delete({ zoneId: id });
      }
      await repo.save(zone);
      await appendAudit(m, actor, { action: "zone.updated", targetType: "zone", targetId: id, before, after: view(zone) });
    });
    return this.get(id);
  }

  /** Zones are archived, not deleted: triggers and rule versions keep pointing at them. */
  async archive(actor: AuditActor, id: number): Promise<void> {
    await writeTransaction(this.dataSource, async (m) => {
      const zone = await m.getRepository(ZoneEntity).findOne({ where: { id, archived: false } });
      if (!zone) throw new NotFoundError(`Zone ${id}`);
      zone.archived = true;
      zone.code = `${zone.code}~${zone.id}`.slice(0, 20);
      await m.getRepository(ZoneEntity).save(zone);
      await appendAudit(m, actor, { action: "zone.archived", targetType: "zone", targetId: id, before: view(zone) });
    });
  }

  /** The zone's mask on a grid: from memory, else the database, else computed and stored. */
  async maskFor(zoneId: number, geometry: GridGeometry): Promise<Uint8Array> {
    const zone = await this.find(zoneId, true);
    const key = geometryKey(geometry);
    const memoKey = `${zoneId}|${zone.updatedAt}|${key}`;
    const cached = this.masks.get(memoKey);
    if (cached) return cached;
    const repo = this.dataSource.getRepository(ZoneMaskEntity);
    const stored = await repo.findOne({ where: { zoneId, geometryKey: key } });
    let mask: Uint8Array;
    if (stored && stored.zoneUpdatedAt === zone.updatedAt) {
      mask = new Uint8Array(stored.mask);
    } else {
      const { lat, lon } = gridCoordinates(geometry);
      mask = zoneMask(JSON.parse(zone.geometry) as ZoneGeometry, lat, lon);
      let points = 0;
      for (const v of mask) points += v;
      await writeTransaction(this.dataSource, async (m) => {
        await m.getRepository(ZoneMaskEntity).delete({ zoneId, geometryKey: key });
        await m.getRepository(ZoneMaskEntity).save({ zoneId, geometryKey: key, zoneUpdatedAt: zone.updatedAt, pointCount: points, mask: Buffer.from(mask) });
      });
    }
    this.masks.set(memoKey, mask);
    return mask;
  }

  async find(id: number, includeArchived = false): Promise<ZoneEntity> {
    const zone = await this.dataSource.getRepository(ZoneEntity).findOne({ where: includeArchived ? { id } : { id, archived: false } });
    if (!zone) throw new NotFoundError(`Zone ${id}`);
    return zone;
  }

  async findMany(ids: readonly number[]): Promise<ZoneEntity[]> {
    return ids.length ? this.dataSource.getRepository(ZoneEntity).find({ where: { id: In([...ids]) } }) : [];
  }

  private async insert(m: EntityManager, actor: AuditActor, input: CreateZoneInput): Promise<ZoneEntity> {
    const code = input.code.toUpperCase();
    await this.assertCodeFree(m, code);
    const now = this.now().toISOString();
    const zone = await m.getRepository(ZoneEntity).save(
      m.getRepository(ZoneEntity).create({ code, name: input.name, geometry: JSON.stringify(input.geometry), archived: false, createdAt: now, updatedAt: now }),
    );
    await appendAudit(m, actor, { action: "zone.created", targetType: "zone", targetId: zone.id, after: view(zone) });
    return zone;
  }

  private async assertCodeFree(m: EntityManager, code: string): Promise<void> {
    if (await m.getRepository(ZoneEntity).exists({ where: { code } })) throw new ConflictError(`A zone with code ${code} already exists.`);
  }

  /** One geometry per distinct stored grid. */
  private async storedGrids(): Promise<GridGeometry[]> {
    const rows = await this.dataSource.getRepository(GridFrameEntity).createQueryBuilder("f").select("f.geometry_key", "key").addSelect("MAX(f.geometry)", "geometry").groupBy("f.geometry_key").getRawMany<{ key: string; geometry: string }>();
    return rows.map((r) => JSON.parse(r.geometry) as GridGeometry);
  }

  private async toDto(zone: ZoneEntity, grids: GridGeometry[]): Promise<ZoneDto> {
    const coverage: ZoneDto["coverage"] = [];
    for (const g of grids) {
      const mask = await this.maskFor(zone.id, g);
      let points = 0;
      for (const v of mask) points += v;
      coverage.push({ geometryKey: geometryKey(g), points });
    }
    return { id: zone.id, ...view(zone), createdAt: zone.createdAt, updatedAt: zone.updatedAt, coverage, coversNothing: coverage.some((c) => c.points === 0) };
  }
}
