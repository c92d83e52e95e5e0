import type { FeederClass, GardenInputs } from "@/lib/engine";

export type BinKind = "stacked-tray" | "single" | "flow-through";

// What the Balance needs to put names on the engine's ids (the plan carries ids
// only). Built on the server from the garden's inputs, passed to the client.
export interface GardenNames {
  bins: {
    id: string;
    name: string;
    trays: number;
    rotationIntervalDays: number | null;
    startDate: string;
    startingWorms: number;
    /** From the bins table (the engine does not need it); null when not given. */
    kind: BinKind | null;
  }[];
  beds: { id: string; name: string }[];
  plantings: {
    id: string;
    label: string;
    bedId: string;
    feederClass: FeederClass;
    priority: number | null;
    edible: boolean;
    /** The planting's own rule (null: its feeder class default). SI in the rule's measure. */
    rule: { material: string; measure: string; basis: string; amount: number } | null;
  }[];
}

export function gardenNamesFrom(
  inputs: GardenInputs,
  binKinds: { id: string; kind: BinKind }[] = [],
): GardenNames {
  const bedName = new Map(inputs.beds.map((b) => [b.id, b.name]));
  const kindOf = new Map(binKinds.map((b) => [b.id, b.kind]));
  return {
    bins: inputs.bins.map((b) => ({
      id: b.id,
      name: b.name,
      trays: b.trays,
      rotationIntervalDays: b.rotationIntervalDays,
      startDate: b.startDate,
      startingWorms: b.startingWorms,
      kind: kindOf.get(b.id) ?? null,
    })),
    beds: inputs.beds.map((b) => ({ id: b.id, name: b.name })),
    plantings: inputs.plantings.map((p) => ({
      id: p.id,
      label: `${p.crop ?? "Planting"} (${p.plantCount}) in ${bedName.get(p.bedId) ?? "a bed"}`,
      bedId: p.bedId,
      feederClass: p.feederClass,
      priority: p.priority,
      edible: p.edible,
      // The first rule: a what-if amount is in its measure (lib/balance/what-if.ts).
      rule: p.rules[0]
        ? {
            material: p.rules[0].material,
            measure: p.rules[0].measure,
            basis: p.rules[0].basis,
            amount: p.rules[0].amount,
          }
        : null,
    })),
  };
}

/** A lookup for lib/explain-sentences: the name of a bin, bed, planting or lot. */
export function nameLookup(names: GardenNames) {
  const map = new Map<string, string>();
  for (const b of names.bins) map.set(`bin:${b.id}`, b.name);
  for (const b of names.beds) map.set(`bed:${b.id}`, b.name);
  for (const p of names.plantings) map.set(`planting:${p.id}`, p.label);
  return (ref: string, id: string) => map.get(`${ref}:${id}`);
}
