import { SAFETY_CAUTION } from "../../../shared/caution.ts";
import { renderTemplate } from "../../../shared/notify/template.ts";
import type { TemplateKey } from "../../../shared/api/notifications.ts";
import { templateValues, type TriggerFacts } from "./trigger-facts.ts";
import { escapeHtml } from "./html-escape.ts";

export interface EmailBody {
  subject: string;
  text: string;
  html: string;
}

/** The content id the HTML part uses to show the attached map inline. */
export const MAP_CID = "trigger-map@bellwether";

const FOOTER_NOTE = "You receive this because the office's on-call schedule or a rule's recipients name you.";

function factRows(facts: TriggerFacts): Array<[string, string]> {
  return [
    ["Rule", facts.rule],
    ["Severity", facts.severityLabel],
    ["Zone", `${facts.zone} (${facts.zoneCode})`],
    ["Valid (UTC)", facts.validUtc],
    ["Valid (local)", facts.validLocal],
    ["Model run", `${facts.model}, ${facts.run}`],
    ["Matched area", facts.coverage],
    ["Trigger state", facts.state],
  ];
}

/** A one-trigger e-mail: the office's subject and opening line, the facts, the values, the map, the link, the caution. */
export function triggerEmail(facts: TriggerFacts, templates: Record<TemplateKey, string>, hasMap: boolean): EmailBody {
  const values = templateValues(facts);
  const subject = renderTemplate(templates.emailSubject, values).replace(/\s+/g, " ").trim();
  const intro = renderTemplate(templates.emailIntro, values).trim();
  const rows = factRows(facts);
  const text = [
    intro,
    "",
    ...rows.map(([k, v]) => `${k}: ${v}`),
    "",
    "Values that met the rule (over the matched points):",
    ...(facts.peak.length ? facts.peak.map((line) => `  ${line}`) : ["  (none recorded)"]),
    "",
    hasMap ? "The attached map (trigger-map.png) shows the zone and the matched points." : "No map could be drawn for this trigger.",
    `Open the trigger: ${facts.link}`,
    "",
    `Caution: ${SAFETY_CAUTION}`,
    "",
    FOOTER_NOTE,
  ].join("\n");
  const html = `<!doctype html><html><body style="font-family:Arial,Helvetica,sans-serif;font-size:14px;color:#1d2530;max-width:640px">
<p style="margin:0 0 12px"><span style="display:inline-block;padding:2px 8px;border-radius:3px;background:${facts.severityColour};color:#ffffff;font-weight:bold">${escapeHtml(facts.severityLabel)}</span> ${escapeHtml(facts.change)}</p>
<p style="margin:0 0 12px">${escapeHtml(intro)}</p>
<table cellpadding="4" cellspacing="0" style="border-collapse:collapse;margin:0 0 12px">
${rows.map(([k, v]) => `<tr><th align="left" style="border-bottom:1px solid #d5dbe3;padding-right:16px">${escapeHtml(k)}</th><td style="border-bottom:1px solid #d5dbe3">${escapeHtml(v)}</td></tr>`).join("\n")}
</table>
<p style="margin:0 0 4px;font-weight:bold">Values that met the rule (over the matched points)</p>
<ul style="margin:0 0 12px">${facts.peak.length ? facts.peak.map((line) => `<li>${escapeHtml(line)}</li>`).join("") : "<li>(none recorded)</li>"}</ul>
${hasMap ? `<p style="margin:0 0 12px"><img src="cid:${MAP_CID}" alt="Map of ${escapeHtml(facts.zone)}: the zone outlined, matched points in the severity colour" style="border:1px solid #d5dbe3;max-width:100%"></p>` : `<p style="margin:0 0 12px;color:#5b6572">No map could be drawn for this trigger.</p>`}
<p style="margin:0 0 16px"><a href="${escapeHtml(facts.link)}">Open the trigger in Bellwether</a></p>
<p style="margin:0 0 8px;padding:8px;border-left:3px solid #8a6d1f;background:#fbf6e8;font-size:12px"><strong>Caution.</strong> ${escapeHtml(SAFETY_CAUTION)}</p>
<p style="margin:0;font-size:11px;color:#5b6572">${escapeHtml(FOOTER_NOTE)}</p>
</body></html>`;
  return { subject, text, html };
}

/** One e-mail for every heads-up trigger held during a contact's quiet hours. */
export function digestEmail(list: TriggerFacts[], templates: Record<TemplateKey, string>, contactName: string, timelineLink: string): EmailBody {
  const subject = renderTemplate(templates.digestSubject, { count: String(list.length), contact: contactName }).replace(/\s+/g, " ").trim();
  const intro = `While your quiet hours lasted, ${list.length} heads-up trigger(s) were held for you. They are listed here once, oldest first.`;
  const lines = list.map((f) => `- ${f.rule} (${f.severityLabel}) in ${f.zone}, valid ${f.validUtc} (${f.validLocal}), now ${f.state}: ${f.link}`);
  const text = [intro, "", ...lines, "", `The timeline: ${timelineLink}`, "", `Caution: ${SAFETY_CAUTION}`, "", FOOTER_NOTE].join("\n");
  const html = `<!doctype html><html><body style="font-family:Arial,Helvetica,sans-serif;font-size:14px;color:#1d2530;max-width:640px">
<p>${escapeHtml(intro)}</p>
<ul>${list.map((f) => `<li><a href="${escapeHtml(f.link)}">${escapeHtml(f.rule)}</a> (${escapeHtml(f.severityLabel)}) in ${escapeHtml(f.zone)}, valid ${escapeHtml(f.validUtc)} (${escapeHtml(f.validLocal)}), now ${escapeHtml(f.state)}</li>`).join("\n")}</ul>
<p><a href="${escapeHtml(timelineLink)}">Open the timeline</a></p>
<p style="margin:0 0 8px;padding:8px;border-left:3px solid #8a6d1f;background:#fbf6e8;font-size:12px"><strong>Caution.</strong> ${escapeHtml(SAFETY_CAUTION)}</p>
<p style="margin:0;font-size:11px;color:#5b6572">${escapeHtml(FOOTER_NOTE)}</p>
</body></html>`;
  return { subject, text, html };
}
