import passport, { type PassportStatic } from "passport";
import { Strategy as LocalStrategy } from "passport-local";
import type { DataSource } from "typeorm";
import { UserEntity } from "../entities/user.entity.ts";
import { verifyPassword } from "./password.ts";
import type { SessionUser } from "./current-user.ts";

export type LoginFailure = "BAD_CREDENTIALS" | "ACCOUNT_DISABLED";

/** A passport instance of its own per app, so tests can run several apps in one process. */
export function createPassport(dataSource: DataSource): PassportStatic {
  const instance = new passport.Passport() as unknown as PassportStatic;
  const users = dataSource.getRepository(UserEntity);

  instance.use(
    new LocalStrategy({ session: true }, async (username, password, done) => {
      try {
        const user = await users.findOne({ where: { username: username.trim().toLowerCase() } });
        const ok = await verifyPassword(password, user?.passwordHash ?? null);
        if (!user || !ok) return done(null, false, { message: "BAD_CREDENTIALS" satisfies LoginFailure });
        // Only reveal "disabled" to someone who knows the password.
        if (user.disabled) return done(null, false, { message: "ACCOUNT_DISABLED" satisfies LoginFailure });
        return done(null, toSessionUser(user));
      } catch (error) {
        return done(error);
      }
    }),
  );

  instance.serializeUser((user, done) => done(null, (user as SessionUser).id));
  // Re-read the account on every request so role changes and disabling take effect at once.
  instance.deserializeUser(async (id: number, done) => {
    try {
      const user = await users.findOne({ where: { id } });
      done(null, user && !user.disabled ? toSessionUser(user) : false);
    } catch (error) {
      done(error);
    }
  });
  return instance;
}

export function toSessionUser(user: UserEntity): SessionUser {
  return { id: user.id, username: user.username, displayName: user.displayName, roles: user.roles };
}
