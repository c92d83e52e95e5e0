import "server-only";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { gardenInputsVersion, onGardenInputsChanged } from "@/db/queries/garden-inputs-version";
import { getGardenById, type GardenDto } from "@/db/queries/gardens";
import type { BalanceBody, BalanceSettings } from "@/lib/balance/types";
import { BALANCE_MONTHS, todayIn } from "@/lib/balance/range";
import { computePlan, type GardenInputs } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { displayUnits } from "@/lib/units";

// A garden's Balance, computed once per (garden, inputs version, asOf day, from,
// months) and kept in memory. It lives in db/queries rather than services/
// because it is data access: it reads the garden's rows and hands the route a
// DTO, and its freshness depends on the writers in db/queries bumping the
// version (db/queries/garden-inputs-version.ts). The key carries the version,
// so a write makes every older entry unreachable at once; entries also expire
// after TTL_MS so a second app instance (PostgreSQL) is never stale for long.
//
// What is cached is a promise, so 20 clients arriving together share one
// computation, and the JSON text, so a hit costs no serialisation.

const MAX_ENTRIES = 200;
const TTL_MS = 10 * 60_000;

interface Entry<T> {
  gardenId: string;
  expires: number;
  value: Promise<T>;
}

// Shared by every bundle (see garden-inputs-version.ts): the Balance route, the
// overview and the bed page read one cache, and the eviction listener is added once.
const cacheKey = Symbol.for("castline.planCache");
const holder = globalThis as typeof globalThis & { [cacheKey]?: Map<string, Entry<unknown>> };
const cache: Map<string, Entry<unknown>> = holder[cacheKey] ??
(() => {
  const made = new Map<string, Entry<unknown>>();
  holder[cacheKey] = made;
  onGardenInputsChanged((gardenId) => {
    for (const [key, entry] of made) if (entry.gardenId === gardenId) made.delete(key);
  });
  return made;
})();

function cached<T>(gardenId: string, key: string, make: () => Promise<T>): Promise<T> {
  const now = Date.now();
  const hit = cache.get(key);
  if (hit && hit.expires > now) return hit.value as Promise<T>;
  const value = make();
  cache.set(key, { gardenId, expires: now + TTL_MS, value });
  // A failure is not remembered: the next request tries again.
  value.catch(() => cache.delete(key));
  while (cache.size > MAX_ENTRIES) cache.delete(cache.keys().next().value!);
  return value;
}

/** Forget every cached plan (tests). */
export function clearPlanCache(): void {
  cache.clear();
}

export interface GardenBalance {
  body: BalanceBody;
  /** JSON.stringify(body), made once. */
  json: string;
  /** The inputs the plan was computed from: read-only, shared by every caller. */
  inputs: GardenInputs;
}

function settingsOf(garden: GardenDto, inputs: GardenInputs): BalanceSettings {
  return {
    unitSystem: inputs.settings.unitSystem,
    timeZone: inputs.settings.timeZone,
    units: displayUnits(inputs.settings.unitSystem),
    currency: garden.currency,
    lastSpringFrost: inputs.settings.lastSpringFrost,
    firstFallFrost: inputs.settings.firstFallFrost,
  };
}

async function gardenAt(gardenId: string, version: number): Promise<GardenDto> {
  return cached(gardenId, `garden|${gardenId}|${version}`, async () => {
    const garden = await getGardenById({ gardenId });
    if (!garden) throw new AppError("not_found:garden");
    return garden;
  });
}

/**
 * The garden's Balance for `months` months from `from` ("YYYY-MM"; default: this
 * month in the garden's time zone), replayed up to today in that zone.
 */
export async function getGardenBalance({
  gardenId,
  from,
  months = BALANCE_MONTHS.default,
}: {
  gardenId: string;
  from?: string;
  months?: number;
}): Promise<GardenBalance> {
  const version = gardenInputsVersion(gardenId);
  const garden = await gardenAt(gardenId, version);
  const asOf = todayIn(garden.timeZone);
  const start = from ?? asOf.slice(0, 7);
  const inputs = await cached(gardenId, `inputs|${gardenId}|${version}|${asOf}`, () =>
    loadGardenInputs({ gardenId, asOf }),
  );
  return cached(gardenId, `balance|${gardenId}|${version}|${asOf}|${start}|${months}`, async () => {
    const plan = computePlan(inputs, { from: start, months, suggestions: true });
    const body: BalanceBody = {
      range: { from: start, months },
      settings: settingsOf(garden, inputs),
      plan,
      asOf,
      inputsVersion: version,
    };
    return { body, json: JSON.stringify(body), inputs };
  });
}

/** A Balance computed from other inputs (a what-if) beside the garden's own; never cached. */
export function balanceFrom(base: BalanceBody, inputs: GardenInputs): BalanceBody {
  const plan = computePlan(inputs, {
    from: base.range.from,
    months: base.range.months,
    suggestions: true,
  });
  return { ...base, plan };
}
