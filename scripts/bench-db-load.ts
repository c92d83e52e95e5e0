// Bench figure: loading the demo garden's GardenInputs from PGlite (db/queries/
// garden-inputs.ts: one query per table, in one read transaction), and the same
// followed by computePlan. Measured in a child process: db/queries import
// "server-only", which only loads under the "react-server" export condition (as
// inside Next), and the child gets a fresh in-memory database of its own.
import { execFileSync } from "node:child_process";
import path from "node:path";

export interface DbLoadFigure {
  label: string;
  medianMs: number;
  runs: number;
}

const RUNS = 31;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

/** Seeds the demo gardens into an in-memory PGlite and times loadGardenInputs (called by scripts/bench.ts). */
export async function benchDbLoad(): Promise<DbLoadFigure[]> {
  const env: NodeJS.ProcessEnv = { ...process.env, PGLITE_DIR: "memory://", CASTLINE_DEMO: "0" };
  delete env.DATABASE_URL;
  const out = execFileSync(
    process.execPath,
    [
      "--conditions=react-server",
      "--import",
      "tsx",
      path.join(__dirname, "bench-db-load.ts"),
      "--child",
    ],
    { env, encoding: "utf8", stdio: ["ignore", "pipe", "inherit"] },
  );
  const line = out.trim().split("\n").pop() ?? "[]";
  return JSON.parse(line) as DbLoadFigure[];
}

/** One line per figure, in the style of the engine bench. */
export function formatDbLoad(figures: DbLoadFigure[]): string {
  return figures
    .map((f) => `${f.label.padEnd(52)} ${f.medianMs.toFixed(2).padStart(8)} ms median of ${f.runs}`)
    .join("\n");
}

async function child(): Promise<void> {
  const { closeDb, getDb } = await import("@/db");
  const { seedDemoGarden } = await import("@/db/seed/seed-demo");
  const { loadGardenInputs } = await import("@/db/queries/garden-inputs");
  const { gardens } = await import("@/db/schema");
  const { computePlan } = await import("@/lib/engine");
  const { demoGarden } = await import("@/db/seed/demo-garden");
  const { eq } = await import("drizzle-orm");
  const db = await getDb();
  await seedDemoGarden(db);
  const [garden] = await db
    .select({ id: gardens.id })
    .from(gardens)
    .where(eq(gardens.name, demoGarden.name));
  const gardenId = garden!.id;
  const asOf = "2026-07-31";
  const time = async (fn: () => Promise<unknown>) => {
    for (let i = 0; i < 5; i++) await fn();
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) {
      const t = performance.now();
      await fn();
      times.push(performance.now() - t);
    }
    return median(times);
  };
  const inputs = await loadGardenInputs({ gardenId, asOf });
  const { logs } = inputs;
  const logCount =
    logs.harvests.length +
    logs.drains.length +
    logs.applications.length +
    logs.wormMoves.length +
    logs.observations.length;
  const figures: DbLoadFigure[] = [
    {
      label: `loadGardenInputs, demo garden (${inputs.plantings.length} plantings, ${logCount} logs)`,
      medianMs: await time(() => loadGardenInputs({ gardenId, asOf })),
      runs: RUNS,
    },
    {
      label: "loadGardenInputs + computePlan (12 months)",
      medianMs: await time(async () =>
        computePlan(await loadGardenInputs({ gardenId, asOf }), { suggestions: false }),
      ),
      runs: RUNS,
    },
  ];
  await closeDb();
  process.stdout.write(`${JSON.stringify(figures)}\n`);
}

if (process.argv.includes("--child")) {
  child().catch((error: unknown) => {
    console.error(error);
    process.exit(1);
  });
}
