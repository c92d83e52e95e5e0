import { toSi } from "@/lib/units";
import { dflt } from "@/lib/engine/core/defaults";
import {
  EngineInputError,
  requireInteger,
  requireNonNegative,
  requirePositive,
} from "@/lib/engine/core/errors";

// Stage-structured worm population, one step a day. Cocoons and juveniles sit
// in ring buffers indexed by day (a delay line), so a day costs O(maturation)
// for the biomass sum and a 365-day run is well under a millisecond.
//
// Biomass: an adult weighs 1 / wormsPerLb lb. A juvenile is assumed (our
// assumption, not sourced) to gain weight linearly from hatch to maturity, so
// at age a days it weighs (a + 1) / maturationDays of an adult. Cocoons weigh
// nothing. Density limits laying only: laying × max(0, 1 − N / ceiling), where N
// counts adult-equivalents already committed — adults, juveniles and the
// hatchlings that viable cocoons will give — against the ceiling in worms.
// Counting only today's weight would let the 83-day delay line overshoot the
// ceiling several times over before laying ever slowed.

const LB_KG = toSi(1, "lb"); // NIST Handbook 44 App. C, from lib/units
const FT2_M2 = toSi(1, "ft2");

export interface PopulationParams {
  cocoonsPerAdultPerWeek: number;
  incubationDays: number;
  hatchSuccess: number;
  hatchlingsPerCocoon: number;
  maturationDays: number;
  densityCeilingLbPerFt2: number;
  wormsPerLb: number;
  /** Daily death fraction of adults and juveniles; 0 by default (no source gives one). */
  mortalityPerDay: number;
}

export function defaultPopulationParams(): PopulationParams {
  return {
    cocoonsPerAdultPerWeek: dflt("cocoonsPerAdultPerWeek"),
    incubationDays: dflt("incubationDays"),
    hatchSuccess: dflt("hatchSuccess"),
    hatchlingsPerCocoon: dflt("hatchlingsPerCocoon"),
    maturationDays: dflt("maturationDays"),
    densityCeilingLbPerFt2: dflt("densityCeilingLbPerFt2"),
    wormsPerLb: dflt("wormsPerLb"),
    mortalityPerDay: 0,
  };
}

/**
 * How the starting worms are made up:
 * - "adults": all mature, nothing laid yet;
 * - "adults-with-cocoons": all mature, with a bin's worth of cocoons already laid
 *   at the steady rate over the last incubation period (worms taken from a working bin).
 */
export type StartStructure = "adults" | "adults-with-cocoons";

export interface PopulationInput {
  startWorms: number;
  surfaceM2: number;
  days: number;
  start?: StartStructure;
  params?: Partial<PopulationParams>;
  /**
   * Surface the worms occupy on day t, m² (e.g. every tray in a growing stack);
   * the density ceiling follows it. Default: `surfaceM2` every day.
   */
  surfaceOnDay?: (t: number) => number;
  /** Worms added (positive) or removed (negative), or a counted total (`set`), on day t; taken from adults and juveniles in proportion. */
  changes?: ReadonlyMap<number, { add?: number; set?: number }>;
  /** Only totals per day (worms, biomass) into these arrays, no day objects; `series` then holds day 0 and the last day. */
  totalsOnly?: { worms: Float64Array; kg: Float64Array };
}

export interface PopulationDay {
  day: number;
  adults: number;
  juveniles: number;
  cocoons: number;
  /** Adults + juveniles (cocoons are not worms yet). */
  worms: number;
  biomassKg: number;
}

export interface PopulationRun {
  series: PopulationDay[]; // index = day, series[0] = start
  final: PopulationDay;
  ceilingKg: number;
  params: PopulationParams;
}

export function wormsToKg(worms: number, wormsPerLb = dflt("wormsPerLb")): number {
  return (worms / wormsPerLb) * LB_KG;
}

export function kgToWorms(kg: number, wormsPerLb = dflt("wormsPerLb")): number {
  return (kg / LB_KG) * wormsPerLb;
}

function checkParams(p: PopulationParams, field: string): PopulationParams {
  return {
    cocoonsPerAdultPerWeek: requireNonNegative(
      p.cocoonsPerAdultPerWeek,
      `${field}.cocoonsPerAdultPerWeek`,
      20,
    ),
    incubationDays: requireInteger(p.incubationDays, `${field}.incubationDays`, 1, 365),
    hatchSuccess: requireNonNegative(p.hatchSuccess, `${field}.hatchSuccess`, 1),
    hatchlingsPerCocoon: requireNonNegative(
      p.hatchlingsPerCocoon,
      `${field}.hatchlingsPerCocoon`,
      20,
    ),
    maturationDays: requireInteger(p.maturationDays, `${field}.maturationDays`, 1, 365),
    densityCeilingLbPerFt2: requirePositive(
      p.densityCeilingLbPerFt2,
      `${field}.densityCeilingLbPerFt2`,
      20,
    ),
    wormsPerLb: requirePositive(p.wormsPerLb, `${field}.wormsPerLb`, 10_000),
    mortalityPerDay: requireNonNegative(p.mortalityPerDay, `${field}.mortalityPerDay`, 1),
  };
}

/** Room left under the density ceiling: 1 when empty, 0 at or over it. */
function densityFactor(committed: number, ceilingWorms: number): number {
  return Math.max(0, 1 - committed / ceilingWorms);
}

function scaleRing(ring: Float64Array, length: number, k: number): void {
  for (let s = 0; s < length; s++) ring[s] = (ring[s] as number) * k;
}

/** One day of the run. A juvenile of age a weighs (a + 1) / M of an adult (it grows linearly to maturity). */
function populationDay(
  day: number,
  adults: number,
  jTotal: number,
  cTotal: number,
  ageSum: number,
  adultKg: number,
  M: number,
): PopulationDay {
  return {
    day,
    adults,
    juveniles: jTotal,
    cocoons: cTotal,
    worms: adults + jTotal,
    biomassKg: adults * adultKg + ((ageSum + jTotal) / M) * adultKg,
  };
}

export function simulatePopulation(input: PopulationInput, field = "population"): PopulationRun {
  const p = checkParams({ ...defaultPopulationParams(), ...input.params }, `${field}.params`);
  const start = requireNonNegative(input.startWorms, `${field}.startWorms`, 10_000_000);
  const surface = requirePositive(input.surfaceM2, `${field}.surfaceM2`, 100);
  const days = requireInteger(input.days, `${field}.days`, 0, 3650);
  const structure = input.start ?? "adults";
  if (structure !== "adults" && structure !== "adults-with-cocoons") {
    throw new EngineInputError(`${field}.start`, `must be "adults" or "adults-with-cocoons"`);
  }

  const adultKg = LB_KG / p.wormsPerLb;
  const ceilingKgFor = (m2: number) => p.densityCeilingLbPerFt2 * (m2 / FT2_M2) * LB_KG;
  const ceilingKg = ceilingKgFor(surface);
  const I = p.incubationDays;
  const M = p.maturationDays;
  const layPerAdultDay = p.cocoonsPerAdultPerWeek / 7;
  const yieldPerCocoon = p.hatchSuccess * p.hatchlingsPerCocoon;
  const survive = 1 - p.mortalityPerDay;

  const cocoons = new Float64Array(I); // slot d % I: laid on day d
  const juveniles = new Float64Array(M); // slot d % M: hatched on day d
  let adults = start;
  // The day loop below writes these running figures thousands of times: no closure captures them
  // (a captured number is boxed anew on every write, which the bench's years of days feel).
  let ceilingWorms = ceilingKg / adultKg;
  let pipeline = 0; // juveniles + hatchlings still inside cocoons
  if (structure === "adults-with-cocoons") {
    // Filled slot by slot so the committed count already includes earlier slots.
    for (let s = 0; s < I; s++) {
      const laid = adults * layPerAdultDay * densityFactor(adults + pipeline, ceilingWorms);
      cocoons[s] = laid;
      pipeline += laid * yieldPerCocoon;
    }
  }

  // Running totals instead of sweeping the rings every day (the bench replays years of days):
  // jTotal = juveniles; ageSum = Σ juveniles × age in days (0 … M−1); cTotal = cocoons.
  let jTotal = 0;
  let ageSum = 0;
  let cTotal = 0;
  for (let s = 0; s < I; s++) cTotal += cocoons[s] as number;
  const totals = input.totalsOnly;
  const series: PopulationDay[] = [populationDay(0, adults, jTotal, cTotal, ageSum, adultKg, M)];
  if (totals) {
    totals.worms[0] = adults + jTotal;
    totals.kg[0] = adults * adultKg + ((ageSum + jTotal) / M) * adultKg;
  }
  for (let t = 1; t <= days; t++) {
    if (input.surfaceOnDay) ceilingWorms = ceilingKgFor(input.surfaceOnDay(t)) / adultKg;
    const change = input.changes?.get(t);
    if (change) {
      const total = adults + jTotal;
      const target = Math.max(0, change.set ?? total + (change.add ?? 0));
      if (total > 0) {
        const k = target / total;
        adults *= k;
        scaleRing(juveniles, M, k);
        jTotal *= k;
        ageSum *= k;
      } else adults = target;
    }
    const ci = t % I;
    const ji = t % M;
    const hatched = (cocoons[ci] as number) * yieldPerCocoon;
    if (survive < 1) {
      adults *= survive;
      scaleRing(juveniles, M, survive);
      jTotal *= survive;
      ageSum *= survive;
    }
    // Everyone ages a day; the slot hatched M days ago (age M − 1) matures.
    const maturing = juveniles[ji] as number;
    ageSum += jTotal - maturing - maturing * (M - 1);
    jTotal -= maturing;
    adults += maturing;
    juveniles[ji] = hatched;
    jTotal += hatched;
    const committed = adults + jTotal + (cTotal - (cocoons[ci] as number)) * yieldPerCocoon;
    cTotal -= cocoons[ci] as number;
    cocoons[ci] = adults * layPerAdultDay * densityFactor(committed, ceilingWorms);
    cTotal += cocoons[ci] as number;
    if (totals) {
      totals.worms[t] = adults + jTotal;
      totals.kg[t] = adults * adultKg + ((ageSum + jTotal) / M) * adultKg;
    } else series.push(populationDay(t, adults, jTotal, cTotal, ageSum, adultKg, M));
  }
  if (totals && days > 0)
    series.push(populationDay(days, adults, jTotal, cTotal, ageSum, adultKg, M));
  return { series, final: series[series.length - 1] as PopulationDay, ceilingKg, params: p };
}

/** First day a measure reaches `factor` × its starting value, or null. */
export function daysToMultiply(
  run: PopulationRun,
  measure: "biomassKg" | "worms",
  factor = 2,
): number | null {
  const first = run.series[0];
  if (!first || first[measure] <= 0) return null;
  const target = first[measure] * factor;
  const hit = run.series.find((d) => d[measure] >= target);
  return hit ? hit.day : null;
}
