import type { CliCommand } from "../command.ts";
import { auditCommand } from "./audit.command.ts";
import { diagnoseCommand } from "./diagnose.command.ts";
import { demoGridsCommand } from "./demo-grids.command.ts";
import { inspectCommand } from "./inspect.command.ts";
import { fieldsCommand } from "./fields.command.ts";
import { evaluateCommand } from "./evaluate.command.ts";

/** Every CLI command by name; add a new command's file here. */
export const COMMANDS: readonly CliCommand[] = [auditCommand, diagnoseCommand, inspectCommand, fieldsCommand, evaluateCommand, demoGridsCommand];
