import { randomUUID } from "node:crypto";
import { z } from "zod";
import { createPhoto, eventBelongsToGarden } from "@/db/queries/photos";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseParams, route, refuseOtherMethods } from "@/lib/http";
import { getStorage, StorageUnavailableError } from "@/services/storage";
import { MAX_PHOTO_BYTES, preparePhoto, tooLarge } from "@/services/storage/photo";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

/**
 * Uploads one photo (multipart: `file`, optional `eventId` of a bin-log entry).
 * The log entry is written first by its own request, so when storage is down
 * the entry stays and this upload can simply be sent again.
 */
export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  const member = await requireRole(request, gardenId, "helper");
  // Refuse an oversized body before reading it (multipart adds a little around the file).
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > MAX_PHOTO_BYTES + 64 * 1024) throw tooLarge();
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new AppError("bad_request:form", "Send the photo as a form upload.", {
      file: "is missing",
    });
  }
  const file = form.get("file");
  if (!(file instanceof File))
    throw new AppError("validation:file", "Choose a photo.", { file: "is missing" });
  if (file.size > MAX_PHOTO_BYTES) throw tooLarge();
  const eventId = form.get("eventId");
  if (eventId !== null) {
    if (
      typeof eventId !== "string" ||
      !z.uuid().safeParse(eventId).success ||
      !(await eventBelongsToGarden({ gardenId, eventId }))
    )
      throw new AppError(
        "validation:eventId",
        "Attach the photo to an entry of this garden's log.",
        {
          eventId: "is not a log entry of this garden",
        },
      );
  }
  const jpeg = await preparePhoto(Buffer.from(await file.arrayBuffer()));
  // Generated keys: nothing of the file name or the garden's data reaches storage.
  const storageKey = `photos/${gardenId}/${randomUUID()}.jpg`;
  try {
    await (await getStorage()).put(storageKey, jpeg, "image/jpeg");
  } catch (error) {
    if (error instanceof StorageUnavailableError) {
      console.error("[castline] photo storage unavailable", error.cause);
      throw new AppError(
        "unavailable:storage",
        "Photo storage is not answering. Your log entry is saved; try the photo again in a moment.",
      );
    }
    throw error;
  }
  const photo = await createPhoto({
    gardenId,
    uploadedBy: member.user.id,
    storageKey,
    byteSize: jpeg.length,
    originalName: file.name,
    eventId: typeof eventId === "string" ? eventId : null,
  });
  return Response.json(
    { photo: { id: photo.id, url: `/api/gardens/${gardenId}/photos/${photo.id}` } },
    { status: 201 },
  );
});

export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
