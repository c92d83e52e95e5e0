import { daysBetween, dflt } from "@/lib/engine";

// A lot's age and whether it is still good, by the garden's shelf life for
// castings (default 60 days, Harit et al. 2014) and its maximum age for
// collected leachate (default 7 days, from memory).

export type ShelfStatus = "fresh" | "use-soon" | "aged-out" | "used-up";

export function lotStatus(
  lot: { material: "castings" | "leachate"; producedOn: string; remainingSi: number },
  today: string,
  limits: { shelfLifeDays: number | null; liquidMaxAgeDays: number | null },
): { ageDays: number; limitDays: number; status: ShelfStatus } {
  const limitDays =
    lot.material === "castings"
      ? (limits.shelfLifeDays ?? dflt("castingsShelfLifeDays"))
      : (limits.liquidMaxAgeDays ?? dflt("liquidMaxAgeDays"));
  const ageDays = Math.max(0, daysBetween(lot.producedOn, today));
  const status: ShelfStatus =
    lot.remainingSi <= 1e-6
      ? "used-up"
      : ageDays > limitDays
        ? "aged-out"
        : ageDays >= limitDays * 0.75
          ? "use-soon"
          : "fresh";
  return { ageDays, limitDays, status };
}
