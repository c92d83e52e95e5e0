// One call for the whole garden: forecast every bin → expand every planting's
// rule → balance supply against demand → suggest how to close a shortfall.
// Returns everything the Balance screen and the CLI show.
import { computeBalance } from "@/lib/engine/balance";
import { monthSpans } from "@/lib/engine/balance-days";
import type { BalanceInput, BalanceResult } from "@/lib/engine/balance-types";
import { fromDayNumber, type DateRange } from "@/lib/engine/dates";
import { dflt } from "@/lib/engine/defaults";
import { expandDemand, type DemandWarning } from "@/lib/engine/demand";
import { forecastCastings, type Calibration } from "@/lib/engine/forecast";
import { closeGap } from "@/lib/engine/gap";
import type { GapContext, GapReport } from "@/lib/engine/gap-types";
import { forecastLeachate, teaCastingsNeeded, type LeachateRate } from "@/lib/engine/liquid";
import {
  bedInput,
  binForecastInput,
  leachateInput,
  openingLots,
  plantingInput,
} from "@/lib/engine/plan-inputs";
import type { Explanation, SupplyEvent } from "@/lib/engine/types";
import type { Scenario } from "@/lib/validation/scenario";
import type { UnitSystem } from "@/lib/units";

export interface PlanOptions {
  /** First month, "YYYY-MM". */
  from: string;
  /** Default 12. */
  months?: number;
  /** Compute gap-closing suggestions (several more balance runs); default true. */
  suggestions?: boolean;
}

export interface BinPlan {
  binId: string;
  name: string;
  perHarvestKg: number;
  harvestIntervalDays: number;
  calibration: Calibration;
  harvestsInRange: number;
  castingsExplanation: Explanation;
  leachate: LeachateRate;
}

export interface GardenPlan {
  garden: { name: string; unitSystem: UnitSystem; timeZone: string };
  range: DateRange;
  months: string[];
  bins: BinPlan[];
  demand: { applications: number; blocked: number; warnings: DemandWarning[] };
  balance: BalanceResult;
  /** null when suggestions were not asked for. */
  gap: GapReport | null;
}

export function planGarden(scenario: Scenario, options: PlanOptions): GardenPlan {
  const months = options.months ?? 12;
  const spans = monthSpans(options.from, months, "from");
  const range: DateRange = {
    from: fromDayNumber(spans[0]!.startDay),
    to: fromDayNumber(spans[spans.length - 1]!.endDay - 1),
  };
  const asOf = scenario.settings.asOf;

  const supply: SupplyEvent[] = [];
  const bins: BinPlan[] = [];
  let largest: { index: number; kg: number } | null = null;
  scenario.bins.forEach((bin, i) => {
    const field = `bins[${i}]`;
    const input = binForecastInput(bin, asOf, field);
    const c = forecastCastings(input, range, field);
    const l = forecastLeachate(leachateInput(bin, asOf), range, field);
    for (const e of c.events) supply.push(e);
    for (const e of l.events) supply.push(e);
    if (!largest || c.perHarvestKg > largest.kg) largest = { index: i, kg: c.perHarvestKg };
    bins.push({
      binId: bin.id,
      name: bin.name ?? bin.id,
      perHarvestKg: c.perHarvestKg,
      harvestIntervalDays: c.harvestIntervalDays,
      calibration: c.calibration,
      harvestsInRange: c.events.length,
      castingsExplanation: c.explanation,
      leachate: l.rate,
    });
  });

  const bedsById = new Map(scenario.beds.map((b) => [b.id, b]));
  const plantings = scenario.plantings.map((p, i) => {
    const bed = bedsById.get(p.bedId);
    if (!bed) throw new Error(`plantings[${i}].bedId: no bed with id "${p.bedId}"`);
    return plantingInput(p, bed, scenario, range, `plantings[${i}]`);
  });
  const demand = expandDemand({
    plantings,
    beds: scenario.beds.map(bedInput),
    options: {
      range,
      season: {
        lastSpringFrost: scenario.settings.lastSpringFrost,
        firstFallFrost: scenario.settings.firstFallFrost,
      },
      manureFeedstock: scenario.bins.some((b) => b.manureFeedstock),
    },
  });

  const balanceInput: BalanceInput = {
    supply,
    demand: demand.occurrences,
    blocked: demand.blocked,
    openingLots: openingLots(scenario, range.from),
    options: {
      from: spans[0]!.month,
      months,
      shelfLifeDays: scenario.settings.shelfLifeDays,
      leachateKeepDays: scenario.settings.leachateKeepDays,
      pricePerLb: scenario.settings.pricePerLb,
      teaCastingsKgPerLitre: teaCastingsNeeded(1, {
        castingsPerWater: scenario.settings.teaCastingsPerWater,
      }),
    },
  };
  const balance = computeBalance(balanceInput);
  const gap =
    options.suggestions === false
      ? null
      : closeGap(gapContext(scenario, balanceInput, largest, asOf, range), balance);

  return {
    garden: {
      name: scenario.garden.name,
      unitSystem: scenario.settings.unitSystem,
      timeZone: scenario.settings.timeZone,
    },
    range,
    months: balance.months,
    bins,
    demand: {
      applications: demand.occurrences.length,
      blocked: demand.blocked.length,
      warnings: demand.warnings,
    },
    balance,
    gap,
  };
}

function gapContext(
  scenario: Scenario,
  base: BalanceInput,
  largest: { index: number; kg: number } | null,
  asOf: string | undefined,
  range: DateRange,
): GapContext {
  if (!largest) return { base };
  const bin = scenario.bins[largest.index]!;
  const field = `bins[${largest.index}]`;
  const input = binForecastInput(bin, asOf, field);
  return {
    base,
    tray: {
      binId: bin.id,
      kgPerTray: largest.kg,
      processingDays: bin.processingDays ?? dflt("processingDays"),
      manureFeedstock: bin.manureFeedstock ?? false,
    },
    secondBin: {
      binId: bin.id,
      // The copy keeps the first bin's calibration (its logs) but none of its logged harvests.
      supplyFrom: (startDate) =>
        forecastCastings(
          { ...input, binId: `${bin.id} (second bin)`, startDate, asOf: undefined },
          range,
          field,
        ).events,
    },
  };
}
