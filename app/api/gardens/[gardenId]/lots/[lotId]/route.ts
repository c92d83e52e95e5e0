import { z } from "zod";
import { removeFromEnteredLot } from "@/db/queries/lots";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { adjustLotSchema } from "@/lib/validation/lot";
import { listStock } from "../list-stock";

const paramsSchema = z.object({ gardenId: z.uuid(), lotId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, lotId } = await parseParams(params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const lot = (await listStock(gardenId)).find((l) => l.id === lotId);
  if (!lot) throw new AppError("not_found:lot");
  return Response.json({ lot });
});

/** Growers and owners take stock out with a reason; a lot never goes below zero. */
export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId, lotId } = await parseParams(params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, adjustLotSchema);
  const lot = await removeFromEnteredLot({ gardenId, lotId, removeSi: input.removeSi });
  return Response.json({ lot, reason: input.reason });
});
