import nodemailer from "nodemailer";
import { SendError, type MailSender, type OutgoingMail } from "./channel-types.ts";
import { TRIGGER_HEADER } from "../../fakes/misbehaviour.ts";

export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
  from: string;
  /** The local fake speaks plain SMTP; a real server should be reached over TLS. */
  plainText?: boolean;
}

/**
 * RFC 5321 §4.2.1: 4yz replies are transient (try again), 5yz permanent. Failures with no SMTP reply
 * at all (connection refused, timeout, dropped socket) are treated as transient.
 */
export function classifyMailError(error: unknown): SendError {
  const { responseCode, code, message } = error as { responseCode?: number; code?: string; message?: string };
  const text = `${code ? `${code}: ` : ""}${message ?? String(error)}`.slice(0, 900);
  if (typeof responseCode === "number") return new SendError(`SMTP ${responseCode}: ${text}`, responseCode < 500);
  // A message nodemailer cannot even build will not build next time either.
  if (code === "EMESSAGE") return new SendError(text, false);
  return new SendError(text, true);
}

/** E-mail over SMTP with nodemailer: the local fake, or the office's mail server. */
export function createMailSender(settings: SmtpSettings, kind: "fake" | "smtp"): MailSender {
  const transport = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    ignoreTLS: settings.plainText ?? false,
    auth: settings.user ? { user: settings.user, pass: settings.pass ?? "" } : undefined,
    connectionTimeout: 15_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return {
    kind,
    async send(mail: OutgoingMail) {
      try {
        const info = await transport.sendMail({
          from: settings.from,
          to: mail.to,
          subject: mail.subject,
          text: mail.text,
          html: mail.html,
          attachments: mail.attachments,
          messageId: mail.messageId,
          headers: { [TRIGGER_HEADER]: mail.triggerIds.join(",") },
        });
        if (info.rejected.length > 0) throw Object.assign(new Error(`Recipient refused: ${info.rejected.join(", ")}`), { responseCode: 550 });
        return { providerMessageId: info.messageId || mail.messageId };
      } catch (error) {
        throw error instanceof SendError ? error : classifyMailError(error);
      }
    },
    async close() {
      transport.close();
    },
  };
}
