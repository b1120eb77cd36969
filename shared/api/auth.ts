import { z } from "zod";
import { ROLES } from "../auth/permissions.ts";

export const roleSchema = z.enum(ROLES);

export const loginInput = z.object({
  username: z.string().trim().min(1, "Enter a username").max(64),
  password: z.string().min(1, "Enter a password").max(256),
});
export type LoginInput = z.infer<typeof loginInput>;

export const userDto = z.object({
  id: z.number().int(),
  username: z.string(),
  displayName: z.string(),
  roles: z.array(roleSchema),
  disabled: z.boolean(),
  createdAt: z.string(),
  lastLoginAt: z.string().nullable(),
});
export type UserDto = z.infer<typeof userDto>;

export const csrfTokenDto = z.object({ token: z.string() });
