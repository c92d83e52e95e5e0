// GardenInputs (SI) → scenario file: the inverse of ./to-inputs.ts, used by the
// garden export. Every quantity is written in SI units ("m", "L", "kg", "kg"
// per "m2") so nothing is rounded by a conversion on the way out and back in,
// and every GardenInputs field the engine reads is written when it is not the
// engine default (null), so database → export → import gives the same inputs.
import type { FeedingRuleInput, GardenInputs } from "@/lib/engine";
import type { GardenRecords } from "@/lib/scenario/records";
import { toSi } from "@/lib/units";
import { SCENARIO_FORMAT, cropKey, type Scenario } from "@/lib/validation/scenario";

const pad = (n: number) => String(n).padStart(2, "0");
const m = (value: number) => ({ value, unit: "m" as const });
const litres = (value: number) => ({ value, unit: "L" as const });
const kg = (value: number) => ({ value, unit: "kg" as const });

/** A rule's amount as the scenario writes it; volumes go as the plain SI number the engine takes. */
function ruleAmount(r: FeedingRuleInput) {
  if (r.measure === "percent-of-mix" || r.measure === "volume") return r.amount;
  if (r.basis === "per-plant") return kg(r.amount);
  // kg per m² of bed, or kg per L of container soil.
  return { ...kg(r.amount), per: r.basis === "per-area" ? "m2" : "L" };
}

/** A rule as the scenario writes it. */
function ruleOut(r: FeedingRuleInput) {
  return {
    material: r.material,
    method: r.method,
    basis: r.basis,
    amount: ruleAmount(r),
    recurrence: r.recurrence,
    dilutionWaterParts: r.dilutionWaterParts ?? undefined,
    teaCastingsPerWater: r.teaCastingsPerWater ?? undefined,
  };
}

/** GardenInputs (+ what the export carries beyond them) → scenario file. */
export function inputsToScenario(inputs: GardenInputs, records: GardenRecords): Scenario {
  const { settings, logs } = inputs;
  const { bedSizes } = records;
  const md = (d: { month: number; day: number }) => `${pad(d.month)}-${pad(d.day)}`;
  const opt = <T>(v: T | null | undefined) => (v === null ? undefined : v);
  const listed = new Set(records.crops.map((c) => cropKey(c)));
  // A planting with no rules of its own, whose crop is listed, inherits the crop's:
  // writing none keeps it inheriting after an import.
  const plantingRules = (p: GardenInputs["plantings"][number]) =>
    records.ownRules.has(p.id) || !listed.has(cropKey(p)) ? p.rules : [];
  const scenario = {
    format: SCENARIO_FORMAT,
    version: 1,
    garden: { name: inputs.garden.name, location: opt(records.location) },
    settings: {
      unitSystem: settings.unitSystem,
      timeZone: settings.timeZone,
      lastSpringFrost: md(settings.lastSpringFrost),
      firstFallFrost: md(settings.firstFallFrost),
      asOf: inputs.asOf,
      pricePerLb:
        settings.castingsPricePerKg === null
          ? undefined
          : settings.castingsPricePerKg * toSi(1, "lb"),
      shelfLifeDays: opt(settings.shelfLifeDays),
      liquidMaxAgeDays: opt(settings.liquidMaxAgeDays),
      teaCastingsPerWater: opt(settings.teaCastingsPerWater),
    },
    bins: inputs.bins.map((b) => ({
      id: b.id,
      name: b.name,
      startDate: b.startDate,
      trays: b.trays,
      tray: {
        inside: {
          length: m(b.tray.insideLengthM),
          width: m(b.tray.insideWidthM),
          depth: m(b.tray.insideDepthM),
        },
      },
      rotationIntervalDays: opt(b.rotationIntervalDays),
      processingDays: opt(b.processingDays),
      fillFraction: opt(b.fillFraction),
      bulkDensityKgPerL: opt(b.bulkDensityKgPerL),
      dormantMonths: b.dormantMonths,
      manureFeedstock: b.manureFeedstock,
      worms: b.startingWorms,
      leachateEstimatePerWeek:
        b.leachateEstimateLPerWeek === null ? undefined : litres(b.leachateEstimateLPerWeek),
      intakeFractionPerDay: opt(b.intakeFractionPerDay),
      densityCeiling:
        b.densityCeilingKgPerM2 === null
          ? undefined
          : { ...kg(b.densityCeilingKgPerM2), per: "m2" as const },
      retiredOn: opt(b.retiredOn),
      drainIntervalDays: opt(records.binDrainIntervalDays.get(b.id)),
      logs: {
        harvests: logs.harvests
          .filter((h) => h.binId === b.id)
          .map((h) => ({
            id: h.id,
            date: h.date,
            amount: kg(h.castingsKg),
            predicted: h.predictedKg === null ? undefined : kg(h.predictedKg),
          })),
        leachate: logs.drains
          .filter((d) => d.binId === b.id)
          .map((d) => ({ id: d.id, date: d.date, volume: litres(d.litres) })),
      },
    })),
    beds: inputs.beds.map((b) =>
      b.kind === "bed"
        ? {
            id: b.id,
            name: b.name,
            kind: "bed" as const,
            indoor: b.indoor,
            length: m(bedSizes.get(b.id)?.lengthM ?? Math.sqrt(b.areaM2 ?? 0)),
            width: m(bedSizes.get(b.id)?.widthM ?? Math.sqrt(b.areaM2 ?? 0)),
            notes: opt(records.bedNotes.get(b.id)),
          }
        : {
            id: b.id,
            name: b.name,
            kind: "container" as const,
            indoor: b.indoor,
            volume: litres(b.containerVolumeL ?? 0),
            notes: opt(records.bedNotes.get(b.id)),
          },
    ),
    crops: records.crops.map((c) => ({
      name: c.name,
      feederClass: c.feederClass,
      edible: c.edible,
      edibleTouchesSoil: c.edibleTouchesSoil,
      daysToHarvest: opt(c.daysToHarvest),
      spacing: c.spacingM === null ? undefined : m(c.spacingM),
      rules: c.rules.length ? c.rules.map(ruleOut) : undefined,
    })),
    plantings: inputs.plantings.map((p) => ({
      id: p.id,
      bedId: p.bedId,
      crop: opt(p.crop),
      feederClass: p.feederClass,
      plantCount: p.plantCount,
      startDate: p.startDate,
      endDate: opt(p.endDate),
      harvestDate: opt(p.harvestDate),
      priority: opt(p.priority),
      edible: p.edible,
      edibleTouchesSoil: p.edibleTouchesSoil,
      rules: plantingRules(p).length ? plantingRules(p).map(ruleOut) : undefined,
    })),
    stock: {
      lots: inputs.stockLots.map((l) => ({
        id: l.id,
        binId: opt(l.binId),
        material: l.material,
        madeOn: l.madeOn,
        amount: l.material === "castings" ? kg(l.amount) : litres(l.amount),
        manureFeedstock: opt(l.manureFeedstock),
        pricePerKg: opt(records.lotDetails.get(l.id)?.pricePerKg),
        note: opt(records.lotDetails.get(l.id)?.note),
      })),
    },
    logs: {
      applications: logs.applications.map((a) => ({
        id: a.id,
        plantingId: a.plantingId,
        date: a.date,
        material: a.material,
        method: a.method,
        amount: a.material === "castings" ? kg(a.amount) : litres(a.amount),
        plannedFeedingId: opt(a.plannedFeedingId),
        draws: a.draws.map((d) => ({
          lotId: d.lotId,
          amount: a.material === "leachate" ? litres(d.amount) : kg(d.amount),
        })),
      })),
      adjustments: logs.adjustments.map((a) => {
        const leachate =
          inputs.logs.drains.some((d) => d.id === a.lotId) ||
          inputs.stockLots.some((l) => l.id === a.lotId && l.material === "leachate");
        return {
          id: a.id,
          lotId: a.lotId,
          date: a.date,
          amount: leachate ? litres(a.amount) : kg(a.amount),
          reason: a.reason,
          note: opt(a.note),
        };
      }),
      wormMoves: logs.wormMoves.map((w) => ({
        id: w.id,
        date: w.date,
        fromBinId: opt(w.fromBinId),
        toBinId: opt(w.toBinId),
        worms: w.worms,
      })),
      observations: logs.observations.map((o) => ({
        id: o.id,
        binId: o.binId,
        date: o.date,
        wormCount: opt(o.wormCount),
        temperatureC: opt(o.temperatureC),
        moisturePercent: opt(o.moisturePercent),
        note: opt(o.note),
      })),
    },
  };
  // JSON drops the undefined fields, so the file carries only what was set.
  return JSON.parse(JSON.stringify(scenario)) as Scenario;
}
