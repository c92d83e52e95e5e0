// The bench proper; scripts/bench.ts starts it.
import { planGarden } from "@/lib/engine/plan";
import { parseScenario } from "@/lib/validation/scenario";
import { benchGarden } from "@/scripts/bench-garden";

const SIZES = [50, 500, 5000];
const FROM = "2026-03";
const TARGET_MS_500 = 50;
const TARGET_EXPONENT = 1.15;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? (s[mid] as number) : ((s[mid - 1] as number) + (s[mid] as number)) / 2;
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
    num += (x - mx) * ((ys[i] as number) - my);
    den += (x - mx) ** 2;
  });
  return num / den;
}

const mb = (bytes: number) => (bytes / 1024 / 1024).toFixed(1);

export function main(): void {
  process.stdout.write(
    `Castline engine bench: planGarden over 12 months from ${FROM}, 5 bins (node ${process.version})\n\n`,
  );
  // Warm the JIT on a mid-size garden first, so the smallest size is not charged for compilation.
  const warm = parseScenario(JSON.parse(JSON.stringify(benchGarden(500, 99))));
  if (warm.ok)
    for (let i = 0; i < 15; i++)
      planGarden(warm.scenario, { from: FROM, months: 12, suggestions: false });
  const rows: {
    n: number;
    ms: number;
    cold: number;
    withGap: number;
    rss: number;
    heap: number;
    apps: number;
  }[] = [];
  for (const n of SIZES) {
    const parsed = parseScenario(JSON.parse(JSON.stringify(benchGarden(n))));
    if (!parsed.ok)
      throw new Error(`bench garden is invalid: ${JSON.stringify(parsed.issues.slice(0, 3))}`);
    const scenario = parsed.scenario;
    const rss0 = process.memoryUsage().rss;
    const heap0 = process.memoryUsage().heapUsed;
    let peakRss = rss0;
    let peakHeap = heap0;
    const sample = () => {
      const m = process.memoryUsage();
      peakRss = Math.max(peakRss, m.rss);
      peakHeap = Math.max(peakHeap, m.heapUsed);
    };
    let t = performance.now();
    const first = planGarden(scenario, { from: FROM, months: 12, suggestions: false });
    const cold = performance.now() - t;
    sample();
    const runs = n >= 5000 ? 9 : 21;
    const times: number[] = [];
    for (let i = 0; i < runs; i++) {
      t = performance.now();
      planGarden(scenario, { from: FROM, months: 12, suggestions: false });
      times.push(performance.now() - t);
      sample();
    }
    const gapRuns = n >= 5000 ? 3 : 5;
    const gapTimes: number[] = [];
    for (let i = 0; i < gapRuns; i++) {
      t = performance.now();
      planGarden(scenario, { from: FROM, months: 12 });
      gapTimes.push(performance.now() - t);
      sample();
    }
    rows.push({
      n,
      ms: median(times),
      cold,
      withGap: median(gapTimes),
      rss: peakRss - rss0,
      heap: peakHeap - heap0,
      apps: first.demand.applications,
    });
  }
  process.stdout.write(
    "plantings  applications  median ms  first run ms  with gap ms  peak rss +MB  peak heap +MB\n",
  );
  for (const r of rows) {
    process.stdout.write(
      `${String(r.n).padStart(9)}  ${String(r.apps).padStart(12)}  ${r.ms.toFixed(2).padStart(9)}  ${r.cold.toFixed(2).padStart(12)}  ${r.withGap.toFixed(1).padStart(11)}  ${mb(r.rss).padStart(12)}  ${mb(r.heap).padStart(13)}\n`,
    );
  }
  const k = exponent(rows.map((r) => ({ n: r.n, ms: r.ms })));
  const at500 = rows.find((r) => r.n === 500)?.ms ?? Number.NaN;
  process.stdout.write(
    `\nfitted growth exponent (log-log, median ms vs plantings): ${k.toFixed(3)}\n`,
  );
  process.stdout.write(
    `target 500 plantings ≤ ${TARGET_MS_500} ms median: ${at500.toFixed(2)} ms → ${at500 <= TARGET_MS_500 ? "met" : "NOT met"}\n`,
  );
  process.stdout.write(
    `target growth exponent ≤ ${TARGET_EXPONENT}: ${k.toFixed(3)} → ${k <= TARGET_EXPONENT ? "met" : "NOT met"}\n`,
  );
  process.stdout.write(
    "\n'median ms' is planGarden without gap suggestions (forecast, demand, balance); 'with gap ms' adds the\n" +
      "suggestions, which re-run the balance to prove each fix. Repeated runs reuse the RRULE expansion cache of\n" +
      "lib/engine/recurrence.ts; 'first run ms' is the run that filled it.\n",
  );
}
