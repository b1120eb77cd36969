import { AsyncLocalStorage } from "node:async_hooks";
import twilio from "twilio";
import type RequestClientType from "twilio/lib/base/RequestClient.js";
import { SendError, type OutgoingSms, type SmsSender } from "./channel-types.ts";
import { IDEMPOTENCY_HEADER, TRIGGER_HEADER } from "../../fakes/misbehaviour.ts";

/** Per-send values the HTTP layer adds as headers; the SDK's create() has no header option. */
const sendContext = new AsyncLocalStorage<{ idempotencyKey: string; triggerIds: number[] }>();

/**
 * The SDK's HTTP client with two additions: every request carries the send's idempotency key and
 * trigger ids as headers, and, for the local fake, the origin is swapped for the fake's base URL
 * (the SDK's edge/region options only rename *.twilio.com hosts, so they cannot reach loopback).
 */
class BellwetherRequestClient extends twilio.RequestClient {
  constructor(private readonly baseUrl: string | null) {
    super({ timeout: 20_000 });
  }

  override request<TData>(opts: RequestClientType.RequestOptions<TData>) {
    const context = sendContext.getStore();
    const headers = { ...opts.headers };
    if (context) {
      headers[IDEMPOTENCY_HEADER] = context.idempotencyKey;
      headers[TRIGGER_HEADER] = context.triggerIds.join(",");
    }
    let uri = opts.uri;
    if (this.baseUrl) {
      const original = new URL(opts.uri);
      uri = `${this.baseUrl}${original.pathname}${original.search}`;
    }
    return super.request({ ...opts, uri, headers });
  }
}

/**
 * The provider's answer, by HTTP status: 429 and 5xx are worth another try, other 4xx are not
 * (bad number, bad credentials). No status at all means the request never got an answer: try again.
 */
export function classifySmsError(error: unknown): SendError {
  const { status, code, message } = error as { status?: number; code?: number | string; message?: string };
  const text = `${status ? `HTTP ${status}` : "no answer"}${code ? ` (code ${code})` : ""}: ${message ?? String(error)}`.slice(0, 900);
  if (typeof status !== "number") return new SendError(text, true);
  return new SendError(text, status === 429 || status >= 500);
}

export interface SmsSettings {
  accountSid: string;
  authToken: string;
  from: string;
  /** The local fake's base URL; null sends to the hosted provider. */
  baseUrl: string | null;
}

/** Text messages through the provider's official SDK, pointed at the local fake or the hosted API. */
export function createSmsSender(settings: SmsSettings): SmsSender {
  const client = twilio(settings.accountSid, settings.authToken, { httpClient: new BellwetherRequestClient(settings.baseUrl) });
  return {
    kind: settings.baseUrl ? "fake" : "provider",
    async send(sms: OutgoingSms) {
      try {
        const message = await sendContext.run({ idempotencyKey: sms.idempotencyKey, triggerIds: sms.triggerIds }, () =>
          client.messages.create({ to: sms.to, from: settings.from, body: sms.body }),
        );
        return { providerMessageId: message.sid };
      } catch (error) {
        throw classifySmsError(error);
      }
    },
    async close() {},
  };
}
