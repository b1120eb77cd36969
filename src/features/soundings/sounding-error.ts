import { z } from "zod";
import { isApiError } from "@/lib/api-client.ts";
import { describeError } from "@/lib/describe-error.ts";

const lineDetails = z.object({ line: z.number().int().positive() });

/** What the page shows for a failed sounding: the message, and the file line when the server named one. */
export interface SoundingProblem {
  message: string;
  line: number | null;
}

/** A 422 SOUNDING_INVALID carries `details.line`; every other failure is described the usual way. */
export function soundingProblem(error: unknown): SoundingProblem {
  if (isApiError(error) && error.code === "SOUNDING_INVALID") {
    const details = lineDetails.safeParse(error.details);
    return { message: error.message, line: details.success ? details.data.line : null };
  }
  return { message: describeError(error).message, line: null };
}

/** Character range of a 1-based line of `text` (without its line break), or null when the text is shorter. */
export function lineRange(text: string, line: number): { start: number; end: number } | null {
  if (!(line >= 1)) return null;
  let start = 0;
  for (let n = 1; n < line; n++) {
    const breakAt = text.indexOf("\n", start);
    if (breakAt < 0) return null;
    start = breakAt + 1;
  }
  const next = text.indexOf("\n", start);
  let end = next < 0 ? text.length : next;
  if (end > start && text[end - 1] === "\r") end--;
  return { start, end };
}
