import { z } from "zod";
import path from "node:path";
import { jetSettingsInput } from "../shared/meteo/jet/jet-settings.ts";

const boolFromEnv = z
  .enum(["1", "0", "true", "false", "yes", "no", "on", "off"])
  .transform((v) => ["1", "true", "yes", "on"].includes(v));

/** Every setting Bellwether reads from the environment, parsed once at start-up. */
const configSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  HOST: z.string().min(1).default("127.0.0.1"),
  DATA_DIR: z.string().min(1).default("./data"),
  DEMO: boolFromEnv.default(true),
  /** With DEMO: also drop the invented demo model run into the inbox of a new database. */
  DEMO_GRIDS: boolFromEnv.default(true),
  DEMO_PASSWORD: z.string().min(8, "DEMO_PASSWORD needs at least 8 characters").default("bellwether-demo"),
  ADMIN_USERNAME: z.string().min(2).optional(),
  ADMIN_PASSWORD: z.string().min(10, "ADMIN_PASSWORD needs at least 10 characters").optional(),
  SESSION_SECRET: z.string().min(32, "SESSION_SECRET needs at least 32 characters").optional(),
  SESSION_TTL_HOURS: z.coerce.number().positive().max(24 * 30).default(12),
  COOKIE_SECURE: boolFromEnv.default(false),
  BCRYPT_COST: z.coerce.number().int().min(12, "BCRYPT_COST must be at least 12").max(15).default(12),
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  LOGIN_RATE_WINDOW_MINUTES: z.coerce.number().positive().default(15),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).default("info"),
  JOBS: boolFromEnv.default(true),
  GRID_UPLOAD_MAX_MB: z.coerce.number().positive().max(16384).default(2048),
  INBOX_DIR: z.string().min(1).optional(),
  INBOX_POLL_SECONDS: z.coerce.number().int().min(2).max(3600).default(15),
  GRID_RETENTION_DAYS: z.coerce.number().positive().max(3650).default(14),
  /** Office jet-streak settings as JSON (e.g. {"jetLevelMode":"max-wind","coreSpeed":45}); defaults otherwise. */
  JET_SETTINGS: z
    .string()
    .optional()
    .transform((text, ctx) => {
      if (!text) return undefined;
      try {
        const parsed = jetSettingsInput.safeParse(JSON.parse(text));
        if (parsed.success) return parsed.data;
        ctx.addIssue({ code: "custom", message: parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ") });
      } catch {
        ctx.addIssue({ code: "custom", message: "JET_SETTINGS is not valid JSON" });
      }
      return z.NEVER;
    }),
  DIAGNOSTIC_THREADS: z.coerce.number().int().min(0).max(64).optional(),
  PUBLIC_URL: z.string().url().optional(),
  // Notifications. Without SMTP_HOST (or without the Twilio account) the app starts its own local fake.
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(587),
  SMTP_SECURE: boolFromEnv.default(false),
  SMTP_USER: z.string().min(1).optional(),
  SMTP_PASS: z.string().min(1).optional(),
  MAIL_FROM: z.string().min(3).default("Bellwether <bellwether@localhost>"),
  TWILIO_ACCOUNT_SID: z.string().regex(/^AC[0-9a-fA-F]{32}$/, "TWILIO_ACCOUNT_SID is AC followed by 32 hex digits").optional(),
  TWILIO_AUTH_TOKEN: z.string().min(8).optional(),
  TWILIO_FROM: z.string().regex(/^\+[1-9]\d{6,14}$/, "TWILIO_FROM is a sending number in E.164, e.g. +15550100999").default("+15550100999"),
  /** Fixed ports for the local fakes (0 = any free port). */
  FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  FAKE_SMS_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  OFFICE_TIME_ZONE: z
    .string()
    .default("America/Chicago")
    .refine((tz) => {
      try {
        new Intl.DateTimeFormat("en-US", { timeZone: tz });
        return true;
      } catch {
        return false;
      }
    }, "OFFICE_TIME_ZONE is not a known IANA time zone (e.g. America/Chicago)"),
  /** Minutes an open trigger may wait for an acknowledgement before each escalation level. */
  ESCALATION_MINUTES: z.coerce.number().positive().max(24 * 60).default(15),
  NOTIFY_MAX_ATTEMPTS: z.coerce.number().int().min(1).max(50).default(6),
  /** First retry delay; each later one doubles, up to the maximum. Fractions allowed (tests). */
  NOTIFY_RETRY_BASE_SECONDS: z.coerce.number().positive().max(3600).default(30),
  NOTIFY_RETRY_MAX_SECONDS: z.coerce.number().positive().max(86_400).default(1800),
  NOTIFY_CONCURRENCY: z.coerce.number().int().min(1).max(32).default(4),
  MAIL_PER_MINUTE: z.coerce.number().int().min(1).max(100_000).default(60),
  SMS_PER_MINUTE: z.coerce.number().int().min(1).max(100_000).default(30),
  /** How often the dispatcher looks for due outbox rows. */
  NOTIFY_POLL_SECONDS: z.coerce.number().positive().max(600).default(5),
  /** Run the outbox dispatcher in this process. */
  NOTIFY_DISPATCH: boolFromEnv.default(true),
});

export type AppConfig = z.infer<typeof configSchema> & { dataDir: string; databaseFile: string; inboxDir: string };

export class ConfigError extends Error {}

/** Parses configuration from an environment map; fails loudly, naming every bad key. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env, overrides: Partial<Record<string, string>> = {}): AppConfig {
  const source: Record<string, string | undefined> = { ...env, ...overrides };
  // Empty strings mean "not set", as shells often export them that way.
  for (const key of Object.keys(source)) if (source[key] === "") delete source[key];
  const parsed = configSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new ConfigError(`Invalid configuration:\n${lines.join("\n")}`);
  }
  const dataDir = path.resolve(parsed.data.DATA_DIR);
  const inboxDir = path.resolve(parsed.data.INBOX_DIR ?? path.join(dataDir, "inbox"));
  return { ...parsed.data, dataDir, databaseFile: path.join(dataDir, "bellwether.sqlite"), inboxDir };
}
