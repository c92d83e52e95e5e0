import { z } from "zod";
import { getBinById, updateBin, type BinValues } from "@/db/queries/bins";
import { getGardenById } from "@/db/queries/gardens";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route, refuseOtherMethods } from "@/lib/http";
import { updateBinSchema } from "@/lib/validation/bin";
import { todayIn, trayBox, wormCount } from "@/lib/validation/bin-values";

const paramsSchema = z.object({ gardenId: z.uuid(), binId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, binId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const bin = await getBinById({ gardenId, binId });
  if (!bin) throw new AppError("not_found:bin");
  return Response.json({ bin });
});

export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId, binId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, updateBinSchema);
  const [bin, garden] = await Promise.all([
    getBinById({ gardenId, binId }),
    getGardenById({ gardenId }),
  ]);
  if (!bin || !garden) throw new AppError("not_found:bin");
  const { tray, startingWorms, ...rest } = input;
  const values: Partial<BinValues> = { ...rest };
  if (tray) {
    const box = trayBox(tray);
    Object.assign(values, {
      trayLengthM: box.lengthM,
      trayWidthM: box.widthM,
      trayDepthM: box.depthM,
    });
  }
  if (startingWorms) values.startingWormCount = wormCount(startingWorms);
  const startedOn = values.startedOn ?? bin.startedOn;
  const retiredOn = "retiredOn" in values ? values.retiredOn : bin.retiredOn;
  if (retiredOn && retiredOn < startedOn)
    throw new AppError("validation:retired", "A bin cannot retire before it started.", {
      retiredOn: "is before the start date",
    });
  return Response.json({ bin: await updateBin({ gardenId, binId, values }) });
});

// Retiring keeps the bin and its log (its lots and calibration stay history); it only stops the forecast.
export const DELETE = route<Params>(async (request, { params }) => {
  const { gardenId, binId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const [bin, garden] = await Promise.all([
    getBinById({ gardenId, binId }),
    getGardenById({ gardenId }),
  ]);
  if (!bin || !garden) throw new AppError("not_found:bin");
  if (bin.retiredOn) return Response.json({ bin });
  const today = todayIn(garden.timeZone);
  const retiredOn = today < bin.startedOn ? bin.startedOn : today;
  return Response.json({ bin: await updateBin({ gardenId, binId, values: { retiredOn } }) });
});

export const { POST, PUT } = refuseOtherMethods({ GET, PATCH, DELETE });
