import { z } from "zod";
import { createBin, listBins } from "@/db/queries/bins";
import { requireRole } from "@/lib/auth/require-role";
import { parseJson, parseParams, route, refuseOtherMethods } from "@/lib/http";
import { createBinSchema } from "@/lib/validation/bin";
import { nullParams, trayBox, wormCount } from "@/lib/validation/bin-values";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  return Response.json({ bins: await listBins({ gardenId }) });
});

// A start date may lie ahead: a second bin planned from the Balance's suggestion starts later.
export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, createBinSchema);
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

export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
