// The scenario CLI proper; scripts/plan.ts starts it (see there for why).
import { readFileSync } from "node:fs";
import { computePlan, EngineInputError } from "@/lib/engine";
import { scenarioToInputs } from "@/lib/scenario/to-inputs";
import { parseScenario } from "@/lib/validation/scenario";
import { renderPlanTable } from "@/scripts/plan-table";

const USAGE =
  "usage: npm run plan -- <scenario.json> [--months 12] [--from YYYY-MM] [--format json|table]";

interface Args {
  file: string;
  months: number;
  from: string | undefined;
  format: "json" | "table";
}

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

function parseArgs(argv: string[]): Args {
  const args: Partial<Args> = { months: 12, format: "table" };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] as string;
    const value = () => argv[++i] ?? fail(`${a} needs a value\n${USAGE}`);
    if (a === "--months") {
      const n = Number(value());
      if (!Number.isInteger(n) || n < 1 || n > 60)
        fail("--months must be a whole number from 1 to 60");
      args.months = n;
    } else if (a === "--from") {
      const v = value();
      if (!/^\d{4}-(0[1-9]|1[0-2])$/.test(v))
        fail(`--from must be a month written YYYY-MM (got "${v}")`);
      args.from = v;
    } else if (a === "--format") {
      const v = value();
      if (v !== "json" && v !== "table") fail(`--format must be json or table (got "${v}")`);
      args.format = v;
    } else if (a === "--help" || a === "-h") {
      process.stdout.write(`${USAGE}\n`);
      process.exit(0);
    } else if (a.startsWith("--")) fail(`unknown option ${a}\n${USAGE}`);
    else if (args.file === undefined) args.file = a;
    else fail(`only one scenario file, please\n${USAGE}`);
  }
  if (args.file === undefined) fail(USAGE);
  return args as Args;
}

export function main(): void {
  const args = parseArgs(process.argv.slice(2));
  let json: unknown;
  try {
    json = JSON.parse(readFileSync(args.file, "utf8"));
  } catch (e) {
    fail(`${args.file}: cannot read it as JSON (${(e as Error).message})`);
  }
  const parsed = parseScenario(json);
  if (!parsed.ok) {
    fail(
      [
        `${args.file}: the scenario is not valid:`,
        ...parsed.issues.map((i) => `  ${i.path}: ${i.message}`),
      ].join("\n"),
    );
  }
  // Without settings.asOf the history runs to today (UTC); without --from the plan starts the month after asOf.
  const asOf = parsed.scenario.settings.asOf ?? new Date().toISOString().slice(0, 10);
  try {
    const inputs = scenarioToInputs(parsed.scenario, { asOf });
    const plan = computePlan(inputs, { from: args.from, months: args.months });
    process.stdout.write(
      args.format === "json"
        ? `${JSON.stringify(plan, null, 2)}\n`
        : renderPlanTable(plan, inputs.settings.unitSystem),
    );
  } catch (e) {
    if (e instanceof EngineInputError)
      fail(`${args.file}: ${e.field}: ${e.message.replace(`${e.field}: `, "")}`);
    throw e;
  }
}
