import { createGarden } from "@/db/queries/gardens";
import { listGardensForUser } from "@/db/queries/memberships";
import { requireUser } from "@/lib/auth/session";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";
import { createGardenSchema } from "@/lib/validation/garden";

// The gardens the signed-in person belongs to, with their role in each.
export const GET = route(async (request) => {
  const user = await requireUser(request);
  return Response.json({ gardens: await listGardensForUser({ userId: user.id }) });
});

// Anyone signed in may start a garden; they become its owner.
export const POST = route(async (request) => {
  const user = await requireUser(request);
  const input = await parseJson(request, createGardenSchema);
  const garden = await createGarden({ input, ownerId: user.id });
  return Response.json({ garden }, { status: 201 });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
