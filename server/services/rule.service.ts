import type { DataSource, EntityManager } from "typeorm";
import type { CreateRuleInput, RuleDefinition, RuleDto, RuleVersionDto, UpdateRuleInput } from "../../shared/api/rules.ts";
import { RuleEntity } from "../entities/rule.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { NotFoundError, ValidationError } from "../errors.ts";
import type { ZoneService } from "./zone.service.ts";

export function toVersionDto(v: RuleVersionEntity): RuleVersionDto {
  return { id: v.id, version: v.version, definition: JSON.parse(v.definition) as RuleDefinition, createdBy: v.createdBy, createdAt: v.createdAt, changeNote: v.changeNote };
}

/** Rules and their immutable versions. Every saved edit appends a version; nothing is overwritten. */
export class RuleService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly zones: ZoneService,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async list(includeDisabled = true): Promise<RuleDto[]> {
    const rules = await this.dataSource.getRepository(RuleEntity).find({ where: includeDisabled ? { archived: false } : { archived: false, enabled: true }, order: { name: "ASC" } });
    const result: RuleDto[] = [];
    for (const r of rules) result.push(await this.toDto(r));
    return result;
  }

  async get(id: number): Promise<RuleDto> {
    return this.toDto(await this.find(id));
  }

  async versions(id: number): Promise<RuleVersionDto[]> {
    await this.find(id, true);
    const rows = await this.dataSource.getRepository(RuleVersionEntity).find({ where: { ruleId: id }, order: { version: "DESC" } });
    return rows.map(toVersionDto);
  }

  async version(versionId: number): Promise<RuleVersionEntity> {
    const v = await this.dataSource.getRepository(RuleVersionEntity).findOne({ where: { id: versionId } });
    if (!v) throw new NotFoundError(`Rule version ${versionId}`);
    return v;
  }

  /** Enabled rules with their current version, for evaluation. */
  async activeVersions(): Promise<Array<{ rule: RuleEntity; version: RuleVersionEntity; definition: RuleDefinition }>> {
    const rules = await this.dataSource.getRepository(RuleEntity).find({ where: { archived: false, enabled: true } });
    const out = [];
    for (const rule of rules) {
      if (!rule.currentVersionId) continue;
      const version = await this.version(rule.currentVersionId);
      out.push({ rule, version, definition: JSON.parse(version.definition) as RuleDefinition });
    }
    return out;
  }

  async create(actor: AuditActor, input: CreateRuleInput): Promise<RuleDto> {
    await this.assertZonesExist(input.zoneIds);
    const id = await writeTransaction(this.dataSource, async (m) => {
      const now = this.now().toISOString();
      const rule = await m.getRepository(RuleEntity).save(
        m.getRepository(RuleEntity).create({ name: input.name, enabled: input.enabled, currentVersionId: null, archived: false, createdBy: actor.username, createdAt: now, updatedAt: now }),
      );
      const version = await this.appendVersion(m, actor, rule, input, "First version", 1);
      await appendAudit(m, actor, { action: "rule.created", targetType: "rule", targetId: rule.id, after: { version: version.version, definition: input } });
      return rule.id;
    });
    return this.get(id);
  }

  async update(actor: AuditActor, id: number, input: UpdateRuleInput): Promise<RuleDto> {
    await this.assertZonesExist(input.zoneIds);
    const { changeNote, ...definition } = input;
    await writeTransaction(this.dataSource, async (m) => {
      const rule = await m.getRepository(RuleEntity).findOne({ where: { id, archived: false } });
      if (!rule) throw new NotFoundError(`Rule ${id}`);
      const previous = rule.currentVersionId ? await m.getRepository(RuleVersionEntity).findOneByOrFail({ id: rule.currentVersionId }) : null;
      const before = previous ? (JSON.parse(previous.definition) as RuleDefinition) : null;
      if (before && JSON.stringify(before) === JSON.stringify(definition)) throw new ValidationError("Nothing changed: the rule already reads exactly like this.");
      const version = await this.appendVersion(m, actor, rule, definition, changeNote, (previous?.version ?? 0) + 1);
      await appendAudit(m, actor, { action: "rule.updated", targetType: "rule", targetId: id, before: before && { version: previous!.version, definition: before }, after: { version: version.version, definition, changeNote } });
    });
    return this.get(id);
  }

  /** Turning a rule on or off is an edit like any other: a new version records who and why. */
  async setEnabled(actor: AuditActor, id: number, enabled: boolean, changeNote: string): Promise<RuleDto> {
    const current = (await this.get(id)).current.definition;
    return this.update(actor, id, { ...current, enabled, changeNote: changeNote || (enabled ? "Turned on" : "Turned off") });
  }

  async archive(actor: AuditActor, id: number): Promise<void> {
    await writeTransaction(this.dataSource, async (m) => {
      const rule = await m.getRepository(RuleEntity).findOne({ where: { id, archived: false } });
      if (!rule) throw new NotFoundError(`Rule ${id}`);
      await m.getRepository(RuleEntity).update({ id }, { archived: true, enabled: false, updatedAt: this.now().toISOString() });
      await appendAudit(m, actor, { action: "rule.archived", targetType: "rule", targetId: id, before: { name: rule.name } });
    });
  }

  async find(id: number, includeArchived = false): Promise<RuleEntity> {
    const rule = await this.dataSource.getRepository(RuleEntity).findOne({ where: includeArchived ? { id } : { id, archived: false } });
    if (!rule) throw new NotFoundError(`Rule ${id}`);
    return rule;
  }

  private async appendVersion(m: EntityManager, actor: AuditActor, rule: RuleEntity, definition: RuleDefinition, changeNote: string, version: number): Promise<RuleVersionEntity> {
    const now = this.now().toISOString();
    const row = await m.getRepository(RuleVersionEntity).save(
      m.getRepository(RuleVersionEntity).create({ ruleId: rule.id, version, definition: JSON.stringify(definition), createdBy: actor.username, createdAt: now, changeNote }),
    );
    await m.getRepository(RuleEntity).update({ id: rule.id }, { currentVersionId: row.id, name: definition.name, enabled: definition.enabled, updatedAt: now });
    return row;
  }

  private async assertZonesExist(zoneIds: readonly number[]): Promise<void> {
    const found = await this.zones.findMany(zoneIds);
    const live = new Set(found.filter((z) => !z.archived).map((z) => z.id));
    const missing = zoneIds.filter((id) => !live.has(id));
    if (missing.length) throw new ValidationError(`Unknown or archived zone(s): ${missing.join(", ")}.`, { issues: [{ field: "zoneIds", message: `Unknown zone ids ${missing.join(", ")}` }] });
  }

  private async toDto(rule: RuleEntity): Promise<RuleDto> {
    const version = await this.version(rule.currentVersionId!);
    const current = toVersionDto(version);
    const zones = await Promise.all(current.definition.zoneIds.map((id) => this.zones.get(id).catch(() => null)));
    const emptyZoneIds = zones.filter((z) => z && z.coversNothing).map((z) => z!.id);
    return { id: rule.id, name: rule.name, enabled: rule.enabled, createdBy: rule.createdBy, createdAt: rule.createdAt, updatedAt: rule.updatedAt, current, emptyZoneIds };
  }
}
