import { z } from "zod";
import { INGEST_STATES } from "./grids.ts";

/**
 * Everything the server announces over Server-Sent Events (`GET /api/events`), one schema per event
 * name. The server's event bus is typed from these, and the client parses each message with them.
 */
export const serverEventSchemas = {
  "ingest.progress": z.object({
    jobId: z.number().int(),
    state: z.enum(INGEST_STATES),
    progress: z.number(),
    note: z.string().nullable(),
  }),
  "ingest.finished": z.object({
    jobId: z.number().int(),
    state: z.enum(["ready", "failed"]),
    reason: z.string().nullable(),
    frameIds: z.array(z.number().int()),
  }),
  "frame.ready": z.object({
    frameId: z.number().int(),
    runId: z.number().int(),
    model: z.string(),
    runTime: z.string(),
    validTime: z.string(),
  }),
  /** A trigger was opened, changed state, or gained an event (comment, escalation, notification). */
  "trigger.changed": z.object({
    triggerId: z.number().int(),
    kind: z.string(),
    state: z.string(),
    severity: z.string(),
  }),
} as const;

export type ServerEventName = keyof typeof serverEventSchemas;
export type ServerEvents = { [K in ServerEventName]: z.infer<(typeof serverEventSchemas)[K]> };
export const SERVER_EVENT_NAMES = Object.keys(serverEventSchemas) as ServerEventName[];
