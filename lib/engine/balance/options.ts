// Options of the balance, checked, with their defaults and sources.
import { EngineInputError, requireNonNegative } from "@/lib/engine/core/errors";
import type { BalanceInput, PoolTotals } from "@/lib/engine/balance/types";

import { dflt } from "@/lib/engine/core/defaults";
import { toSi } from "@/lib/units";

export const DEFAULT_SHELF_LIFE_DAYS = dflt("castingsShelfLifeDays");
export const DEFAULT_PRICE_PER_LB = dflt("pricePerLb");
export const KG_PER_LB = toSi(1, "lb");

export interface Resolved {
  shelfLifeDays: number;
  leachateKeepDays: number;
  pricePerLb: number;
  teaKgPerL: number | undefined;
}

export function resolveOptions(o: BalanceInput["options"]): Resolved {
  const shelf = o.shelfLifeDays ?? DEFAULT_SHELF_LIFE_DAYS;
  const keep = o.leachateKeepDays ?? 1;
  if (!Number.isInteger(shelf) || shelf < 1 || shelf > 3650) {
    throw new EngineInputError(
      "options.shelfLifeDays",
      `must be a whole number of days 1–3650 (got ${shelf})`,
    );
  }
  if (!Number.isInteger(keep) || keep < 1 || keep > 365) {
    throw new EngineInputError(
      "options.leachateKeepDays",
      `must be a whole number of days 1–365 (got ${keep})`,
    );
  }
  const price = requireNonNegative(o.pricePerLb ?? DEFAULT_PRICE_PER_LB, "options.pricePerLb", 1e6);
  const tea =
    o.teaCastingsKgPerLitre === undefined
      ? undefined
      : requireNonNegative(o.teaCastingsKgPerLitre, "options.teaCastingsKgPerLitre", 10);
  return { shelfLifeDays: shelf, leachateKeepDays: keep, pricePerLb: price, teaKgPerL: tea };
}

export function emptyTotals(): PoolTotals {
  return { supplied: 0, demand: 0, allocated: 0, agedOut: 0, shortfall: 0, closing: 0 };
}
