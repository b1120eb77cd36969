import { writeDemoRun, defaultDemoRun } from "../../demo/demo-run.ts";
import { CliUsageError, parseCliArgs, type CliCommand } from "../command.ts";

/** `demo-grids <folder> [--run ISO] [--hours 1-9]`: writes the invented demo run as GRIB2 files. */
export const demoGridsCommand: CliCommand = {
  name: "demo-grids",
  summary: "Write the invented demo model run as GRIB2 files",
  usage: "demo-grids <folder> [--run ISO] [--hours 1-9]",
  async run(args) {
    const { positional, flags } = parseCliArgs(args, ["run", "hours"]);
    const folder = positional[0];
    if (!folder) throw new CliUsageError(`Usage: npm run cli -- ${this.usage}`);
    const defaults = defaultDemoRun(new Date());
    const runFlag = flags.get("run");
    const runTime = typeof runFlag === "string" ? new Date(runFlag) : defaults.runTime;
    if (Number.isNaN(runTime.getTime())) throw new CliUsageError(`--run: "${String(runFlag)}" is not an ISO time`);
    const hoursFlag = flags.get("hours");
    let forecastHours = defaults.forecastHours;
    if (typeof hoursFlag === "string") {
      const m = /^(\d+)-(\d+)$/.exec(hoursFlag);
      if (!m || Number(m[1]) > Number(m[2]) || Number(m[2]) > 48) throw new CliUsageError(`--hours: expected a range like 1-9 (at most 48), got "${hoursFlag}"`);
      forecastHours = Array.from({ length: Number(m[2]) - Number(m[1]) + 1 }, (_, k) => Number(m[1]) + k);
    }
    for (const file of writeDemoRun(folder, { runTime, forecastHours })) console.log(file);
    return 0;
  },
};
