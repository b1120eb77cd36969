/**
 * Runs only the notification dispatcher against an existing SQLite file, sending to fakes that
 * another process owns. The crash test starts this, kills it with SIGKILL in the middle of a
 * batch, and starts it again. Environment: DATA_DIR, FAKE_MAIL_PORT, FAKE_SMS_URL.
 */
import { loadConfig } from "../../server/config.ts";
import { openDatabase } from "../../server/db/data-source.ts";
import { createLogger } from "../../server/logger.ts";
import { createServices } from "../../server/services/container.ts";
import { createMailSender } from "../../server/notify/channels/mail-sender.ts";
import { createSmsSender } from "../../server/notify/channels/sms-sender.ts";
import { FAKE_ACCOUNT_SID } from "../../server/notify/transports.ts";
import { FAST_NOTIFY_ENV } from "./notify-harness.ts";

const config = loadConfig({}, { ...FAST_NOTIFY_ENV, DATA_DIR: process.env.DATA_DIR!, LOG_LEVEL: "silent", JOBS: "false", DIAGNOSTIC_THREADS: "1", NOTIFY_CONCURRENCY: "2" });
const dataSource = await openDatabase({ database: config.databaseFile });
const services = createServices(config, dataSource, createLogger("silent"));
const mail = createMailSender({ host: "127.0.0.1", port: Number(process.env.FAKE_MAIL_PORT), secure: false, from: config.MAIL_FROM, plainText: true }, "fake");
const sms = createSmsSender({ accountSid: FAKE_ACCOUNT_SID, authToken: "child-token", from: config.TWILIO_FROM, baseUrl: process.env.FAKE_SMS_URL! });
const resumed = await services.notify.dispatcher.start({ mail, sms, close: async () => {} });
process.stdout.write(`resumed ${resumed}\n`);
const settled = await services.notify.dispatcher.settle(120_000);
process.stdout.write(settled ? "settled\n" : "timed out\n");
await services.close();
await dataSource.destroy();
process.exit(settled ? 0 : 1);
