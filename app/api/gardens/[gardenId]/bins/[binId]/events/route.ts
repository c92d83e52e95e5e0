import { z } from "zod";
import { markGardenInputsChanged } from "@/db/queries/garden-inputs-version";
import { getDb } from "@/db";
import { listBinLog } from "@/db/queries/bin-events";
import { getBinById } from "@/db/queries/bins";
import { getGardenById } from "@/db/queries/gardens";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { formatDayWithYear } from "@/lib/format";
import { parseJson, parseParams, parseWith, route, refuseOtherMethods } from "@/lib/http";
import { binEventFilterSchema, binEventSchema } from "@/lib/validation/bin-event";
import { todayIn } from "@/lib/validation/bin-values";
import { checkWormTarget, writeBinEvent } from "./write-bin-event";

const paramsSchema = z.object({ gardenId: z.uuid(), binId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, binId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const search = Object.fromEntries(new URL(request.url).searchParams);
  const { kind, limit } = parseWith(binEventFilterSchema, search);
  if (!(await getBinById({ gardenId, binId }))) throw new AppError("not_found:bin");
  return Response.json({ entries: await listBinLog({ gardenId, binId, kind, limit }) });
});

/** Helpers and up log bin work; the date must lie between the bin's start (or retirement) and today. */
export const POST = route<Params>(async (request, { params }) => {
  const { gardenId, binId } = await parseParams(request, params, paramsSchema);
  const member = await requireRole(request, gardenId, "helper");
  const input = await parseJson(request, binEventSchema);
  const [bin, garden] = await Promise.all([
    getBinById({ gardenId, binId }),
    getGardenById({ gardenId }),
  ]);
  if (!bin || !garden) throw new AppError("not_found:bin");
  const today = todayIn(garden.timeZone);
  if (input.on < bin.startedOn)
    throw new AppError(
      "validation:on",
      `This bin started on ${formatDayWithYear(bin.startedOn)}.`,
      {
        on: `is before the bin started (${formatDayWithYear(bin.startedOn)})`,
      },
    );
  if (input.on > today)
    throw new AppError("validation:on", "Log what has happened, not what will.", {
      on: "is in the future",
    });
  if (bin.retiredOn && input.on > bin.retiredOn)
    throw new AppError(
      "validation:on",
      `This bin was retired on ${formatDayWithYear(bin.retiredOn)}.`,
      {
        on: `is after the bin was retired (${formatDayWithYear(bin.retiredOn)})`,
      },
    );
  if (input.kind === "worms-moved") await checkWormTarget(member, bin, input);
  const db = await getDb();
  const result = await db.transaction((tx) =>
    writeBinEvent(tx, {
      member,
      bin,
      input,
      confirm: new URL(request.url).searchParams.has("confirm"),
      system: garden.unitSystem,
    }),
  );
  // After the commit: this garden's cached plan (and the receiving garden's) is stale.
  markGardenInputsChanged(gardenId);
  if (input.kind === "worms-moved" && input.to && input.to.gardenId !== gardenId)
    markGardenInputsChanged(input.to.gardenId);
  return Response.json(result, { status: 201 });
});

export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
