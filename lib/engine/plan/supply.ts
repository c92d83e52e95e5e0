// Every lot the garden had or will have: stock lots, logged harvests and
// drains (up to asOf), a finished tray that is due but not logged, forecast
// harvests and the leachate that collects in each bin's base day by day after asOf.
import { dflt } from "@/lib/engine/core/defaults";
import { fromDayNumber, monthOfDay, toDayNumber } from "@/lib/engine/core/dates";
import { EngineInputError } from "@/lib/engine/core/errors";
import type { LedgerLot } from "@/lib/engine/balance/ledger";
import {
  forecastCastings,
  harvestDates,
  type BinForecastInput,
} from "@/lib/engine/supply/forecast";
import { trayInsideVolumeL } from "@/lib/engine/supply/geometry";
import { leachateRate } from "@/lib/engine/supply/liquid";
import type { BinInput, GardenInputs } from "@/lib/engine/plan/inputs";
import type { PlanContext } from "@/lib/engine/plan/context";
import type { Explanation, PlanWarning } from "@/lib/engine/plan/results";

export type LotSource =
  "stock" | "harvest-logged" | "harvest-due" | "harvest-forecast" | "drain-logged" | "collected";

export interface LotInfo {
  lot: LedgerLot;
  source: LotSource;
  explanation: Explanation;
}

export interface BinSupplyInfo {
  bin: BinInput;
  forecastInput: BinForecastInput;
  perHarvestKg: number;
  harvestIntervalDays: number;
  calibration: { factor: number; used: number };
  leachateLPerDay: number;
  leachateSource: "logs" | "estimate";
  /** Harvest days (forecast schedule) in the whole walk. */
  harvestDays: number[];
  explanation: Explanation;
}

export const harvestLotId = (binId: string, date: string) => `${binId}:harvest-tray:${date}`;
export const collectLotIdPrefix = (binId: string) => `${binId}:collect:`;

export function trayVolumeL(bin: BinInput, field: string): number {
  return trayInsideVolumeL(
    {
      lengthM: bin.tray.insideLengthM,
      widthM: bin.tray.insideWidthM,
      depthM: bin.tray.insideDepthM,
    },
    `${field}.tray`,
  );
}

export function binForecastInput(
  bin: BinInput,
  inputs: GardenInputs,
  field: string,
): BinForecastInput {
  const volume = trayVolumeL(bin, field);
  const uncalibrated =
    volume *
    (bin.fillFraction ?? dflt("fillFraction")) *
    (bin.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"));
  return {
    binId: bin.id,
    startDate: bin.startDate,
    trays: bin.trays,
    trayInsideVolumeL: volume,
    rotationIntervalDays: bin.rotationIntervalDays ?? undefined,
    processingDays: bin.processingDays ?? undefined,
    fillFraction: bin.fillFraction ?? undefined,
    bulkDensityKgPerL: bin.bulkDensityKgPerL ?? undefined,
    dormantMonths: bin.dormantMonths,
    manureFeedstock: bin.manureFeedstock,
    harvestLogs: inputs.logs.harvests
      .filter((h) => h.binId === bin.id && h.date <= inputs.asOf)
      .map((h) => ({
        date: h.date,
        actualKg: h.castingsKg,
        predictedKg: h.predictedKg ?? uncalibrated,
      })),
    asOf: inputs.asOf,
  };
}

export function buildSupply(
  inputs: GardenInputs,
  ctx: PlanContext,
  warnings: PlanWarning[],
): { lots: LotInfo[]; bins: BinSupplyInfo[] } {
  const lots: LotInfo[] = [];
  const binsById = new Map(inputs.bins.map((b) => [b.id, b]));
  const walkFrom = ctx.spans[0]!.startDay;
  const range = { from: fromDayNumber(walkFrom), to: fromDayNumber(ctx.planEndDay) };

  inputs.stockLots.forEach((l, i) => {
    const bin = l.binId === null ? undefined : binsById.get(l.binId);
    if (l.binId !== null && !bin)
      throw new EngineInputError(`stockLots[${i}].binId`, `no bin with id "${l.binId}"`);
    lots.push({
      lot: {
        id: l.id,
        pool: l.material,
        madeDay: toDayNumber(l.madeOn, `stockLots[${i}].madeOn`),
        amount: l.amount,
        binId: l.binId,
        manure: l.manureFeedstock ?? bin?.manureFeedstock ?? false,
      },
      source: "stock",
      explanation: {
        kind: "lot-opening",
        inputs: {
          amount: { unit: l.material === "castings" ? "kg" : "L", value: l.amount },
          madeOn: { date: l.madeOn },
        },
      },
    });
  });

  const bins: BinSupplyInfo[] = [];
  inputs.bins.forEach((bin, b) => {
    const field = `bins[${b}]`;
    const binRef = { ref: "bin", id: bin.id } as const; // shared by the bin's explanations
    const retired =
      bin.retiredOn === null ? Infinity : toDayNumber(bin.retiredOn, `${field}.retiredOn`);
    const input = binForecastInput(bin, inputs, field);
    const forecast = forecastCastings(input, range, field);
    const schedule = harvestDates({ ...input, asOf: undefined }, range, field).map((d) =>
      toDayNumber(d),
    );
    const interval = forecast.harvestIntervalDays;
    const logged = inputs.logs.harvests.filter((h) => h.binId === bin.id);
    for (const [i, h] of logged.entries()) {
      if (h.date > inputs.asOf) continue;
      lots.push({
        lot: {
          id: h.id,
          pool: "castings",
          madeDay: toDayNumber(h.date, `logs.harvests[${i}].date`),
          amount: h.castingsKg,
          binId: bin.id,
          manure: bin.manureFeedstock,
        },
        source: "harvest-logged",
        explanation: {
          kind: "harvest-logged",
          inputs: {
            bin: binRef,
            castings: { unit: "kg", value: h.castingsKg },
          },
        },
      });
    }
    // A scheduled harvest on or before asOf with no log within half an interval of it.
    const loggedDays = logged.map((h) => toDayNumber(h.date));
    const lastLogged = Math.max(-Infinity, ...loggedDays);
    for (const day of schedule) {
      if (day > ctx.asOfDay || day > retired) continue;
      const near = loggedDays.some((l) => Math.abs(l - day) <= interval / 2);
      // Only the trays still in the stack: ones after the latest logged harvest.
      if (near || day <= lastLogged) continue;
      const date = fromDayNumber(day);
      const madeDay = ctx.asOfDay + 1;
      const explanation: Explanation = {
        kind: "harvest-due-not-logged",
        inputs: {
          bin: binRef,
          due: { date },
          countedOn: { date: fromDayNumber(madeDay) },
          castings: { unit: "kg", value: forecast.perHarvestKg },
          why: {
            text: "the tray is finished and still in the stack, so its castings exist; counted at the forecast amount from the day after asOf until the harvest is logged",
          },
        },
      };
      lots.push({
        lot: {
          id: harvestLotId(bin.id, date),
          pool: "castings",
          madeDay,
          amount: forecast.perHarvestKg,
          binId: bin.id,
          manure: bin.manureFeedstock,
        },
        source: "harvest-due",
        explanation,
      });
      warnings.push({ kind: "harvest-not-logged", binId: bin.id, date, explanation });
    }
    const castingsExplanation: Explanation = {
      kind: "castings-forecast",
      inputs: {
        bin: binRef,
        trayVolume: { unit: "L", value: input.trayInsideVolumeL },
        fillFraction: { unit: "ratio", value: bin.fillFraction ?? dflt("fillFraction") },
        bulkDensity: {
          unit: "ratio",
          value: bin.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"),
        },
        calibrationFactor: { unit: "ratio", value: forecast.calibration.factor },
        calibrationHarvests: { unit: "count", value: forecast.calibration.used },
        perHarvest: { unit: "kg", value: forecast.perHarvestKg },
      },
    };
    for (const ev of forecast.events) {
      if (ev.actual) continue;
      const day = toDayNumber(ev.date);
      if (day > retired) continue;
      lots.push({
        lot: {
          id: harvestLotId(bin.id, ev.date),
          pool: "castings",
          madeDay: day,
          amount: ev.amount,
          binId: bin.id,
          manure: bin.manureFeedstock,
        },
        source: "harvest-forecast",
        explanation: castingsExplanation,
      });
    }

    const drains = inputs.logs.drains.filter((d) => d.binId === bin.id && d.date <= inputs.asOf);
    for (const d of drains) {
      lots.push({
        lot: {
          id: d.id,
          pool: "leachate",
          madeDay: toDayNumber(d.date),
          amount: d.litres,
          binId: bin.id,
          manure: bin.manureFeedstock,
        },
        source: "drain-logged",
        explanation: {
          kind: "drain-logged",
          inputs: { bin: binRef, liquid: { unit: "L", value: d.litres } },
        },
      });
    }
    const rate = leachateRate(
      {
        binId: bin.id,
        collections: drains, // each has its date and litres
        estimateLPerWeek: bin.leachateEstimateLPerWeek ?? undefined,
        asOf: inputs.asOf,
      },
      field,
    );
    const rateExplanation: Explanation = {
      kind: "leachate-rate",
      inputs: {
        bin: binRef,
        rate: { unit: "L/day", value: rate.litresPerDay },
        from: { text: rate.source },
        drainsUsed: { unit: "count", value: rate.collectionsUsed },
      },
    };
    const dormant = new Set(bin.dormantMonths);
    // Liquid since the last logged drain is still in the base (not drained, so not logged):
    // it collects from the day after that drain, at most one max age before the forecast starts.
    const lastDrain = Math.max(-Infinity, ...drains.map((d) => toDayNumber(d.date)));
    const start = Math.max(
      toDayNumber(bin.startDate),
      ctx.asOfDay + 1 - ctx.liquidMaxAgeDays,
      lastDrain + 1,
    );
    if (rate.litresPerDay > 0) {
      const idPrefix = collectLotIdPrefix(bin.id); // a lot a day: the prefix is made once
      for (let day = start; day <= Math.min(ctx.planEndDay, retired); day++) {
        if (dormant.has(monthOfDay(day))) continue;
        const date = fromDayNumber(day);
        lots.push({
          lot: {
            id: idPrefix + date,
            pool: "leachate",
            madeDay: day,
            amount: rate.litresPerDay,
            binId: bin.id,
            manure: bin.manureFeedstock,
          },
          source: "collected",
          explanation: rateExplanation,
        });
      }
    }
    bins.push({
      bin,
      forecastInput: input,
      perHarvestKg: forecast.perHarvestKg,
      harvestIntervalDays: interval,
      calibration: forecast.calibration,
      leachateLPerDay: rate.litresPerDay,
      leachateSource: rate.source,
      harvestDays: schedule.filter((d) => d <= retired),
      explanation: castingsExplanation,
    });
  });
  return { lots, bins };
}
