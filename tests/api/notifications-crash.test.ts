import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import { startNotifyServer, openTriggers, type NotifyTestServer } from "../helpers/notify-harness.ts";
import { makeContact, makeGroup } from "../helpers/notify-fixtures.ts";
import { LocalFakes } from "../../server/fakes/local-fakes.ts";
import { openDatabase } from "../../server/db/data-source.ts";
import { NotificationEntity } from "../../server/entities/notification.entity.ts";
import { DeliveryAttemptEntity } from "../../server/entities/delivery-attempt.entity.ts";

/**
 * A dispatcher process killed with SIGKILL in the middle of a batch, then started again, loses no
 * message and repeats none. The fakes live in this process and answer slowly after storing each
 * message, so the kill lands while sends are stored at the fake but not yet recorded as sent.
 */
const PEOPLE = 10;
let server: NotifyTestServer;
const fakes = new LocalFakes();
let triggerId: number;

beforeAll(async () => {
  // The outbox rows are written here (dispatcher off), then this process lets go of the database.
  server = await startNotifyServer({}, {}, { dispatch: false });
  const ids: number[] = [];
  for (let i = 0; i < PEOPLE; i++) ids.push((await makeContact(server, { name: `Crash ${i} (test)`, email: `crash${i}@example.test`, mobile: `+1555010${300 + i}`, channels: ["email", "sms"] })).id);
  const group = await makeGroup(server, ids);
  const [trigger] = await openTriggers(server, [{ severity: "urgent", recipients: { onCall: false, contactIds: [], groupIds: [group.id] } }]);
  triggerId = trigger!.id;
  await server.services.close();
  await server.dataSource.destroy();
  await fakes.mail.start();
  await fakes.sms.start();
  fakes.setBehaviour({ mail: { delayMs: 150 }, sms: { delayMs: 150 } });
});
afterAll(async () => {
  await fakes.stop();
  fs.rmSync(server.dataDir, { recursive: true, force: true });
});

function startChild(): { child: ChildProcess; exited: Promise<{ code: number | null; signal: NodeJS.Signals | null; output: string }> } {
  const child = spawn(process.execPath, ["--import", "tsx", "tests/helpers/dispatch-child.ts"], {
    env: { ...process.env, DATA_DIR: server.dataDir, FAKE_MAIL_PORT: String(fakes.mail.address!.port), FAKE_SMS_URL: fakes.sms.baseUrl! },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  child.stdout!.on("data", (d) => (output += d));
  child.stderr!.on("data", (d) => (output += d));
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null; output: string }>((resolve) => child.on("exit", (code, signal) => resolve({ code, signal, output })));
  return { child, exited };
}

describe("a dispatcher killed mid-batch", () => {
  it("loses none and repeats none after a restart", async () => {
    const stored = () => fakes.mail.list().length + fakes.sms.list().length;
    const first = startChild();
    // Kill as soon as a few messages are stored: with 150 ms slow replies, the ones in flight are
    // stored at the fake but not yet marked sent in the database.
    await new Promise<void>((resolve) => {
      const check = () => (stored() >= 5 ? resolve() : void 0);
      const stopMail = fakes.mail.onMessage(check);
      const stopSms = fakes.sms.onMessage(check);
      void first.exited.then(() => resolve());
      void first.exited.finally(() => (stopMail(), stopSms()));
    });
    first.child.kill("SIGKILL");
    const killed = await first.exited;
    expect(killed.signal, killed.output).toBe("SIGKILL");
    const storedAtKill = stored();
    expect(storedAtKill).toBeLessThan(2 * PEOPLE);

    const db = await openDatabase({ database: `${server.dataDir}/bellwether.sqlite` });
    try {
      const midway = await db.getRepository(NotificationEntity).find({ where: { triggerId } });
      expect(midway.filter((r) => r.state === "sending").length, "rows caught between send and record").toBeGreaterThan(0);
    } finally {
      await db.destroy();
    }

    fakes.setBehaviour({ mail: { delayMs: 0 }, sms: { delayMs: 0 } });
    const second = startChild();
    const done = await second.exited;
    expect(done.code, done.output).toBe(0);
    expect(done.output).toMatch(/resumed [1-9]/);

    // Each address received exactly one message per channel.
    const mailTo = fakes.mail.list().filter((m) => m.triggerId === triggerId).map((m) => m.to[0]);
    const smsTo = fakes.sms.list().filter((s) => s.triggerId === triggerId).map((s) => s.to[0]);
    expect(mailTo.sort()).toEqual(Array.from({ length: PEOPLE }, (_, i) => `crash${i}@example.test`).sort());
    expect(smsTo.sort()).toEqual(Array.from({ length: PEOPLE }, (_, i) => `+1555010${300 + i}`).sort());
    // The resends of messages that had arrived before the kill were recognised and dropped.
    const { mail, sms } = fakes.status();
    expect(mail.duplicatesIgnored + sms.duplicatesIgnored).toBeGreaterThan(0);

    const after = await openDatabase({ database: `${server.dataDir}/bellwether.sqlite` });
    try {
      const rows = await after.getRepository(NotificationEntity).find({ where: { triggerId } });
      expect(rows.map((r) => r.state)).toEqual(Array(2 * PEOPLE).fill("sent"));
      const interrupted = await after.getRepository(DeliveryAttemptEntity).count({ where: { outcome: "interrupted" } });
      expect(interrupted).toBeGreaterThan(0);
    } finally {
      await after.destroy();
    }
  }, 120_000);
});
