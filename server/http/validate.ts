import type { z } from "zod";
import { ValidationError } from "../errors.ts";

export type InputPart = "body" | "query" | "params";

/**
 * Parses one part of a request with its zod schema. On failure throws a 400 whose message names
 * the first bad field and whose details list every problem.
 */
export function parseInput<S extends z.ZodType>(schema: S, data: unknown, part: InputPart): z.infer<S> {
  const result = schema.safeParse(data ?? {});
  if (result.success) return result.data;
  const issues = result.error.issues.map((issue) => ({
    field: issue.path.length > 0 ? issue.path.join(".") : part,
    message: issue.message,
  }));
  const first = issues[0]!;
  throw new ValidationError(`Invalid ${part}: ${first.field}: ${first.message}`, { part, issues });
}
