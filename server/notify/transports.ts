import type { AppConfig } from "../config.ts";
import type { LocalFakes } from "../fakes/local-fakes.ts";
import { createMailSender } from "./channels/mail-sender.ts";
import { createSmsSender } from "./channels/sms-sender.ts";
import type { MailSender, SmsSender } from "./channels/channel-types.ts";

export interface Transports {
  mail: MailSender;
  sms: SmsSender;
  close(): Promise<void>;
}

/** A made-up account for the fake: the SDK insists on the AC + 32 hex digits shape. */
export const FAKE_ACCOUNT_SID = `AC${"0".repeat(24)}b3110e7e`;
const FAKE_AUTH_TOKEN = "local-fake-token";

export function usesFakeMail(config: AppConfig): boolean {
  return !config.SMTP_HOST;
}

export function usesFakeSms(config: AppConfig): boolean {
  return !(config.TWILIO_ACCOUNT_SID && config.TWILIO_AUTH_TOKEN);
}

/**
 * The senders for this configuration. Without SMTP settings (or without the text provider's
 * account) the local fake is started on 127.0.0.1 and the same SDK code talks to it, so switching
 * to the hosted services is a matter of settings only.
 */
export async function openTransports(config: AppConfig, fakes: LocalFakes): Promise<Transports> {
  let mail: MailSender;
  if (usesFakeMail(config)) {
    const port = await fakes.mail.start(config.FAKE_SMTP_PORT);
    mail = createMailSender({ host: "127.0.0.1", port, secure: false, from: config.MAIL_FROM, plainText: true }, "fake");
  } else {
    mail = createMailSender({ host: config.SMTP_HOST!, port: config.SMTP_PORT, secure: config.SMTP_SECURE, user: config.SMTP_USER, pass: config.SMTP_PASS, from: config.MAIL_FROM }, "smtp");
  }
  let sms: SmsSender;
  if (usesFakeSms(config)) {
    await fakes.sms.start(config.FAKE_SMS_PORT);
    sms = createSmsSender({ accountSid: FAKE_ACCOUNT_SID, authToken: FAKE_AUTH_TOKEN, from: config.TWILIO_FROM, baseUrl: fakes.sms.baseUrl });
  } else {
    sms = createSmsSender({ accountSid: config.TWILIO_ACCOUNT_SID!, authToken: config.TWILIO_AUTH_TOKEN!, from: config.TWILIO_FROM, baseUrl: null });
  }
  return {
    mail,
    sms,
    async close() {
      await Promise.all([mail.close(), sms.close()]);
    },
  };
}
