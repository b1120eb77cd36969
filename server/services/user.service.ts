import type { DataSource } from "typeorm";
import { UserEntity } from "../entities/user.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { hashPassword } from "../auth/password.ts";
import { ConflictError, NotFoundError, ValidationError } from "../errors.ts";
import type { UserDto } from "../../shared/api/auth.ts";
import type { CreateUserInput, UpdateUserInput } from "../../shared/api/users.ts";

export function toUserDto(user: UserEntity): UserDto {
  return {
    id: user.id,
    username: user.username,
    displayName: user.displayName,
    roles: [...user.roles],
    disabled: user.disabled,
    createdAt: user.createdAt.toISOString(),
    lastLoginAt: user.lastLoginAt ? user.lastLoginAt.toISOString() : null,
  };
}

/** What the audit trail keeps of an account: never the password hash. */
const auditView = (u: UserEntity) => ({ username: u.username, displayName: u.displayName, roles: u.roles, disabled: u.disabled });

export class UserService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly bcryptCost: number,
  ) {}

  async list(): Promise<UserDto[]> {
    const users = await this.dataSource.getRepository(UserEntity).find({ order: { username: "ASC" } });
    return users.map(toUserDto);
  }

  async create(actor: AuditActor, input: CreateUserInput): Promise<UserDto> {
    const passwordHash = await hashPassword(input.password, this.bcryptCost);
    return writeTransaction(this.dataSource, async (manager) => {
      const repo = manager.getRepository(UserEntity);
      const username = input.username.toLowerCase();
      if (await repo.exists({ where: { username } })) throw new ConflictError(`The username "${username}" is taken.`);
      const user = await repo.save(repo.create({ username, displayName: input.displayName, passwordHash, roles: unique(input.roles), disabled: false, lastLoginAt: null }));
      await appendAudit(manager, actor, { action: "user.created", targetType: "user", targetId: user.id, after: auditView(user) });
      return toUserDto(user);
    });
  }

  async update(actor: AuditActor, id: number, input: UpdateUserInput): Promise<UserDto> {
    return writeTransaction(this.dataSource, async (manager) => {
      const repo = manager.getRepository(UserEntity);
      const user = await repo.findOne({ where: { id } });
      if (!user) throw new NotFoundError(`Account ${id}`);
      const before = auditView(user);
      if (input.displayName !== undefined) user.displayName = input.displayName;
      if (input.roles !== undefined) user.roles = unique(input.roles);
      if (input.disabled !== undefined) user.disabled = input.disabled;
      if (actor.username === user.username && (user.disabled || !user.roles.includes("admin"))) {
        throw new ValidationError("You cannot disable your own account or remove your own admin role.");
      }
      await this.assertAnAdminRemains(repo, user);
      await repo.save(user);
      await appendAudit(manager, actor, { action: "user.updated", targetType: "user", targetId: user.id, before, after: auditView(user) });
      return toUserDto(user);
    });
  }

  async resetPassword(actor: AuditActor, id: number, password: string): Promise<void> {
    const passwordHash = await hashPassword(password, this.bcryptCost);
    await writeTransaction(this.dataSource, async (manager) => {
      const repo = manager.getRepository(UserEntity);
      const user = await repo.findOne({ where: { id } });
      if (!user) throw new NotFoundError(`Account ${id}`);
      user.passwordHash = passwordHash;
      await repo.save(user);
      await appendAudit(manager, actor, { action: "user.password_reset", targetType: "user", targetId: user.id });
    });
  }

  async recordSignIn(actor: AuditActor, userId: number, now = new Date()): Promise<void> {
    await writeTransaction(this.dataSource, async (manager) => {
      await manager.getRepository(UserEntity).update({ id: userId }, { lastLoginAt: now });
      await appendAudit(manager, actor, { action: "auth.signed_in", targetType: "user", targetId: userId }, now);
    });
  }

  private async assertAnAdminRemains(repo: ReturnType<DataSource["getRepository"]>, changed: UserEntity): Promise<void> {
    const all = (await repo.find()) as UserEntity[];
    const admins = all.map((u) => (u.id === changed.id ? changed : u)).filter((u) => !u.disabled && u.roles.includes("admin"));
    if (admins.length === 0) throw new ValidationError("At least one enabled administrator must remain.");
  }
}

const unique = <T>(items: readonly T[]): T[] => [...new Set(items)];
