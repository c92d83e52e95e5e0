import { benchGarden } from "@/scripts/bench-garden";
import { planContext } from "@/lib/engine/plan/context";
import { buildSupply } from "@/lib/engine/plan/supply";
import { buildDemand } from "@/lib/engine/plan/demand";
import { runLedger } from "@/lib/engine/balance/ledger";
import { buildBins, binWorms } from "@/lib/engine/plan/bins";
import { computePlan } from "@/lib/engine";
const n = Number(process.argv[2] ?? 500);
const g = benchGarden(n);
const ctx = planContext(g, {});
const sup = buildSupply(g, ctx, []);
const dem = buildDemand(g, ctx, []);
const li = { lots: sup.lots.map((l) => l.lot), planned: dem.planned, logged: dem.logged, keepDays: { castings: 60, leachate: 7 }, spans: ctx.spans };
const led = runLedger(li);
const fs: [string, () => unknown][] = [["ctx", () => planContext(g, {})], ["supply", () => buildSupply(g, ctx, [])], ["demand", () => buildDemand(g, ctx, [])], ["ledger", () => runLedger({ ...li, recordDrawsFrom: ctx.planStartDay, snapshotAtMonth: 36 })], ["bins", () => buildBins(sup.bins, sup.lots, led, g, ctx, [])], ["worms", () => sup.bins.map((b) => binWorms(b, g, ctx.planEndDay))], ["total", () => computePlan(g, { suggestions: false })]];
for (const [k, f] of fs) {
  for (let i = 0; i < 5; i++) f();
  const s = performance.now();
  for (let i = 0; i < 20; i++) f();
  console.log(k, ((performance.now() - s) / 20).toFixed(2));
}
