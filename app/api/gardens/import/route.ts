import { z } from "zod";
import { markGardenInputsChanged } from "@/db/queries/garden-inputs-version";
import { importGardenScenario } from "@/db/queries/garden-scenario";
import { getGardenById } from "@/db/queries/gardens";
import type { ImportBody } from "@/lib/balance/types";
import { requireUser } from "@/lib/auth/session";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";

export const dynamic = "force-dynamic";

/** A scenario file is far smaller than this (the demo garden's is ~100 kB). */
const MAX_SCENARIO_BYTES = 5_000_000;

// A new garden from a scenario file; the signed-in person becomes its owner.
// Checked whole before anything is written (every failing path in `fields`),
// then written in one transaction: a file that fails creates nothing.
export const POST = route(async (request) => {
  const user = await requireUser(request);
  // Refused on Content-Length before reading, and counted byte by byte while reading (lib/http.ts).
  const scenario = await parseJson(request, z.unknown(), { maxBytes: MAX_SCENARIO_BYTES });
  const { gardenId } = await importGardenScenario({ scenario, ownerId: user.id });
  markGardenInputsChanged(gardenId);
  const garden = await getGardenById({ gardenId });
  const body: ImportBody = { garden: { id: gardenId, name: garden?.name ?? "" } };
  return Response.json(body, { status: 201 });
});

export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
