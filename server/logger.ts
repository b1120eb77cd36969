import { pino, type Logger } from "pino";

/** Structured JSON logs to stdout. */
export function createLogger(level: string): Logger {
  return pino({ level, base: { app: "bellwether" }, timestamp: pino.stdTimeFunctions.isoTime });
}
