import "server-only";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { computePlan, type GardenPlan } from "@/lib/engine";
import { todayIn } from "@/lib/validation/bin-values";

/** The garden's plan as of today in its time zone, for the bin pages (no gap search: not shown here). */
export async function loadBinPlan(
  gardenId: string,
  timeZone: string,
): Promise<{ plan: GardenPlan; today: string }> {
  const today = todayIn(timeZone);
  const inputs = await loadGardenInputs({ gardenId, asOf: today });
  return { plan: computePlan(inputs, { suggestions: false }), today };
}
