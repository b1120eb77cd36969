import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { LocalFakes } from "../../../server/fakes/local-fakes.ts";
import { createMailSender } from "../../../server/notify/channels/mail-sender.ts";
import { createSmsSender } from "../../../server/notify/channels/sms-sender.ts";
import { SendError } from "../../../server/notify/channels/channel-types.ts";
import { FAKE_ACCOUNT_SID } from "../../../server/notify/transports.ts";

const fakes = new LocalFakes();
let mailPort = 0;

beforeAll(async () => {
  mailPort = await fakes.mail.start();
  await fakes.sms.start();
});
afterAll(async () => fakes.stop());

const mailSender = () => createMailSender({ host: "127.0.0.1", port: mailPort, secure: false, from: "Bellwether <duty@example.test>", plainText: true }, "fake");
const smsSender = () => createSmsSender({ accountSid: FAKE_ACCOUNT_SID, authToken: "token-123456", from: "+15550100999", baseUrl: fakes.sms.baseUrl });

describe("nodemailer against the local SMTP fake", () => {
  it("delivers text, HTML and an inline image, keeping the envelope and the trigger header", async () => {
    fakes.mail.clear();
    const sender = mailSender();
    const result = await sender.send({
      to: "lead@example.test",
      subject: "Check subject",
      text: "plain part",
      html: "<p>html part</p><img src=\"cid:map\">",
      attachments: [{ filename: "map.png", content: Buffer.from([0x89, 0x50, 0x4e, 0x47]), contentType: "image/png", cid: "map" }],
      messageId: "<n-1@bellwether.test>",
      triggerIds: [42],
    });
    await sender.close();
    expect(result.providerMessageId).toBe("<n-1@bellwether.test>");
    const [mail] = fakes.mail.list();
    expect(mail).toMatchObject({ to: ["lead@example.test"], from: "duty@example.test", subject: "Check subject", triggerId: 42, messageId: "<n-1@bellwether.test>" });
    expect(mail!.text.trim()).toBe("plain part");
    expect(mail!.html).toContain("html part");
    expect(mail!.attachments).toEqual([{ filename: "map.png", contentType: "image/png", size: 4, inline: true }]);
  });

  it("stores a repeated Message-ID once", async () => {
    fakes.mail.clear();
    const sender = mailSender();
    const mail = { to: "a@example.test", subject: "s", text: "t", html: "<p>t</p>", attachments: [], messageId: "<same@bellwether.test>", triggerIds: [1] };
    await sender.send(mail);
    await sender.send(mail);
    await sender.close();
    expect(fakes.mail.list()).toHaveLength(1);
    expect(fakes.mail.status().duplicatesIgnored).toBe(1);
  });

  it("reports a refusal as retryable (SMTP 451)", async () => {
    fakes.mail.misbehaviour.set({ failureRate: 1, failAfterStoring: false });
    const sender = mailSender();
    try {
      const error = await sender.send({ to: "a@example.test", subject: "s", text: "t", html: "t", attachments: [], messageId: "<r@bellwether.test>", triggerIds: [] }).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(SendError);
      expect((error as SendError).retryable).toBe(true);
      expect((error as SendError).message).toContain("451");
    } finally {
      fakes.mail.misbehaviour.set({ failureRate: 0 });
      await sender.close();
    }
  });
});

describe("the provider's SDK against the local SMS fake", () => {
  it("creates a message and gets the fake's sid back", async () => {
    fakes.sms.clear();
    const result = await smsSender().send({ to: "+15550100123", body: "hello", idempotencyKey: "k-1", triggerIds: [7] });
    expect(result.providerMessageId).toMatch(/^SM[0-9a-f]{32}$/);
    expect(fakes.sms.list()).toEqual([expect.objectContaining({ id: result.providerMessageId, to: ["+15550100123"], from: "+15550100999", body: "hello", triggerId: 7 })]);
  });

  it("answers a repeated idempotency key with the first message instead of a second one", async () => {
    fakes.sms.clear();
    const first = await smsSender().send({ to: "+15550100123", body: "once", idempotencyKey: "k-2", triggerIds: [7] });
    const second = await smsSender().send({ to: "+15550100123", body: "once", idempotencyKey: "k-2", triggerIds: [7] });
    expect(second.providerMessageId).toBe(first.providerMessageId);
    expect(fakes.sms.list()).toHaveLength(1);
  });

  it("classifies a refusal as retryable and a bad number as permanent", async () => {
    fakes.sms.misbehaviour.set({ failureRate: 1 });
    const refused = await smsSender().send({ to: "+15550100123", body: "x", idempotencyKey: "k-3", triggerIds: [] }).catch((e: unknown) => e);
    fakes.sms.misbehaviour.set({ failureRate: 0 });
    expect((refused as SendError).retryable).toBe(true);
    const bad = await smsSender().send({ to: "555-0100", body: "x", idempotencyKey: "k-4", triggerIds: [] }).catch((e: unknown) => e);
    expect((bad as SendError).retryable).toBe(false);
    expect((bad as SendError).message).toContain("HTTP 400");
  });
});
