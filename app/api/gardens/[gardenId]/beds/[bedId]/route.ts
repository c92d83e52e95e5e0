import { getBedById, removeBed, updateBed } from "@/db/queries/beds";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, parseWith, refuseOtherMethods, route } from "@/lib/http";
import { bedIdParamsSchema, createBedSchema, updateBedSchema } from "@/lib/validation/bed";
import { fromSi } from "@/lib/units";

type Params = { gardenId: string; bedId: string };

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, bedId } = await parseParams(request, params, bedIdParamsSchema);
  await requireRole(request, gardenId, "viewer");
  const bed = await getBedById({ gardenId, bedId });
  if (!bed) throw new AppError("not_found:bed");
  return Response.json({ bed });
});

export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId, bedId } = await parseParams(request, params, bedIdParamsSchema);
  await requireRole(request, gardenId, "grower");
  const patch = await parseJson(request, updateBedSchema);
  const current = await getBedById({ gardenId, bedId });
  if (!current) throw new AppError("not_found:bed");
  // Merge onto the stored bed (sizes back as SI quantities), then check the whole,
  // so switching a bed to a container without a volume is refused by field.
  const m = (value: number | null) => (value === null ? null : { value, unit: "m" as const });
  const stored = {
    name: current.name,
    kind: current.kind,
    indoors: current.indoors,
    length: m(current.lengthM),
    width: m(current.widthM),
    depth: m(current.depthM),
    volume:
      current.containerVolumeL === null
        ? null
        : { value: fromSi(current.containerVolumeL, "L"), unit: "L" as const },
    notes: current.notes,
  };
  const input = parseWith(createBedSchema, { ...stored, ...patch });
  const bed = await updateBed({ gardenId, bedId, input });
  if (!bed) throw new AppError("not_found:bed");
  return Response.json({ bed });
});

// Removes a bed nothing logged refers to; a bed with logged feedings answers 409 (kept for the record).
export const DELETE = route<Params>(async (request, { params }) => {
  const { gardenId, bedId } = await parseParams(request, params, bedIdParamsSchema);
  await requireRole(request, gardenId, "grower");
  return Response.json(await removeBed({ gardenId, bedId }));
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { POST, PUT } = refuseOtherMethods({ GET, PATCH, DELETE });
