import { SMTPServer } from "smtp-server";
import { simpleParser, type AddressObject } from "mailparser";
import type { AddressInfo } from "node:net";
import type { FakeMailDto, FakeStatusDto } from "../../shared/api/notifications.ts";
import { Misbehaviour, TRIGGER_HEADER, triggerIdsFromHeader } from "./misbehaviour.ts";

/** Keep memory bounded in a long demo: the oldest messages go first. */
const MAX_STORED = 2000;

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? "").filter(Boolean));
}

/**
 * A real SMTP server on 127.0.0.1 that keeps every message it accepts, parsed. It remembers each
 * Message-ID it has stored and accepts a repeat without storing it again, which is how a resend after
 * a crash stays a single message here. It can be told to refuse a share of messages or to be slow.
 */
export class FakeMailServer {
  readonly misbehaviour = new Misbehaviour(0x5eed_0001);
  private readonly messages: FakeMailDto[] = [];
  private readonly seenMessageIds = new Set<string>();
  /** Attachment bytes by message id, kept out of the JSON listing. */
  private readonly contents = new Map<number, Buffer[]>();
  private readonly listeners = new Set<(mail: FakeMailDto) => void>();
  private server: SMTPServer | null = null;
  private port: number | null = null;
  private nextId = 1;
  private duplicates = 0;
  private refused = 0;

  constructor(private readonly host = "127.0.0.1") {}

  async start(port = 0): Promise<number> {
    if (this.server) return this.port!;
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ["STARTTLS"],
      logger: false,
      banner: "Bellwether local mail fake",
      // No reverse DNS for 127.0.0.1: it only adds a wait per connection.
      disableReverseLookup: true,
      onData: (stream, session, callback) => {
        void this.receive(stream, session.envelope.rcptTo.map((r) => r.address)).then(
          (error) => callback(error ?? undefined),
          (error: Error) => callback(error),
        );
      },
    });
    await new Promise<void>((resolve, reject) => {
      server.server.once("error", reject);
      server.listen(port, this.host, () => resolve());
    });
    this.server = server;
    this.port = (server.server.address() as AddressInfo).port;
    return this.port;
  }

  private async receive(stream: NodeJS.ReadableStream, envelopeTo: string[]): Promise<Error | null> {
    // Keep cid: image links as sent (the parser would otherwise inline them as data URIs).
    const mail = await simpleParser(stream as never, { skipImageLinks: true });
    const verdict = this.misbehaviour.verdict();
    if (verdict === "refuse") {
      await this.misbehaviour.delay();
      return this.refusal();
    }
    const messageId = mail.messageId ?? null;
    if (messageId && this.seenMessageIds.has(messageId)) {
      this.duplicates++;
    } else {
      if (messageId) this.seenMessageIds.add(messageId);
      const ids = triggerIdsFromHeader(mail.headers.get(TRIGGER_HEADER) as string | undefined);
      const stored: FakeMailDto = {
        id: this.nextId++,
        receivedAt: new Date().toISOString(),
        messageId,
        from: addresses(mail.from)[0] ?? "",
        to: envelopeTo.length ? envelopeTo : addresses(mail.to),
        subject: mail.subject ?? "",
        text: mail.text ?? "",
        html: typeof mail.html === "string" ? mail.html : null,
        attachments: mail.attachments.map((a) => ({ filename: a.filename ?? null, contentType: a.contentType, size: a.size, inline: a.contentDisposition === "inline" || Boolean(a.cid) })),
        triggerId: ids.length === 1 ? ids[0]! : null,
        triggerIds: ids,
      };
      this.messages.push(stored);
      this.contents.set(stored.id, mail.attachments.map((a) => a.content));
      if (this.messages.length > MAX_STORED) this.contents.delete(this.messages.shift()!.id);
      for (const listener of this.listeners) listener(stored);
    }
    // A slow reply comes after the message is stored: the window in which a sender that crashes
    // has sent a message without knowing it.
    await this.misbehaviour.delay();
    return verdict === "store-then-refuse" ? this.refusal() : null;
  }

  private refusal(): Error {
    this.refused++;
    // 451: a temporary local error, so a well-behaved client tries again later.
    return Object.assign(new Error("Temporary failure (the local fake was told to refuse this one)"), { responseCode: 451 });
  }

  /** Newest first. */
  list(): FakeMailDto[] {
    return [...this.messages].reverse();
  }

  /** The bytes of one stored attachment (for checks that open the map image). */
  attachment(messageId: number, index: number): Buffer | null {
    return this.contents.get(messageId)?.[index] ?? null;
  }

  /** Calls `listener` for every message stored from now on; returns the function that stops it. */
  onMessage(listener: (mail: FakeMailDto) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  clear(): void {
    this.messages.length = 0;
    this.contents.clear();
    this.seenMessageIds.clear();
    this.duplicates = 0;
    this.refused = 0;
  }

  get address(): { host: string; port: number } | null {
    return this.port === null ? null : { host: this.host, port: this.port };
  }

  status(): FakeStatusDto {
    return {
      running: this.server !== null,
      address: this.port === null ? null : `smtp://${this.host}:${this.port}`,
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
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
