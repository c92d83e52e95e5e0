import { z } from "zod";
import { getStockSettings } from "@/db/queries/bins";
import { recordStockAdjustment } from "@/db/queries/lots";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route, refuseOtherMethods } from "@/lib/http";
import { todayIn } from "@/lib/validation/bin-values";
import { adjustLotSchema } from "@/lib/validation/lot";
import { listStock } from "../list-stock";

const paramsSchema = z.object({ gardenId: z.uuid(), lotId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, lotId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const lot = (await listStock(gardenId)).find((l) => l.id === lotId);
  if (!lot) throw new AppError("not_found:lot");
  return Response.json({ lot });
});

/** Growers and owners take stock out with a reason; a lot never goes below zero. */
export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId, lotId } = await parseParams(request, params, paramsSchema);
  const member = await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, adjustLotSchema);
  const { timeZone } = await getStockSettings({ gardenId });
  try {
    await recordStockAdjustment({
      gardenId,
      lotId,
      adjustedOn: todayIn(timeZone),
      amountSi: -input.removeSi,
      reason: input.reason,
      note: input.note ?? null,
      loggedBy: member.user.id,
    });
  } catch (error) {
    // lots.ts names its own field; the body here calls the amount removeSi.
    if (error instanceof AppError && error.fields?.amountSi)
      throw new AppError(error.code, "Stock cannot go below zero.", {
        removeSi: error.fields.amountSi,
      });
    if (error instanceof AppError && error.fields?.lotId) throw new AppError("not_found:lot");
    throw error;
  }
  const lot = (await listStock(gardenId)).find((l) => l.id === lotId);
  return Response.json({ lot, reason: input.reason });
});

export const { POST, PUT, DELETE } = refuseOtherMethods({ GET, PATCH });
