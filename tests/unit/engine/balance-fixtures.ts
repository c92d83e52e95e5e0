// Hand-built supply and demand for the balance tests (invented figures).
import type { DemandOccurrence, FeederClass, Material, SupplyEvent } from "@/lib/engine/types";

export function harvest(date: string, kg: number, binId = "bin-a", actual = false): SupplyEvent {
  return {
    binId,
    date,
    material: "castings",
    amount: kg,
    actual,
    manureFeedstock: false,
    explanation: { text: `test harvest ${kg} kg` },
  };
}

export function collect(date: string, litres: number, binId = "bin-a"): SupplyEvent {
  return { ...harvest(date, litres, binId), material: "leachate" };
}

export function want(
  plantingId: string,
  date: string,
  amount: number,
  opts: { priority?: number; feederClass?: FeederClass; material?: Material } = {},
): DemandOccurrence {
  return {
    plantingId,
    bedId: `bed-${plantingId}`,
    date,
    material: opts.material ?? "castings",
    method: "top-dress",
    amount,
    priority: opts.priority ?? 1,
    feederClass: opts.feederClass ?? "medium",
    explanation: { text: `test demand ${amount}` },
  };
}
