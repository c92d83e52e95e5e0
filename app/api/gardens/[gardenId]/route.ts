import { z } from "zod";
import { deleteGarden, getGardenById, updateGarden } from "@/db/queries/gardens";
import { requireRole } from "@/lib/auth/require-role";
import { confirmTextMismatch, sameConfirmText } from "@/lib/confirm-text";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, parseWith, route, refuseOtherMethods } from "@/lib/http";
import {
  createGardenSchema,
  deleteGardenSchema,
  updateGardenSchema,
} from "@/lib/validation/garden";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  const member = await requireRole(request, gardenId, "viewer");
  const garden = await getGardenById({ gardenId });
  if (!garden) throw new AppError("not_found:garden");
  return Response.json({ garden, role: member.role });
});

export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "owner");
  const input = await parseJson(request, updateGardenSchema);
  const current = await getGardenById({ gardenId });
  if (!current) throw new AppError("not_found:garden");
  // Check the merged result, so changing one frost date cannot put them out of order.
  parseWith(createGardenSchema, { ...current, ...input });
  const garden = await updateGarden({ gardenId, input });
  return Response.json({ garden });
});

// Deleting needs the owner to type the garden's name: it takes every bed, bin and log with it.
export const DELETE = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "owner");
  const { confirmName } = await parseJson(request, deleteGardenSchema);
  const garden = await getGardenById({ gardenId });
  if (!garden) throw new AppError("not_found:garden");
  // The same comparison as the dialog: a phone's curly apostrophe is not another name.
  if (!sameConfirmText(confirmName, garden.name)) {
    throw new AppError("validation:confirm", "The name typed does not match the garden's name.", {
      confirmName:
        `Type "${garden.name}" to delete it. ${confirmTextMismatch(confirmName, garden.name) ?? ""}`.trim(),
    });
  }
  await deleteGarden({ gardenId });
  return Response.json({ ok: true });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { POST, PUT } = refuseOtherMethods({ GET, PATCH, DELETE });
