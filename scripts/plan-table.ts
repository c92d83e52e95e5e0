// Readable monthly tables for `npm run plan -- … --format table`, in the
// garden's units (US customary: lb and gal; metric: kg and L). Explanations
// arrive as data ({ kind, inputs } in SI); formatExplanation renders them here.
import type { ExplainValue, Explanation, GardenPlan, UnitSystem } from "@/lib/engine";
import { displayUnits, fromSi, unitLabel } from "@/lib/units";

function pad(cells: string[], widths: number[]): string {
  return cells
    .map((c, i) => (i === 0 ? c.padEnd(widths[i] ?? 0) : c.padStart(widths[i] ?? 0)))
    .join("  ");
}

function table(head: string[], rows: string[][]): string {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length)));
  const line = widths.map((w) => "-".repeat(w)).join("  ");
  return [pad(head, widths), line, ...rows.map((r) => pad(r, widths))].join("\n");
}

const round = (n: number, d = 2) => String(Number(n.toFixed(d)));

/** One SI value in the garden's units. */
export function formatValue(v: ExplainValue, system: UnitSystem): string {
  if ("date" in v) return v.date;
  if ("ref" in v) return v.id;
  if ("text" in v) return v.text;
  if ("default" in v) return `${v.default} (${v.source})`;
  const u = displayUnits(system);
  const m = u.castingsMass;
  const l = u.liquid;
  switch (v.unit) {
    case "kg":
      return `${round(fromSi(v.value, m))} ${unitLabel(m)}`;
    case "kg/week":
      return `${round(fromSi(v.value, m))} ${unitLabel(m)}/week`;
    case "kg/day":
      return `${round(fromSi(v.value, m))} ${unitLabel(m)}/day`;
    case "L":
      return `${round(fromSi(v.value, l), 3)} ${unitLabel(l)}`;
    case "L/day":
      return `${round(fromSi(v.value, l), 4)} ${unitLabel(l)}/day`;
    case "L/week":
      return `${round(fromSi(v.value, l), 3)} ${unitLabel(l)}/week`;
    case "money":
      return `$${v.value.toFixed(2)}`;
    case "money/kg":
      return `$${(v.value / fromSi(1, m)).toFixed(2)}/${unitLabel(m)}`;
    case "percent":
      return `${round(v.value, 1)} %`;
    case "days":
      return `${round(v.value, 0)} days`;
    case "count":
      return round(v.value, 0);
    default:
      return `${round(v.value, 3)} ${v.unit}`;
  }
}

export function formatExplanation(e: Explanation, system: UnitSystem): string {
  const parts = Object.entries(e.inputs).map(([k, v]) => `${k} ${formatValue(v, system)}`);
  return `${e.kind}: ${parts.join(", ")}`;
}

export function renderPlanTable(plan: GardenPlan, system: UnitSystem): string {
  const u = displayUnits(system);
  const mass = (kg: number) => fromSi(kg, u.castingsMass).toFixed(1);
  const liquid = (l: number) => fromSi(l, u.liquid).toFixed(2);
  const m = unitLabel(u.castingsMass);
  const v = unitLabel(u.liquid);
  const out: string[] = [];
  out.push(
    `${plan.garden.name}: ${plan.range.from} to ${plan.range.to} (history replayed to ${plan.asOf})`,
  );
  for (const bin of plan.bins) {
    const worms = bin.months.map((x) => Math.round(x.worms));
    out.push(
      `  ${bin.name}: ${mass(bin.perHarvestKg)} ${m} a harvest every ${bin.harvestIntervalDays.toFixed(0)} days` +
        ` (calibrated ×${bin.calibration.factor.toFixed(2)} from ${bin.calibration.harvestsUsed} logged);` +
        ` leachate ${liquid(bin.leachateLPerDay * 7)} ${v}/week; worms ${worms[0] ?? 0} → ${worms[worms.length - 1] ?? 0}`,
    );
  }
  const rows = (pool: "castings" | "leachate") => plan.rows.filter((r) => r.pool === pool);
  const f = (pool: "castings" | "leachate", n: number) =>
    pool === "castings" ? mass(n) : liquid(n);
  for (const pool of ["castings", "leachate"] as const) {
    out.push(
      "",
      pool === "castings"
        ? `Castings (${m}; tea is brewed from castings on the day)`
        : `Leachate (${v}; collected daily, kept at most the garden's max age)`,
    );
    out.push(
      table(
        ["month", "opening", "in", "demand", "allocated", "aged out", "closing", "shortfall"],
        rows(pool).map((r) => [
          r.month + (r.replayed ? "*" : ""),
          f(pool, r.opening),
          f(pool, r.supplied),
          f(pool, r.demand),
          f(pool, r.allocated),
          f(pool, r.agedOut),
          f(pool, r.closing),
          f(pool, r.shortfall),
        ]),
      ),
    );
  }
  const short = plan.coverage
    .filter((c) => c.coveragePct < 99.95)
    .sort((x, y) => x.month.localeCompare(y.month));
  out.push(
    "",
    `First shortfall: castings ${plan.firstShortfall.castings ?? "none"}, leachate ${plan.firstShortfall.leachate ?? "none"}`,
  );
  if (short.length > 0) {
    out.push("Plantings not fully covered:");
    for (const c of short.slice(0, 20))
      out.push(`  ${c.month}  ${c.plantingId} (${c.material}): ${c.coveragePct.toFixed(0)} %`);
    if (short.length > 20) out.push(`  … and ${short.length - 20} more`);
  }
  out.push(
    `Surplus: ${mass(plan.surplus.castingsKg)} ${m}, worth $${plan.surplus.value.toFixed(2)}`,
  );
  if (plan.gap?.needed) {
    out.push("", "To close the castings gap:");
    for (const s of plan.gap.suggestions)
      out.push(`  - ${formatExplanation(s.explanation, system)}`);
    for (const x of plan.gap.unavailable)
      out.push(`  - not possible (${x.kind}): ${formatExplanation(x.explanation, system)}`);
  }
  if (plan.warnings.length > 0) out.push("", "Warnings:");
  for (const w of plan.warnings)
    out.push(`  [${w.kind}] ${formatExplanation(w.explanation, system)}`);
  return `${out.join("\n")}\n`;
}
