import type { Logger } from "pino";
import { decodeMaskBits } from "../../shared/grid/mask-bits.ts";
import type { GridGeometry } from "../../shared/grid/geometry-types.ts";
import type { TriggerDetailDto } from "../../shared/api/triggers.ts";
import { severityLevel } from "../../shared/rules/severity.ts";
import type { NotificationEntity } from "../entities/notification.entity.ts";
import type { TriggerService } from "../services/trigger.service.ts";
import type { ZoneService } from "../services/zone.service.ts";
import type { RuleMapService } from "../rules/rule-map.service.ts";
import type { NotifySettingsService } from "./notify-settings.service.ts";
import type { OutgoingMail, OutgoingSms } from "./channels/channel-types.ts";
import { renderMatchPng } from "./content/mask-png.ts";
import { triggerFacts } from "./content/trigger-facts.ts";
import { digestEmail, MAP_CID, triggerEmail } from "./content/email-message.ts";
import { digestSms, triggerSms } from "./content/sms-message.ts";

export interface MessageBuilderDeps {
  triggers: TriggerService;
  zones: ZoneService;
  ruleMaps: RuleMapService;
  settings: NotifySettingsService;
  timeZone: string;
  logger: Logger;
  /** Base URL for links; may change once the server knows its port. */
  publicUrl: () => string;
}

/**
 * The id a resend repeats: the idempotency key plus the row's creation time, so the same row always
 * gives the same id while a new database (keys restart at trigger 1) never reuses an old one.
 */
export function stableMessageKey(row: Pick<NotificationEntity, "idempotencyKey" | "createdAt">): string {
  return `${row.idempotencyKey}.${Date.parse(row.createdAt)}`;
}

/** Builds the e-mail or text for an outbox row from the trigger as it stands now. */
export class MessageBuilder {
  constructor(private readonly deps: MessageBuilderDeps) {}

  async mail(row: NotificationEntity): Promise<OutgoingMail> {
    const templates = (await this.deps.settings.get()).templates;
    const host = new URL(this.deps.publicUrl()).hostname || "bellwether.localhost";
    const base = { to: row.address, messageId: `<${stableMessageKey(row)}@${host}>`, triggerIds: row.triggerIds };
    if (row.template === "digest") {
      const facts = await this.factsFor(row.triggerIds, row);
      return { ...base, ...digestEmail(facts, templates, row.recipientName, this.timelineLink()), attachments: [] };
    }
    const detail = await this.deps.triggers.detail(row.triggerId!);
    const facts = triggerFacts(detail, { change: row.change, level: row.level, publicUrl: this.deps.publicUrl(), timeZone: this.deps.timeZone });
    const map = await this.mapPng(detail);
    const body = triggerEmail(facts, templates, map !== null);
    return { ...base, ...body, attachments: map ? [{ filename: "trigger-map.png", content: map, contentType: "image/png", cid: MAP_CID }] : [] };
  }

  async sms(row: NotificationEntity): Promise<OutgoingSms> {
    const base = { to: row.address, idempotencyKey: stableMessageKey(row), triggerIds: row.triggerIds };
    if (row.template === "digest") return { ...base, body: digestSms(await this.factsFor(row.triggerIds, row), this.timelineLink()) };
    const templates = (await this.deps.settings.get()).templates;
    const summary = (await this.deps.triggers.summaries([await this.deps.triggers.find(row.triggerId!)]))[0]!;
    return { ...base, body: triggerSms(triggerFacts(summary, { change: row.change, level: row.level, publicUrl: this.deps.publicUrl(), timeZone: this.deps.timeZone }), templates) };
  }

  private timelineLink(): string {
    return `${this.deps.publicUrl().replace(/\/+$/, "")}/`;
  }

  private async factsFor(triggerIds: number[], row: NotificationEntity) {
    const found = [];
    for (const id of triggerIds) found.push(await this.deps.triggers.find(id));
    const summaries = await this.deps.triggers.summaries(found);
    return summaries.map((s) => triggerFacts(s, { change: "opened", level: row.level, publicUrl: this.deps.publicUrl(), timeZone: this.deps.timeZone }));
  }

  /**
   * The map of the frame where the trigger matched most widely in its newest run. A map is a help,
   * not a must: any failure (grid pruned, field missing) leaves it out and the message still goes.
   */
  private async mapPng(detail: TriggerDetailDto): Promise<Buffer | null> {
    try {
      const met = detail.frames.filter((f) => f.met);
      const newestRun = met.reduce((latest, f) => (f.runTime > latest ? f.runTime : latest), "");
      const best = met.filter((f) => f.runTime === newestRun).sort((a, b) => b.matchedPoints - a.matchedPoints)[0];
      if (!best) return null;
      const area = await this.deps.ruleMaps.triggerMask(detail.id, best.frameId);
      const geometry = area.geometry as GridGeometry;
      const n = geometry.nx * geometry.ny;
      const zone = await this.deps.zones.maskFor(detail.zone.id, geometry);
      const matched = area.mask ? decodeMaskBits(area.mask, n) : null;
      return renderMatchPng({ nx: geometry.nx, ny: geometry.ny, zone, matched, matchColour: severityLevel(detail.severity).colour });
    } catch (err) {
      this.deps.logger.warn({ err, triggerId: detail.id }, "no map for the notification");
      return null;
    }
  }
}
