import { getCropById, removeCrop, updateCrop } from "@/db/queries/crops";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, refuseOtherMethods, route } from "@/lib/http";
import { cropIdParamsSchema, updateCropSchema } from "@/lib/validation/crop";

type Params = { gardenId: string; cropId: string };

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, cropId } = await parseParams(request, params, cropIdParamsSchema);
  await requireRole(request, gardenId, "viewer");
  const crop = await getCropById({ gardenId, cropId });
  if (!crop) throw new AppError("not_found:crop");
  return Response.json({ crop });
});

// Changing a starter crop makes the garden's own copy (its id comes back) and changes that.
export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId, cropId } = await parseParams(request, params, cropIdParamsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, updateCropSchema);
  const crop = await updateCrop({ gardenId, cropId, input });
  if (!crop) throw new AppError("not_found:crop");
  return Response.json({ crop });
});

export const DELETE = route<Params>(async (request, { params }) => {
  const { gardenId, cropId } = await parseParams(request, params, cropIdParamsSchema);
  await requireRole(request, gardenId, "grower");
  return Response.json(await removeCrop({ gardenId, cropId }));
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { POST, PUT } = refuseOtherMethods({ GET, PATCH, DELETE });
