import "server-only";
import { markGardenInputsChanged } from "@/db/queries/garden-inputs-version";

/**
 * Awaits a bed, crop or planting write's transaction, then tells the garden's
 * cached plan it is stale. The bump comes AFTER the commit: bumping inside the
 * transaction would let a concurrent reader cache the old plan under the new version.
 */
export async function thenInvalidatePlan<T>(gardenId: string, committed: Promise<T>): Promise<T> {
  const result = await committed;
  markGardenInputsChanged(gardenId);
  return result;
}
