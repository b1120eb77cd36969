import bcrypt from "bcryptjs";

/** bcrypt hash of a password at the configured cost (never below 12). */
export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, Math.max(12, cost));
}

// Compared against when the username is unknown, so a miss costs as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync("bellwether-no-such-user", 12);

export function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  return bcrypt.compare(password, hash ?? DUMMY_HASH).then((ok) => ok && hash !== null);
}
