"use client";

import { Badge, Card, CardBody, CardHeader, CardTitle } from "@/components/ui";
import { BinMonthSupply } from "@/components/balance/bin-month-supply";
import { Figure } from "@/components/balance/explanation";
import { LiquidCaution, PreHarvestCaution } from "@/components/balance/feeding-cautions";
import type { GardenNames } from "@/components/balance/garden-names";
import { monthLabel } from "@/components/balance/month-label";
import type { GardenPlan, PlannedFeeding, PlantingCoverage } from "@/lib/engine";
import { formatAmount, formatPercent, formatPoolAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

// One month opened: what each bin made, what each bed wanted, and which
// plantings were fed fully, partly or not at all, and why.

type Group = "covered" | "partly" | "not";

function groupOf(pct: number): Group {
  if (pct >= 99.5) return "covered";
  return pct > 0.5 ? "partly" : "not";
}

const groupTitle: Record<Group, string> = {
  covered: "Fully fed",
  partly: "Partly fed",
  not: "Not fed",
};

const feederWords = {
  heavy: "heavy feeder",
  medium: "medium feeder",
  light: "light feeder",
} as const;

function why(c: PlantingCoverage, feedings: PlannedFeeding[], names: GardenNames): string {
  const p = names.plantings.find((x) => x.id === c.plantingId);
  const rank = `priority ${p?.priority ?? 3}, ${p ? feederWords[p.feederClass] : "feeder class unknown"}`;
  const blocked = feedings.some(
    (f) =>
      f.status === "blocked" ||
      (f.explanation.kind === "pre-harvest-clean-lots" && f.allocated < f.need - 1e-9),
  );
  if (groupOf(c.coveragePct) === "covered")
    return `Everything it wanted was on the shelf (${rank}).`;
  if (blocked)
    return `Inside its pre-harvest interval: only stock from bins without manure may be used (${rank}).`;
  if (c.allocated <= 1e-9) return `Nothing on the shelf when it was due (${rank}).`;
  return `Stock ran short; plantings ranked higher were fed first (${rank}).`;
}

export function MonthDetail({
  plan,
  month,
  names,
  system,
}: {
  plan: GardenPlan;
  month: string;
  names: GardenNames;
  system: UnitSystem;
}) {
  const bedName = (id: string) => names.beds.find((b) => b.id === id)?.name ?? "A bed";
  const plantingName = (id: string) =>
    names.plantings.find((p) => p.id === id)?.label ?? "A planting";
  const feedings = plan.feedings.filter((f) => f.date.startsWith(month));
  const coverage = plan.coverage.filter((c) => c.month === month);
  const liquids = feedings.some((f) => f.material !== "castings");
  const anyBlocked = plan.warnings.some(
    (w) => w.kind === "pre-harvest-block" && w.date?.startsWith(month),
  );
  const groups: Group[] = ["not", "partly", "covered"];
  return (
    <section
      aria-labelledby="month-detail-heading"
      className="flex min-w-0 flex-col gap-3"
      data-testid="month-detail"
    >
      <h2 id="month-detail-heading" className="text-xl">
        {monthLabel(month)} in detail
      </h2>
      <div className="grid gap-3 sm:grid-cols-2">
        <BinMonthSupply plan={plan} month={month} names={names} system={system} />
        <Card>
          <CardHeader>
            <CardTitle as="h3">Wanted by each bed</CardTitle>
          </CardHeader>
          <CardBody>
            <ul className="flex flex-col gap-1">
              {plan.beds
                .map((b) => ({ bedId: b.bedId, m: b.months.find((x) => x.month === month) }))
                .filter((b) => b.m)
                .map(({ bedId, m }) => (
                  <li key={bedId}>
                    {bedName(bedId)}: {formatAmount(m!.castingsKg, "castings-mass", system)}{" "}
                    castings
                    {m!.leachateL > 0
                      ? `, ${formatAmount(m!.leachateL, "liquid", system)} leachate`
                      : ""}
                    {m!.teaL > 0 ? `, ${formatAmount(m!.teaL, "liquid", system)} tea` : ""} ·{" "}
                    {formatPercent(m!.coveragePct / 100)} fed
                  </li>
                ))}
            </ul>
          </CardBody>
        </Card>
      </div>
      {coverage.length === 0 ? (
        <p className="text-soil-700">No feedings fall in this month.</p>
      ) : null}
      {groups.map((g) => {
        const items = coverage.filter((c) => groupOf(c.coveragePct) === g);
        if (items.length === 0) return null;
        return (
          <div key={g} className="flex flex-col gap-1">
            <h3 className="text-lg">
              {groupTitle[g]}{" "}
              <Badge tone={g === "covered" ? "positive" : g === "partly" ? "caution" : "danger"}>
                {items.length}
              </Badge>
            </h3>
            <ul className="flex min-w-0 flex-col gap-2">
              {items.map((c) => {
                const own = feedings.filter(
                  (f) => f.plantingId === c.plantingId && f.material === c.material,
                );
                return (
                  <li
                    key={`${c.plantingId}-${c.material}`}
                    className="rounded-card border border-loam-200 bg-white p-3"
                  >
                    <p className="font-semibold">
                      {plantingName(c.plantingId)} ·{" "}
                      {c.material === "tea" ? "tea (castings brewed)" : c.material}
                    </p>
                    <p>
                      Wanted{" "}
                      <Figure
                        title={plantingName(c.plantingId)}
                        explanation={own[0]?.explanation ?? c.explanation}
                      >
                        {formatPoolAmount(
                          c.need,
                          c.material === "leachate" ? "leachate" : "castings",
                          system,
                        )}
                      </Figure>
                      , fed{" "}
                      <Figure
                        title={`${plantingName(c.plantingId)}, coverage`}
                        explanation={c.explanation}
                      >
                        {formatPoolAmount(
                          c.allocated,
                          c.material === "leachate" ? "leachate" : "castings",
                          system,
                        )}{" "}
                        ({formatPercent(c.coveragePct / 100)})
                      </Figure>
                    </p>
                    <p className="text-sm text-soil-700">{why(c, own, names)}</p>
                  </li>
                );
              })}
            </ul>
          </div>
        );
      })}
      {liquids ? <LiquidCaution /> : null}
      {anyBlocked ? <PreHarvestCaution /> : null}
    </section>
  );
}
