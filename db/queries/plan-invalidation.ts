import "server-only";
import type { DbOrTx } from "@/db";

/**
 * The one call site every bed, crop and planting write goes through to tell
 * the garden's plan it is stale. TODO(balance-api): the per-garden plan cache
 * and its version bump live on the balance-api branch; when it merges, call its
 * bump here (inside the caller's transaction). Until then there is no cache to
 * invalidate: the balance is computed fresh on every read.
 */
export async function invalidateGardenPlan(_tx: DbOrTx, _where: { gardenId: string }): Promise<void> {}
