import {
  addDays,
  dflt,
  toDayNumber,
  type GardenInputs,
  type GardenPlan,
  type MonthRow,
  type PlannedFeeding,
  type PlanWarning,
} from "@/lib/engine";

// What the overview says about today, worked out from the plan: pure, so the
// page stays a thin server component.

/** Lots this close to the end of their keeping time are flagged "use soon". */
const NEAR_END_DAYS = 14;

export interface LotOnHand {
  id: string;
  binId: string | null;
  material: "castings" | "leachate";
  producedOn: string;
  remainingSi: number;
}

export interface GardenStatus {
  thisMonth: MonthRow[];
  nextHarvests: { binId: string; date: string; amountKg: number | null }[];
  dueThisWeek: PlannedFeeding[];
  stock: (LotOnHand & { keepsUntil: string; nearEnd: boolean })[];
  warnings: PlanWarning[];
}

const WARNING_KINDS = new Set<PlanWarning["kind"]>([
  "capacity-intake",
  "capacity-surface",
  "pre-harvest-block",
  "harvest-not-logged",
]);

export function gardenStatus(
  plan: GardenPlan,
  inputs: GardenInputs,
  lots: LotOnHand[],
): GardenStatus {
  const today = plan.asOf;
  const weekEnd = addDays(today, 6);
  const shelf = inputs.settings.shelfLifeDays ?? dflt("castingsShelfLifeDays");
  const liquidDays = inputs.settings.liquidMaxAgeDays ?? dflt("liquidMaxAgeDays");
  const stock = lots
    .filter((l) => l.remainingSi > 1e-6)
    .map((l) => {
      const keepsUntil = addDays(l.producedOn, l.material === "castings" ? shelf : liquidDays);
      return {
        ...l,
        keepsUntil,
        nearEnd: toDayNumber(keepsUntil) - toDayNumber(today) <= NEAR_END_DAYS,
      };
    })
    .filter((l) => l.keepsUntil >= today);
  return {
    thisMonth: plan.rows.filter((r) => r.month === today.slice(0, 7)),
    nextHarvests: plan.bins
      .flatMap((b) =>
        b.tasks
          .filter((t) => t.kind === "harvest-tray")
          .map((t) => ({ binId: b.binId, date: t.date, amountKg: t.amount })),
      )
      .sort((a, b) => (a.date < b.date ? -1 : 1))
      .slice(0, 4),
    dueThisWeek: plan.feedings.filter(
      (f) => f.status !== "logged" && f.date >= today && f.date <= weekEnd,
    ),
    stock,
    warnings: plan.warnings.filter((w) => WARNING_KINDS.has(w.kind)),
  };
}
