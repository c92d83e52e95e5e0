import { z } from "zod";
import { getStockSettings } from "@/db/queries/bins";
import { recordEnteredLot } from "@/db/queries/lots";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route, refuseOtherMethods } from "@/lib/http";
import { todayIn } from "@/lib/validation/bin-values";
import { createLotSchema } from "@/lib/validation/lot";
import { listStock } from "./list-stock";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  return Response.json({ lots: await listStock(gardenId) });
});

/** A bought bag or stock already on hand: growers and owners. */
export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, createLotSchema);
  const { timeZone } = await getStockSettings({ gardenId });
  if (input.producedOn > todayIn(timeZone))
    throw new AppError("validation:producedOn", "Enter stock you have today.", {
      producedOn: "is in the future",
    });
  const { lotId } = await recordEnteredLot({ gardenId, ...input });
  return Response.json({ lotId }, { status: 201 });
});

export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
