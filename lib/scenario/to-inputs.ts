// Scenario file (units as typed) → GardenInputs (SI). Lives outside lib/engine
// because it reads the scenario's zod types (lib/validation) and feeds the
// engine: engine ← scenario → validation, with no cycle. The database adapter
// (db/queries) builds the same GardenInputs from rows; ./to-scenario.ts is the
// way back, so this folder owns the format both ways.
import { EngineInputError } from "@/lib/engine";
import type {
  BedInput,
  BinInput,
  FeedingRuleInput,
  GardenInputs,
  MonthDay,
  PlantingInput,
  TrayInput,
} from "@/lib/engine";
import { dflt, trayInsideFromOuter } from "@/lib/engine";
import {
  cropKey,
  ownRulesOf,
  scenarioDrainId,
  scenarioHarvestId,
  type Scenario,
  type ScenarioBed,
  type ScenarioBin,
  type ScenarioPlanting,
} from "@/lib/validation/scenario";
import type { GardenRecords } from "@/lib/scenario/records";
import { si, siRatio } from "@/lib/validation/scenario-quantity";
import { quantityOf, toSi, type UnitName } from "@/lib/units";

type Rule = NonNullable<ScenarioPlanting["rule"]>;
const NO_RULES: readonly Rule[] = [];

/** Castings typed by volume (a cup, a litre) are weighed at the default bulk density. */
function castingsKg(q: { value: number; unit: string }): number {
  const v = si(q as never);
  return quantityOf(q.unit as UnitName) === "mass" ? v : v * dflt("castingsBulkDensityKgPerL");
}

export { scenarioDrainId, scenarioHarvestId };

export function monthDay(value: string, field: string): MonthDay {
  const m = /^(?:\d{4}-)?(\d{2})-(\d{2})$/.exec(value);
  if (!m) throw new EngineInputError(field, `must be a month and day written MM-DD (got ${value})`);
  return { month: Number(m[1]), day: Number(m[2]) };
}

export function trayInput(bin: ScenarioBin, field: string): TrayInput {
  const t = bin.tray;
  if ("inside" in t)
    return {
      insideLengthM: si(t.inside.length),
      insideWidthM: si(t.inside.width),
      insideDepthM: si(t.inside.depth),
    };
  const box = trayInsideFromOuter(
    {
      outerLengthM: si(t.outside.length),
      outerWidthM: si(t.outside.width),
      board: t.board as never,
    },
    `${field}.tray.outside`,
  );
  return { insideLengthM: box.lengthM, insideWidthM: box.widthM, insideDepthM: box.depthM };
}

function binInput(bin: ScenarioBin, field: string): BinInput {
  return {
    id: bin.id,
    name: bin.name ?? bin.id,
    startDate: bin.startDate,
    trays: bin.trays,
    tray: trayInput(bin, field),
    rotationIntervalDays: bin.rotationIntervalDays ?? null,
    processingDays: bin.processingDays ?? null,
    fillFraction: bin.fillFraction ?? null,
    bulkDensityKgPerL: bin.bulkDensityKgPerL ?? null,
    dormantMonths: bin.dormantMonths ?? [],
    manureFeedstock: bin.manureFeedstock ?? false,
    startingWorms: bin.worms ?? 0,
    leachateEstimateLPerWeek: bin.leachateEstimatePerWeek ? si(bin.leachateEstimatePerWeek) : null,
    intakeFractionPerDay: bin.intakeFractionPerDay ?? null,
    densityCeilingKgPerM2: bin.densityCeiling ? siRatio(bin.densityCeiling) : null,
    retiredOn: bin.retiredOn ?? null,
  };
}

function bedInput(bed: ScenarioBed): BedInput {
  if (bed.kind === "bed")
    return {
      id: bed.id,
      name: bed.name ?? bed.id,
      kind: "bed",
      indoor: bed.indoor ?? false,
      areaM2: si(bed.length) * si(bed.width),
      containerVolumeL: null,
    };
  return {
    id: bed.id,
    name: bed.name ?? bed.id,
    kind: "container",
    indoor: bed.indoor ?? false,
    areaM2: null,
    containerVolumeL: si(bed.volume),
  };
}

export function ruleInput(rule: Rule): FeedingRuleInput {
  const base = {
    material: rule.material,
    method: rule.method,
    basis: rule.basis,
    recurrence: rule.recurrence,
    dilutionWaterParts: rule.dilutionWaterParts ?? null,
    teaCastingsPerWater: rule.teaCastingsPerWater ?? null,
  };
  const a = rule.amount;
  if (rule.basis === "percent-of-mix")
    return { ...base, measure: "percent-of-mix", amount: typeof a === "number" ? a : a.value };
  if (typeof a === "number") return { ...base, measure: "volume", amount: a };
  const unit = a.unit as UnitName;
  const kind = quantityOf(unit);
  if (kind === "mass") {
    const per = a.per === undefined ? 1 : toSi(1, a.per as UnitName);
    return { ...base, measure: "mass", amount: toSi(a.value, unit) / per };
  }
  if (rule.basis === "per-area" && kind === "length") {
    // A depth: 1 mm over 1 m² is 1 L.
    return { ...base, measure: "volume", amount: toSi(a.value, unit) * 1000 };
  }
  const per = a.per === undefined ? 1 : toSi(1, a.per as UnitName);
  return { ...base, measure: "volume", amount: toSi(a.value, unit) / per };
}

/** `inherited`: the rules of the planting's crop (crops[]), used when it has none of its own. */
function plantingInput(p: ScenarioPlanting, inherited: readonly Rule[]): PlantingInput {
  const own = ownRulesOf(p);
  return {
    id: p.id,
    bedId: p.bedId,
    crop: p.crop ?? null,
    feederClass: p.feederClass,
    plantCount: p.plantCount,
    startDate: p.startDate,
    endDate: p.endDate ?? null,
    harvestDate: p.harvestDate ?? null,
    priority: p.priority ?? null,
    edible: p.edible ?? true,
    edibleTouchesSoil: p.edibleTouchesSoil ?? false,
    rules: (own.length ? own : inherited).map(ruleInput),
  };
}

/**
 * The scenario as the engine takes it. `asOf` defaults to the scenario's settings.asOf.
 * Logs dated after `asOf` (and stock made after it) are left out, as the database
 * adapter does: the plan replays history up to and including asOf and forecasts after it.
 */
export function scenarioToInputs(
  s: Scenario,
  opts: { asOf?: string; gardenId?: string } = {},
): GardenInputs {
  const asOf = opts.asOf ?? s.settings.asOf;
  if (asOf === undefined)
    throw new EngineInputError("settings.asOf", "is needed: the last day of logged history");
  const upToAsOf = <T extends { date: string }>(rows: readonly T[] | undefined): T[] =>
    (rows ?? []).filter((r) => r.date <= asOf);
  const harvests = s.bins.flatMap((b) =>
    upToAsOf(b.logs?.harvests).map((h) => ({
      id: h.id ?? scenarioHarvestId(b.id, h.date),
      binId: b.id,
      date: h.date,
      castingsKg: si(h.amount),
      predictedKg: h.predicted ? si(h.predicted) : null,
    })),
  );
  const drains = s.bins.flatMap((b) =>
    upToAsOf(b.logs?.leachate).map((d) => ({
      id: d.id ?? scenarioDrainId(b.id, d.date),
      binId: b.id,
      date: d.date,
      litres: si(d.volume),
    })),
  );
  const logs = s.logs ?? {};
  const cropRules = new Map((s.crops ?? []).map((c) => [cropKey(c), c.rules ?? NO_RULES]));
  // What each lot holds, so an adjustment typed by volume is weighed like its lot.
  const leachateLots = new Set([
    ...drains.map((d) => d.id),
    ...(s.stock?.lots ?? []).filter((l) => l.material === "leachate").map((l) => l.id),
  ]);
  return {
    garden: { id: opts.gardenId ?? s.garden.name, name: s.garden.name },
    settings: {
      unitSystem: s.settings.unitSystem,
      timeZone: s.settings.timeZone,
      lastSpringFrost: monthDay(s.settings.lastSpringFrost, "settings.lastSpringFrost"),
      firstFallFrost: monthDay(s.settings.firstFallFrost, "settings.firstFallFrost"),
      shelfLifeDays: s.settings.shelfLifeDays ?? null,
      liquidMaxAgeDays: s.settings.liquidMaxAgeDays ?? null,
      castingsPricePerKg:
        s.settings.pricePerLb === undefined ? null : s.settings.pricePerLb / toSi(1, "lb"),
      teaCastingsPerWater: s.settings.teaCastingsPerWater ?? null,
    },
    bins: s.bins.map((b, i) => binInput(b, `bins[${i}]`)),
    beds: s.beds.map(bedInput),
    plantings: s.plantings.map((p) => plantingInput(p, cropRules.get(cropKey(p)) ?? NO_RULES)),
    stockLots: (s.stock?.lots ?? [])
      .filter((l) => l.madeOn <= asOf)
      .map((l) => ({
        id: l.id,
        binId: l.binId ?? null,
        material: l.material ?? "castings",
        madeOn: l.madeOn,
        amount: si(l.amount),
        manureFeedstock: l.manureFeedstock ?? null,
      })),
    logs: {
      harvests,
      drains,
      // Ids by position in the whole file, so a later asOf keeps the earlier ids.
      applications: (logs.applications ?? [])
        .map((a, i) => ({
          id: a.id ?? `application-${i + 1}`,
          plantingId: a.plantingId,
          date: a.date,
          material: a.material,
          method: a.method,
          amount: a.material === "castings" ? castingsKg(a.amount) : si(a.amount),
          plannedFeedingId: a.plannedFeedingId ?? null,
          draws: (a.draws ?? []).map((d) => ({
            lotId: d.lotId,
            amount: a.material === "leachate" ? si(d.amount) : castingsKg(d.amount),
          })),
        }))
        .filter((a) => a.date <= asOf),
      adjustments: (logs.adjustments ?? [])
        .map((a, i) => ({
          id: a.id ?? `adjustment-${i + 1}`,
          lotId: a.lotId,
          date: a.date,
          amount: leachateLots.has(a.lotId) ? si(a.amount) : castingsKg(a.amount),
          reason: a.reason,
          note: a.note ?? null,
        }))
        .filter((a) => a.date <= asOf),
      wormMoves: (logs.wormMoves ?? [])
        .map((m, i) => ({
          id: m.id ?? `worm-move-${i + 1}`,
          date: m.date,
          fromBinId: m.fromBinId ?? null,
          toBinId: m.toBinId ?? null,
          worms: m.worms,
        }))
        .filter((m) => m.date <= asOf),
      observations: (logs.observations ?? [])
        .map((o, i) => ({
          id: o.id ?? `observation-${i + 1}`,
          binId: o.binId,
          date: o.date,
          wormCount: o.wormCount ?? null,
          temperatureC: o.temperatureC ?? null,
          moisturePercent: o.moisturePercent ?? null,
          note: o.note ?? null,
        }))
        .filter((o) => o.date <= asOf),
    },
    asOf,
  };
}

/** What the file says beyond GardenInputs (lib/scenario/records.ts), ids as in the file. */
export function scenarioRecords(s: Scenario): GardenRecords {
  const bedSizes = new Map<string, { lengthM: number; widthM: number }>();
  for (const b of s.beds)
    if (b.kind === "bed") bedSizes.set(b.id, { lengthM: si(b.length), widthM: si(b.width) });
  return {
    location: s.garden.location ?? null,
    bedSizes,
    bedNotes: new Map(s.beds.flatMap((b) => (b.notes === undefined ? [] : [[b.id, b.notes]]))),
    binDrainIntervalDays: new Map(
      s.bins.flatMap((b) =>
        b.drainIntervalDays === undefined ? [] : [[b.id, b.drainIntervalDays]],
      ),
    ),
    lotDetails: new Map(
      (s.stock?.lots ?? []).map((l) => [
        l.id,
        { pricePerKg: l.pricePerKg ?? null, note: l.note ?? null },
      ]),
    ),
    crops: (s.crops ?? []).map((c) => ({
      name: c.name,
      feederClass: c.feederClass,
      edible: c.edible ?? true,
      edibleTouchesSoil: c.edibleTouchesSoil ?? false,
      daysToHarvest: c.daysToHarvest ?? null,
      spacingM: c.spacing ? si(c.spacing) : null,
      rules: (c.rules ?? []).map(ruleInput),
    })),
    ownRules: new Map(
      s.plantings.flatMap((p) => {
        const own = ownRulesOf(p);
        return own.length ? [[p.id, own.map(ruleInput)]] : [];
      }),
    ),
  };
}
