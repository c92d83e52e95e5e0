import { z } from "zod";
import { balanceFrom, getGardenBalance } from "@/db/queries/garden-plan";
import type { WhatIfBody } from "@/lib/balance/types";
import { applyWhatIf, diffPlans } from "@/lib/balance/what-if";
import { requireRole } from "@/lib/auth/require-role";
import { EngineInputError } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route, refuseOtherMethods } from "@/lib/http";
import { whatIfRequestSchema } from "@/lib/validation/what-if";

export const dynamic = "force-dynamic";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

// Changes tried on a copy of the garden's inputs: today's Balance beside the
// changed one. Viewers may try this too; nothing is written.
export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const input = await parseJson(request, whatIfRequestSchema);
  const current = await getGardenBalance({ gardenId, from: input.from, months: input.months });
  const perHarvestKg = new Map(current.body.plan.bins.map((b) => [b.binId, b.perHarvestKg]));
  const changedInputs = applyWhatIf(current.inputs, input.changes, perHarvestKg);
  let changed;
  try {
    changed = balanceFrom(current.body, changedInputs);
  } catch (error) {
    // The engine re-checks what it is given; a change it refuses is the caller's to fix.
    if (error instanceof EngineInputError)
      throw new AppError("validation:what_if", error.message, { changes: error.message });
    throw error;
  }
  const body: WhatIfBody = {
    changes: input.changes,
    current: current.body,
    changed,
    diff: diffPlans(current.body.plan, changed.plan),
  };
  return Response.json(body, { headers: { "Cache-Control": "private, no-store" } });
});

export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
