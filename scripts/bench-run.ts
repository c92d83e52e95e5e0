// The bench proper; scripts/bench.ts starts it. Prints each figure beside its target.
import { computePlan, type GardenInputs } from "@/lib/engine";
import { BENCH_AS_OF, benchGarden } from "@/scripts/bench-garden";

const SIZES = [50, 500, 5000];
const TARGET_MS_500 = 20;
const TARGET_EXPONENT = 1.15;
const TARGET_GAP_MS_5000 = 300;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

/** Least-squares slope of log(time) on log(size). */
function exponent(points: { n: number; ms: number }[]): number {
  const xs = points.map((p) => Math.log(p.n));
  const ys = points.map((p) => Math.log(p.ms));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  let num = 0;
  let den = 0;
  xs.forEach((x, i) => {
    num += (x - mx) * (ys[i]! - my);
    den += (x - mx) ** 2;
  });
  return num / den;
}

const mb = (bytes: number) => (bytes / 1024 / 1024).toFixed(1);
const verdict = (ok: boolean) => (ok ? "met" : "NOT met");

function time(fn: () => void, runs: number): number {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    fn();
    times.push(performance.now() - t);
  }
  return median(times);
}

export function main(): void {
  process.stdout.write(
    `Castline engine bench: computePlan, 12 months after asOf ${BENCH_AS_OF}, 5 bins, three years of logs replayed (node ${process.version})\n\n`,
  );
  const warm = benchGarden(500, 99);
  for (let i = 0; i < 15; i++) computePlan(warm, { suggestions: false });
  const rows: {
    n: number;
    ms: number;
    cold: number;
    gap: number;
    rss: number;
    logs: number;
    feedings: number;
    short: boolean;
  }[] = [];
  for (const n of SIZES) {
    const inputs: GardenInputs = benchGarden(n);
    const rss0 = process.memoryUsage().rss;
    const t = performance.now();
    const first = computePlan(inputs, { suggestions: false });
    const cold = performance.now() - t;
    const ms = time(() => computePlan(inputs, { suggestions: false }), n >= 5000 ? 9 : 21);
    const gap = time(() => computePlan(inputs), n >= 5000 ? 3 : 5);
    const logs =
      inputs.logs.applications.length + inputs.logs.harvests.length + inputs.logs.drains.length;
    rows.push({
      n,
      ms,
      cold,
      gap,
      rss: process.memoryUsage().rss - rss0,
      logs,
      feedings: first.feedings.length,
      short: first.firstShortfall.castings !== null,
    });
  }
  process.stdout.write(
    "plantings  logs replayed  planned feedings  median ms  first run ms  with gap ms  short?  rss +MB\n",
  );
  for (const r of rows) {
    process.stdout.write(
      `${String(r.n).padStart(9)}  ${String(r.logs).padStart(13)}  ${String(r.feedings).padStart(16)}  ${r.ms.toFixed(2).padStart(9)}  ${r.cold.toFixed(2).padStart(12)}  ${r.gap.toFixed(1).padStart(11)}  ${(r.short ? "yes" : "no").padStart(6)}  ${mb(r.rss).padStart(7)}\n`,
    );
  }
  const k = exponent(rows.map((r) => ({ n: r.n, ms: r.ms })));
  const at500 = rows.find((r) => r.n === 500)!.ms;
  const r5000 = rows.find((r) => r.n === 5000)!;
  const gap5000 = r5000.gap - r5000.ms;
  process.stdout.write("\nmeasured                                   target      result\n");
  process.stdout.write(
    `500 plantings, median ms        ${at500.toFixed(2).padStart(10)}   ≤ ${TARGET_MS_500} ms    ${verdict(at500 <= TARGET_MS_500)}\n`,
  );
  process.stdout.write(
    `growth exponent (log-log)       ${k.toFixed(3).padStart(10)}   ≤ ${TARGET_EXPONENT}      ${verdict(k <= TARGET_EXPONENT)}\n`,
  );
  process.stdout.write(
    `gap suggestions at 5,000, ms    ${gap5000.toFixed(1).padStart(10)}   ≤ ${TARGET_GAP_MS_5000} ms   ${verdict(gap5000 <= TARGET_GAP_MS_5000)}\n`,
  );
  process.stdout.write(
    `(gap suggestions = 'with gap ms' − 'median ms' at 5,000 plantings; the whole plan with suggestions took ${r5000.gap.toFixed(1)} ms)\n`,
  );
  process.stdout.write(
    "\n'median ms' is computePlan without gap suggestions (replay, forecast, demand, ledger, worms); 'with gap ms'\n" +
      "adds the suggestions, which re-run the ledger to prove each fix. Repeated runs reuse the RRULE expansion cache\n" +
      "of lib/engine/demand/recurrence.ts; 'first run ms' is the run that filled it.\n",
  );
}
