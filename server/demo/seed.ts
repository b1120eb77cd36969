import type { DataSource } from "typeorm";
import { UserEntity } from "../entities/user.entity.ts";
import { appendAudit, SYSTEM_ACTOR } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { hashPassword } from "../auth/password.ts";
import { DEMO_ACCOUNTS } from "./demo-staff.ts";
import { demoZones } from "./demo-zones.ts";
import { demoRules } from "./demo-rules.ts";
import { seedDemoContacts } from "./demo-contacts.ts";
import { seedDemoStormReports } from "./demo-storm-reports.ts";
import type { Services } from "../services/container.ts";
import type { Role } from "../../shared/auth/permissions.ts";

/** True while no account exists: the only time seeding runs, so nothing stored is overwritten. */
export async function isNewDatabase(dataSource: DataSource): Promise<boolean> {
  return (await dataSource.getRepository(UserEntity).count()) === 0;
}

async function createAccounts(
  dataSource: DataSource,
  accounts: ReadonlyArray<{ username: string; displayName: string; roles: Role[]; password: string }>,
  bcryptCost: number,
  reason: string,
): Promise<void> {
  const hashes = await Promise.all(accounts.map((a) => hashPassword(a.password, bcryptCost)));
  await writeTransaction(dataSource, async (manager) => {
    const repo = manager.getRepository(UserEntity);
    for (const [i, account] of accounts.entries()) {
      const user = await repo.save(
        repo.create({ username: account.username, displayName: account.displayName, roles: account.roles, passwordHash: hashes[i]!, disabled: false, lastLoginAt: null }),
      );
      await appendAudit(manager, SYSTEM_ACTOR, {
        action: "user.created",
        targetType: "user",
        targetId: user.id,
        after: { username: user.username, displayName: user.displayName, roles: user.roles, disabled: false, reason },
      });
    }
  });
}

/** Seeds the invented demo office's accounts (later issues add zones, rules and the demo run). */
export async function seedDemoAccounts(dataSource: DataSource, password: string, bcryptCost: number): Promise<void> {
  await createAccounts(dataSource, DEMO_ACCOUNTS.map((a) => ({ ...a, password })), bcryptCost, "demo seed");
}

/** The first-run administrator from ADMIN_USERNAME / ADMIN_PASSWORD, on a database with no accounts. */
export async function seedFirstAdmin(dataSource: DataSource, username: string, password: string, bcryptCost: number): Promise<void> {
  await createAccounts(dataSource, [{ username: username.toLowerCase(), displayName: "Administrator", roles: ["admin"], password }], bcryptCost, "first-run administrator");
}

/** The invented office's zones and starter rules (the demo run itself arrives through the inbox). */
export async function seedDemoOffice(services: Pick<Services, "zones" | "rules" | "stormReports" | "notify" | "dataSource">): Promise<void> {
  const zones = await services.zones.importMany(SYSTEM_ACTOR, demoZones());
  const { partnerGroupId } = await seedDemoContacts(services.notify, services.dataSource, services.notify.now());
  for (const rule of demoRules(zones.map((z) => z.id), { partnerGroupId })) await services.rules.create(SYSTEM_ACTOR, rule);
  await seedDemoStormReports(services.stormReports);
}
