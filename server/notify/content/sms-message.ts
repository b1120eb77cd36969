import { renderTemplate } from "../../../shared/notify/template.ts";
import type { TemplateKey } from "../../../shared/api/notifications.ts";
import { templateValues, type TriggerFacts } from "./trigger-facts.ts";

/** Two standard 160-character segments: the most a text may take. */
export const SMS_MAX_LENGTH = 320;

/**
 * Fits a text within SMS_MAX_LENGTH without ever cutting the link: the words before the link are
 * shortened (ending in "...", plain ASCII so the text stays in the 7-bit alphabet) and the link
 * goes last.
 */
export function fitSms(body: string, link: string, max = SMS_MAX_LENGTH): string {
  const compact = body.replace(/\s+/g, " ").trim();
  if (compact.length <= max) return compact;
  const withoutLink = compact.split(link).join(" ").replace(/\s+/g, " ").trim();
  const room = max - link.length - 4;
  if (room <= 0) return link.slice(0, max);
  return `${withoutLink.slice(0, room).trimEnd()}... ${link}`;
}

export function triggerSms(facts: TriggerFacts, templates: Record<TemplateKey, string>): string {
  return fitSms(renderTemplate(templates.smsText, templateValues(facts)), facts.link);
}

export function digestSms(list: TriggerFacts[], timelineLink: string): string {
  const items = list.map((f) => `${f.rule} ${f.zoneCode} ${f.validUtc.slice(11)}`).join("; ");
  return fitSms(`Bellwether: ${list.length} heads-up trigger(s) held during your quiet hours: ${items}. ${timelineLink}`, timelineLink);
}
