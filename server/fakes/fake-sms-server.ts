import express, { type Request, type Response } from "express";
import http from "node:http";
import { randomBytes } from "node:crypto";
import type { AddressInfo } from "node:net";
import type { FakeSmsDto, FakeStatusDto } from "../../shared/api/notifications.ts";
import { IDEMPOTENCY_HEADER, Misbehaviour, TRIGGER_HEADER, triggerIdsFromHeader } from "./misbehaviour.ts";

const MAX_STORED = 2000;
const API_VERSION = "2010-04-01";

interface StoredReply {
  status: number;
  body: Record<string, unknown>;
}

function providerError(res: Response, status: number, code: number, message: string): void {
  res.status(status).json({ code, message, more_info: "local fake", status });
}

function basicAuthUser(req: Request): string | null {
  const header = req.headers.authorization ?? "";
  if (!header.startsWith("Basic ")) return null;
  const decoded = Buffer.from(header.slice(6), "base64").toString("utf8");
  return decoded.split(":")[0] ?? null;
}

/**
 * A local HTTP service that answers like the text-message provider's message-create endpoint
 * (POST /2010-04-01/Accounts/{sid}/Messages.json, form-encoded To/From/Body, Basic auth), so the
 * provider's own SDK can be pointed at it. Every accepted message is stored. A repeated
 * Idempotency-Key header gets the first reply again instead of a second message.
 */
export class FakeSmsServer {
  readonly misbehaviour = new Misbehaviour(0x5eed_0002);
  private readonly messages: FakeSmsDto[] = [];
  private readonly replies = new Map<string, StoredReply>();
  private readonly listeners = new Set<(sms: FakeSmsDto) => void>();
  private server: http.Server | null = null;
  private port: number | null = null;
  private duplicates = 0;
  private refused = 0;

  constructor(private readonly host = "127.0.0.1") {}

  private app() {
    const app = express();
    app.disable("x-powered-by");
    app.use(express.urlencoded({ extended: false, limit: "64kb" }));
    app.post(`/${API_VERSION}/Accounts/:accountSid/Messages.json`, (req, res, next) => {
      this.create(req, res).catch(next);
    });
    app.use((_req, res) => providerError(res, 404, 20404, "The requested resource was not found"));
    return app;
  }

  private async create(req: Request, res: Response): Promise<void> {
    const accountSid = String(req.params.accountSid);
    if (basicAuthUser(req) !== accountSid) return providerError(res, 401, 20003, "Authenticate: the account in the URL and the credentials differ");
    const key = req.header(IDEMPOTENCY_HEADER) ?? null;
    const verdict = this.misbehaviour.verdict();
    // Slowness comes after storing, like a provider that accepted the message but answers late.
    if (verdict === "refuse") {
      await this.misbehaviour.delay();
      return this.refuse(res);
    }
    const earlier = key ? this.replies.get(key) : undefined;
    if (earlier) {
      this.duplicates++;
      await this.misbehaviour.delay();
      if (verdict === "store-then-refuse") return this.refuse(res);
      res.status(earlier.status).json(earlier.body);
      return;
    }
    const { To: to, From: from, Body: body } = (req.body ?? {}) as Record<string, string | undefined>;
    if (!to || !/^\+[1-9]\d{6,14}$/.test(to)) return providerError(res, 400, 21211, `The 'To' number ${to ?? "(missing)"} is not a valid phone number.`);
    if (!from) return providerError(res, 400, 21603, "A 'From' phone number is required.");
    if (!body) return providerError(res, 400, 21602, "Message body is required.");
    const sid = `SM${randomBytes(16).toString("hex")}`;
    const now = new Date();
    const ids = triggerIdsFromHeader(req.header(TRIGGER_HEADER));
    const stored: FakeSmsDto = { id: sid, receivedAt: now.toISOString(), from, to: [to], body, triggerId: ids.length === 1 ? ids[0]! : null, triggerIds: ids };
    this.messages.push(stored);
    if (this.messages.length > MAX_STORED) this.messages.shift();
    for (const listener of this.listeners) listener(stored);
    const reply: StoredReply = {
      status: 201,
      body: {
        sid,
        account_sid: accountSid,
        to,
        from,
        body,
        status: "queued",
        num_segments: String(Math.max(1, Math.ceil(body.length / 153))),
        direction: "outbound-api",
        date_created: now.toUTCString(),
        date_updated: now.toUTCString(),
        date_sent: null,
        price: null,
        error_code: null,
        error_message: null,
        api_version: API_VERSION,
        uri: `/${API_VERSION}/Accounts/${accountSid}/Messages/${sid}.json`,
      },
    };
    if (key) this.replies.set(key, reply);
    await this.misbehaviour.delay();
    if (verdict === "store-then-refuse") return this.refuse(res);
    res.status(reply.status).json(reply.body);
  }

  private refuse(res: Response): void {
    this.refused++;
    providerError(res, 503, 20503, "Service unavailable (the local fake was told to refuse this one)");
  }

  async start(port = 0): Promise<number> {
    if (this.server) return this.port!;
    const server = http.createServer(this.app());
    await new Promise<void>((resolve, reject) => {
      server.once("error", reject);
      server.listen(port, this.host, () => resolve());
    });
    this.server = server;
    this.port = (server.address() as AddressInfo).port;
    return this.port;
  }

  /** The base URL the SDK is pointed at, e.g. http://127.0.0.1:40123. */
  get baseUrl(): string | null {
    return this.port === null ? null : `http://${this.host}:${this.port}`;
  }

  list(): FakeSmsDto[] {
    return [...this.messages].reverse();
  }

  onMessage(listener: (sms: FakeSmsDto) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  clear(): void {
    this.messages.length = 0;
    this.replies.clear();
    this.duplicates = 0;
    this.refused = 0;
  }

  status(): FakeStatusDto {
    return {
      running: this.server !== null,
      address: this.baseUrl,
      received: this.messages.length,
      duplicatesIgnored: this.duplicates,
      refused: this.refused,
      behaviour: this.misbehaviour.current,
    };
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    this.port = null;
    if (!server) return;
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
