import { CreateFoundation20261202T0200Z } from "../migrations/20261202T0200Z-create-foundation.ts";
import { CreateGridIngest20261202T0300Z } from "../migrations/20261202T0300Z-create-grid-ingest.ts";
import { CreateZones20261202T0400Z } from "../migrations/20261202T0400Z-create-zones.ts";
import { CreateRulesTriggers20261202T0500Z } from "../migrations/20261202T0500Z-create-rules-triggers.ts";
import { CreateNotifications20261202T0600Z } from "../migrations/20261202T0600Z-create-notifications.ts";
import { CreateStormReports20261202T0700Z } from "../migrations/20261202T0700Z-create-storm-reports.ts";

/** Checked-in migrations in the order they run; add new ones at the end. */
export const MIGRATIONS = [CreateFoundation20261202T0200Z, CreateGridIngest20261202T0300Z, CreateZones20261202T0400Z, CreateRulesTriggers20261202T0500Z, CreateNotifications20261202T0600Z, CreateStormReports20261202T0700Z];
