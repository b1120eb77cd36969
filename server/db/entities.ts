import { AuditEntryEntity } from "../entities/audit-entry.entity.ts";
import { SessionEntity } from "../entities/session.entity.ts";
import { UserEntity } from "../entities/user.entity.ts";
import { IngestJobEntity } from "../entities/ingest-job.entity.ts";
import { ModelRunEntity } from "../entities/model-run.entity.ts";
import { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { FieldInfoEntity } from "../entities/field-info.entity.ts";
import { ZoneEntity } from "../entities/zone.entity.ts";
import { ZoneMaskEntity } from "../entities/zone-mask.entity.ts";
import { RuleEntity } from "../entities/rule.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { RuleEvaluationEntity } from "../entities/rule-evaluation.entity.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import { TriggerEventEntity } from "../entities/trigger-event.entity.ts";
import { ContactEntity } from "../entities/contact.entity.ts";
import { ContactGroupEntity } from "../entities/contact-group.entity.ts";
import { ContactGroupMemberEntity } from "../entities/contact-group-member.entity.ts";
import { OnCallShiftEntity } from "../entities/on-call-shift.entity.ts";
import { NotificationEntity } from "../entities/notification.entity.ts";
import { DeliveryAttemptEntity } from "../entities/delivery-attempt.entity.ts";
import { NotifySettingEntity } from "../entities/notify-setting.entity.ts";
import { StormReportEntity } from "../entities/storm-report.entity.ts";

/** Every entity the data source knows; add new ones here. */
export const ENTITIES = [
  UserEntity,
  SessionEntity,
  AuditEntryEntity,
  IngestJobEntity,
  ModelRunEntity,
  GridFrameEntity,
  FieldInfoEntity,
  ZoneEntity,
  ZoneMaskEntity,
  RuleEntity,
  RuleVersionEntity,
  RuleEvaluationEntity,
  TriggerEntity,
  TriggerEventEntity,
  ContactEntity,
  ContactGroupEntity,
  ContactGroupMemberEntity,
  OnCallShiftEntity,
  NotificationEntity,
  DeliveryAttemptEntity,
  NotifySettingEntity,
  StormReportEntity,
];
