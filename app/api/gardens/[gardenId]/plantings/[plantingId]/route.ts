import { getPlantingById, removePlanting, updatePlanting } from "@/db/queries/plantings";
import { requireRole } from "@/lib/auth/require-role";
import { AppError, validationError } from "@/lib/errors";
import { parseJson, parseParams, refuseOtherMethods, route } from "@/lib/http";
import { fromSi } from "@/lib/units";
import { ownRulesChange } from "@/lib/validation/feeding-rule";
import {
  createPlantingSchema,
  plantingIdParamsSchema,
  updatePlantingSchema,
} from "@/lib/validation/planting";

type Params = { gardenId: string; plantingId: string };

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, plantingId } = await parseParams(request, params, plantingIdParamsSchema);
  await requireRole(request, gardenId, "viewer");
  const planting = await getPlantingById({ gardenId, plantingId });
  if (!planting) throw new AppError("not_found:planting");
  return Response.json({ planting });
});

// Rules travel inside: `rules` (in order; [] = back to the crop's) or one `rule` (null = back
// to the crop's; a rule = its only rule); absent = unchanged.
export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId, plantingId } = await parseParams(request, params, plantingIdParamsSchema);
  await requireRole(request, gardenId, "grower");
  const patch = await parseJson(request, updatePlantingSchema);
  const current = await getPlantingById({ gardenId, plantingId });
  if (!current) throw new AppError("not_found:planting");
  const stored = {
    bedId: current.bedId,
    cropId: current.cropId,
    plantCount: current.plantCount,
    area: current.areaM2 === null ? null : { value: fromSi(current.areaM2, "m2"), unit: "m2" },
    plantedOn: current.plantedOn,
    expectedHarvestOn: current.expectedHarvestOn,
    endedOn: current.endedOn,
    priority: current.priority,
    notes: current.notes,
  };
  const { rule, rules, ...rest } = patch;
  // Dates are checked on the merged planting: moving the end alone before the start is refused,
  // and so is a new rule that gives no dates from the planting day.
  const merged = createPlantingSchema.safeParse({ ...stored, ...rest, rule, rules });
  if (!merged.success) throw validationError(merged.error);
  const planting = await updatePlanting({
    gardenId,
    plantingId,
    input: merged.data,
    ruleChange: ownRulesChange({ rule, rules }),
  });
  if (!planting) throw new AppError("not_found:planting");
  return Response.json({ planting });
});

// Removes a planting with no logs; one with logged feedings is ended today instead (kept for the record).
export const DELETE = route<Params>(async (request, { params }) => {
  const { gardenId, plantingId } = await parseParams(request, params, plantingIdParamsSchema);
  await requireRole(request, gardenId, "grower");
  return Response.json(await removePlanting({ gardenId, plantingId }));
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { POST, PUT } = refuseOtherMethods({ GET, PATCH, DELETE });
