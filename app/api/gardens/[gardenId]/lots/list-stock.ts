import "server-only";
import { getStockSettings, listLotSources } from "@/db/queries/bins";
import { listLotStock } from "@/db/queries/lots";
import { lotStatus } from "@/lib/validation/lot-status";
import { todayIn } from "@/lib/validation/bin-values";

/** Every lot with its age, shelf-life status and where it came from, newest first. */
export async function listStock(gardenId: string) {
  const [settings, lots, sources] = await Promise.all([
    getStockSettings({ gardenId }),
    listLotStock({ gardenId }),
    listLotSources({ gardenId }),
  ]);
  const today = todayIn(settings.timeZone);
  const byId = new Map(sources.map((s) => [s.id, s]));
  return lots
    .map((lot) => {
      const source = byId.get(lot.id);
      return {
        ...lot,
        ...lotStatus(lot, today, settings),
        origin: source?.sourceEventId ? ("bin-log" as const) : ("entered" as const),
        binName: source?.binName ?? null,
        manureFeedstock: source?.manureFeedstock ?? false,
      };
    })
    .reverse();
}
