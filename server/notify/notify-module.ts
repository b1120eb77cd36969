import type { DataSource } from "typeorm";
import type { Logger } from "pino";
import type { AppConfig } from "../config.ts";
import type { TriggerService } from "../services/trigger.service.ts";
import type { ZoneService } from "../services/zone.service.ts";
import type { RuleService } from "../services/rule.service.ts";
import { RuleMapService } from "../rules/rule-map.service.ts";
import { LocalFakes } from "../fakes/local-fakes.ts";
import { ContactService } from "./contact.service.ts";
import { OnCallService } from "./on-call.service.ts";
import { NotifySettingsService } from "./notify-settings.service.ts";
import { RecipientResolver } from "./recipients.ts";
import { OutboxNotifier } from "./outbox-notifier.ts";
import { MessageBuilder } from "./message-builder.ts";
import { NotificationDispatcher } from "./dispatcher.ts";
import { EscalationService } from "./escalation.service.ts";
import { DigestService } from "./digest.service.ts";
import { DeliveryLogService } from "./delivery-log.service.ts";
import { openTransports, usesFakeMail, usesFakeSms, type Transports } from "./transports.ts";

/** Everything about telling people: contacts, on-call, the outbox and its dispatcher, escalation, digests, the fakes. */
export interface NotifyServices {
  contacts: ContactService;
  onCall: OnCallService;
  settings: NotifySettingsService;
  notifier: OutboxNotifier;
  dispatcher: NotificationDispatcher;
  escalation: EscalationService;
  digests: DigestService;
  deliveries: DeliveryLogService;
  fakes: LocalFakes;
  transportKinds: { mail: "fake" | "smtp"; sms: "fake" | "provider" };
  /** The clock every notification step reads (injected in tests). */
  now: () => Date;
  /** Opens the senders (starting the local fakes when no credentials are set) and, when enabled, the dispatcher. */
  start(publicUrl?: string): Promise<{ resumed: number }>;
  close(): Promise<void>;
}

export interface NotifyDeps {
  config: AppConfig;
  dataSource: DataSource;
  logger: Logger;
  triggers: TriggerService;
  zones: ZoneService;
  rules: RuleService;
  now: () => Date;
}

export function createNotifyServices(deps: NotifyDeps): NotifyServices {
  const { config, dataSource, logger, now } = deps;
  let publicUrl = config.PUBLIC_URL ?? `http://${config.HOST === "0.0.0.0" ? "127.0.0.1" : config.HOST}:${config.PORT}`;
  const settings = new NotifySettingsService(dataSource, now);
  const contacts = new ContactService(dataSource, settings, now);
  const onCall = new OnCallService(dataSource, now);
  const recipients = new RecipientResolver(contacts, onCall, settings);
  const builder = new MessageBuilder({ triggers: deps.triggers, zones: deps.zones, ruleMaps: new RuleMapService(dataSource, config.dataDir, deps.rules, deps.zones), settings, timeZone: config.OFFICE_TIME_ZONE, logger, publicUrl: () => publicUrl });
  const dispatcher = new NotificationDispatcher({
    dataSource,
    builder,
    triggers: deps.triggers,
    logger,
    now,
    options: {
      maxAttempts: config.NOTIFY_MAX_ATTEMPTS,
      baseDelayMs: config.NOTIFY_RETRY_BASE_SECONDS * 1000,
      maxDelayMs: config.NOTIFY_RETRY_MAX_SECONDS * 1000,
      concurrency: config.NOTIFY_CONCURRENCY,
      perMinute: { email: config.MAIL_PER_MINUTE, sms: config.SMS_PER_MINUTE },
      pollMs: config.NOTIFY_POLL_SECONDS * 1000,
    },
  });
  const kick = () => dispatcher.kick();
  const notifier = new OutboxNotifier({ recipients, triggers: deps.triggers, now, onQueued: kick });
  const fakes = new LocalFakes();
  let transports: Transports | null = null;
  return {
    contacts,
    onCall,
    settings,
    notifier,
    dispatcher,
    escalation: new EscalationService({ dataSource, triggers: deps.triggers, notifier, recipients, defaultMinutes: config.ESCALATION_MINUTES, now }),
    digests: new DigestService(dataSource, now, kick),
    deliveries: new DeliveryLogService(dataSource, now, kick),
    fakes,
    transportKinds: { mail: usesFakeMail(config) ? "fake" : "smtp", sms: usesFakeSms(config) ? "fake" : "provider" },
    now,
    async start(url) {
      if (url && !config.PUBLIC_URL) publicUrl = url;
      transports ??= await openTransports(config, fakes);
      if (!config.NOTIFY_DISPATCH) return { resumed: 0 };
      return { resumed: await dispatcher.start(transports) };
    },
    async close() {
      await dispatcher.stop();
      await transports?.close();
      transports = null;
      await fakes.stop();
    },
  };
}
