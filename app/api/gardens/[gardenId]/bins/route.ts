import { z } from "zod";
import { createBin, listBins } from "@/db/queries/bins";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route } from "@/lib/http";
import { createBinSchema } from "@/lib/validation/bin";
import { nullParams, todayIn, trayBox, wormCount } from "@/lib/validation/bin-values";
import { getGardenById } from "@/db/queries/gardens";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  return Response.json({ bins: await listBins({ gardenId }) });
});

export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, createBinSchema);
  const garden = await getGardenById({ gardenId });
  if (!garden) throw new AppError("not_found:garden");
  if (input.startedOn > todayIn(garden.timeZone))
    throw new AppError("validation:started", "A bin cannot start in the future.", {
      startedOn: "is after today",
    });
  const { tray, startingWorms, ...rest } = input;
  const box = trayBox(tray);
  const bin = await createBin({
    gardenId,
    values: {
      ...nullParams(rest),
      name: rest.name,
      kind: rest.kind,
      trayCount: rest.trayCount,
      startedOn: rest.startedOn,
      dormantMonths: rest.dormantMonths,
      indoors: rest.indoors,
      manureFeedstock: rest.manureFeedstock,
      trayLengthM: box.lengthM,
      trayWidthM: box.widthM,
      trayDepthM: box.depthM,
      startingWormCount: wormCount(startingWorms),
    },
  });
  return Response.json({ bin }, { status: 201 });
});
