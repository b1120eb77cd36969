import { AuditEntryEntity } from "../entities/audit-entry.entity.ts";
import { SessionEntity } from "../entities/session.entity.ts";
import { UserEntity } from "../entities/user.entity.ts";

/** Every entity the data source knows; add new ones here. */
export const ENTITIES = [UserEntity, SessionEntity, AuditEntryEntity];
