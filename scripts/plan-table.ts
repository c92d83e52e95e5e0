// Readable monthly tables for `npm run plan -- … --format table`, in the
// garden's units (US customary: lb and gal; metric: kg and L).
import type { GardenPlan } from "@/lib/engine/plan";
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

export function renderPlanTable(plan: GardenPlan): string {
  const u = displayUnits(plan.garden.unitSystem);
  const mass = (kg: number) => fromSi(kg, u.castingsMass).toFixed(1);
  const liquid = (l: number) => fromSi(l, u.liquid).toFixed(2);
  const m = unitLabel(u.castingsMass);
  const v = unitLabel(u.liquid);
  const b = plan.balance;
  const out: string[] = [];
  out.push(`${plan.garden.name}: ${plan.range.from} to ${plan.range.to}`);
  for (const bin of plan.bins) {
    out.push(
      `  ${bin.name}: ${mass(bin.perHarvestKg)} ${m} a harvest every ${bin.harvestIntervalDays.toFixed(0)} days, ` +
        `${bin.harvestsInRange} harvests in range; leachate ${bin.leachate.explanation.text}`,
    );
  }
  out.push("", `Castings (${m})`);
  out.push(
    table(
      ["month", "opening", "supply", "demand", "allocated", "aged out", "closing", "shortfall"],
      b.castings.map((r) => [
        r.month,
        mass(r.opening),
        mass(r.supplied),
        mass(r.demand),
        mass(r.allocated),
        mass(r.agedOut),
        mass(r.closing),
        mass(r.shortfall),
      ]),
    ),
  );
  out.push("", `Leachate (${v}; it does not keep, so what is not used on its day is unused)`);
  out.push(
    table(
      ["month", "collected", "demand", "fed", "unused", "shortfall"],
      b.leachate.map((r) => [
        r.month,
        liquid(r.supplied),
        liquid(r.demand),
        liquid(r.allocated),
        liquid(r.agedOut),
        liquid(r.shortfall),
      ]),
    ),
  );
  const tea = b.castings.filter((r) => r.teaLitres > 0);
  if (tea.length > 0) {
    out.push("", `Tea (brewed on the day from castings; never carried over)`);
    out.push(
      table(
        ["month", `tea ${v}`, `castings ${m}`, `covered ${m}`],
        tea.map((r) => [
          r.month,
          liquid(r.teaLitres),
          mass(r.teaCastingsDemand),
          mass(r.teaCastingsAllocated),
        ]),
      ),
    );
  }
  const short = b.coverage
    .filter((c) => c.coveragePct < 99.95)
    .sort((x, y) => x.month.localeCompare(y.month));
  out.push(
    "",
    `First shortfall: castings ${b.firstShortfall.castings ?? "none"}, leachate ${b.firstShortfall.leachate ?? "none"}`,
  );
  if (short.length > 0) {
    out.push("Plantings not fully covered:");
    for (const c of short.slice(0, 20))
      out.push(`  ${c.month}  ${c.plantingId} (${c.material}): ${c.coveragePct.toFixed(0)} %`);
    if (short.length > 20) out.push(`  … and ${short.length - 20} more`);
  }
  out.push(
    `Surplus: ${mass(b.surplus.castingsKg)} ${m}, worth $${b.surplus.value.toFixed(2)} at $${b.surplus.pricePerLb.toFixed(2)} per lb`,
  );
  out.push(`Blocked dates (reported, not fed): ${b.blocked.items.length}`);
  if (plan.gap?.needed) {
    out.push("", "To close the castings gap:");
    for (const s of plan.gap.suggestions) out.push(`  - ${s.explanation.text}`);
    for (const x of plan.gap.unavailable)
      out.push(`  - not possible (${x.kind}): ${x.explanation.text}`);
  }
  for (const w of plan.demand.warnings) out.push(`Warning ${w.plantingId}: ${w.text}`);
  for (const n of b.notes) out.push(`Note: ${n.text}`);
  return `${out.join("\n")}\n`;
}
