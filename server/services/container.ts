import type { DataSource } from "typeorm";
import type { Logger } from "pino";
import type { AppConfig } from "../config.ts";
import { EventBus } from "../realtime/event-bus.ts";
import { UserService } from "./user.service.ts";
import { IngestService } from "../ingest/ingest.service.ts";
import { GridFrameProcessor, type ColumnDiagnoser, type GridDecoder } from "../ingest/frame-processor.ts";
import { GridQueryService } from "../grids/grid-query.service.ts";
import { frameExtraDiagnosers } from "../ingest/frame-diagnostics.ts";
import { ZoneService } from "./zone.service.ts";
import { RuleService } from "./rule.service.ts";
import { TriggerService } from "./trigger.service.ts";
import { EvaluationService } from "./evaluation.service.ts";
import { RuleMapService } from "../rules/rule-map.service.ts";
import type { TriggerNotifier } from "./trigger-notifier.ts";
import { createNotifyServices, type NotifyServices } from "../notify/notify-module.ts";
import { decodeGridFile } from "../ingest/decode-file.ts";
import { inProcessColumnDiagnoser, poolColumnDiagnoser } from "../ingest/column-diagnoser.ts";
import { ColumnDiagnosticsPool } from "../diagnostics/column-pool.ts";
import os from "node:os";
import { StormReportService } from "../storm-reports/storm-report.service.ts";
import { HistoryService } from "../history/history.service.ts";
import { VerificationService } from "../verification/verification.service.ts";

/** Every long-lived service of one running Bellwether, built once and handed to routes and jobs. */
export interface Services {
  config: AppConfig;
  dataSource: DataSource;
  logger: Logger;
  events: EventBus;
  users: UserService;
  ingest: IngestService;
  grids: GridQueryService;
  zones: ZoneService;
  rules: RuleService;
  triggers: TriggerService;
  evaluation: EvaluationService;
  ruleMaps: RuleMapService;
  /** Contacts, on-call, the notification outbox and its dispatcher, escalation, digests and the local fakes. */
  notify: NotifyServices;
  stormReports: StormReportService;
  history: HistoryService;
  verification: VerificationService;
  /** Releases worker threads and other resources. */
  close(): Promise<void>;
}

export interface ServiceOverrides {
  decode?: GridDecoder;
  diagnoseColumns?: ColumnDiagnoser;
  notifier?: TriggerNotifier;
  now?: () => Date;
}

export function createServices(config: AppConfig, dataSource: DataSource, logger: Logger, overrides: ServiceOverrides = {}): Services {
  const events = new EventBus();
  const now = overrides.now ?? (() => new Date());
  const zones = new ZoneService(dataSource, now);
  const rules = new RuleService(dataSource, zones, now);
  const triggers = new TriggerService(dataSource, events, now);
  const notify = createNotifyServices({ config, dataSource, logger, triggers, zones, rules, now });
  const evaluation = new EvaluationService({ dataSource, dataDir: config.dataDir, rules, zones, triggers, notifier: overrides.notifier ?? notify.notifier, logger, now });
  // DIAGNOSTIC_THREADS=0 or 1 keeps the work on the main thread (tests, tiny grids).
  const threads = config.DIAGNOSTIC_THREADS ?? os.availableParallelism();
  const pool = !overrides.diagnoseColumns && threads > 1 ? new ColumnDiagnosticsPool({ threads }) : null;
  const processor = new GridFrameProcessor({
    dataSource,
    dataDir: config.dataDir,
    events,
    decode: overrides.decode ?? decodeGridFile,
    diagnoseColumns: overrides.diagnoseColumns ?? (pool ? poolColumnDiagnoser(pool) : inProcessColumnDiagnoser()),
    extraDiagnosers: frameExtraDiagnosers(config.JET_SETTINGS),
    // Every frame that becomes ready is checked against every enabled rule.
    onFrameReady: (frameId) => evaluation.enqueue(frameId),
  });
  const ingest = new IngestService({ dataSource, dataDir: config.dataDir, events, logger, processor });
  const ruleMaps = new RuleMapService(dataSource, config.dataDir, rules, zones);
  const stormReports = new StormReportService(dataSource, now);
  return {
    config,
    dataSource,
    logger,
    events,
    users: new UserService(dataSource, config.BCRYPT_COST),
    ingest,
    grids: new GridQueryService(dataSource, config.dataDir),
    zones,
    rules,
    triggers,
    evaluation,
    notify,
    ruleMaps,
    stormReports,
    history: new HistoryService(dataSource, triggers),
    verification: new VerificationService(dataSource, { rules, zones, maps: ruleMaps, reports: stormReports }),
    async close() {
      await ingest.stop();
      await evaluation.stop();
      await notify.close();
      await pool?.destroy();
    },
  };
}
