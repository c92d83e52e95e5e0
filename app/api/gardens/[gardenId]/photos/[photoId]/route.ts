import { z } from "zod";
import { getPhoto } from "@/db/queries/photos";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseParams, route, refuseOtherMethods } from "@/lib/http";
import { getStorage, StorageUnavailableError } from "@/services/storage";

const paramsSchema = z.object({ gardenId: z.uuid(), photoId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

/** Members of the garden only: the bytes pass through here, never a public link. */
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId, photoId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const photo = await getPhoto({ gardenId, photoId });
  if (!photo) throw new AppError("not_found:photo");
  let bytes: Buffer;
  try {
    bytes = await (await getStorage()).get(photo.storageKey);
  } catch (error) {
    if (error instanceof StorageUnavailableError)
      throw new AppError(
        "unavailable:storage",
        "Photo storage is not answering. Try again shortly.",
      );
    throw error;
  }
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": photo.contentType,
      "cache-control": "private, max-age=3600",
      "x-content-type-options": "nosniff",
    },
  });
});

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods({ GET });
