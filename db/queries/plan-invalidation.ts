import "server-only";

/**
 * The one place bed, crop and planting writes tell the garden's plan it is
 * stale, AFTER their transaction commits (bumping inside it would let a
 * concurrent reader cache the old plan under the new version).
 * TODO(balance-api): when db/queries/garden-inputs-version.ts merges, call its
 * markGardenInputsChanged(gardenId) here. Until then there is no plan cache:
 * every Balance read computes afresh.
 */
export function markPlanInputsChanged(_gardenId: string): void {}

/** Awaits a write's transaction, then marks the garden's plan inputs changed. */
export async function thenInvalidatePlan<T>(gardenId: string, committed: Promise<T>): Promise<T> {
  const result = await committed;
  markPlanInputsChanged(gardenId);
  return result;
}
