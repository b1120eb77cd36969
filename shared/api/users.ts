import { z } from "zod";
import { roleSchema } from "./auth.ts";

const username = z
  .string()
  .trim()
  .min(2, "Usernames have at least 2 characters")
  .max(64)
  .regex(/^[a-z0-9._-]+$/, "Use lower-case letters, digits, dot, dash or underscore");
const password = z.string().min(10, "Passwords have at least 10 characters").max(256);
const roles = z.array(roleSchema).min(1, "Give the account at least one role");

export const createUserInput = z.object({
  username,
  displayName: z.string().trim().min(1, "Enter a display name").max(120),
  password,
  roles,
});
export type CreateUserInput = z.infer<typeof createUserInput>;

export const updateUserInput = z
  .object({
    displayName: z.string().trim().min(1).max(120).optional(),
    roles: roles.optional(),
    disabled: z.boolean().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, "Send at least one of displayName, roles, disabled");
export type UpdateUserInput = z.infer<typeof updateUserInput>;

export const resetPasswordInput = z.object({ password });
export type ResetPasswordInput = z.infer<typeof resetPasswordInput>;

export const userIdParams = z.object({ id: z.coerce.number().int().positive() });
