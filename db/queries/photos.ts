import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "@/db";
import { binEvents, uploads } from "@/db/schema";

// Photo records (the bytes live in object storage under storage_key).

export const PHOTO_OWNER_TYPE = "bin-event";

export async function eventBelongsToGarden({
  gardenId,
  eventId,
}: {
  gardenId: string;
  eventId: string;
}) {
  const db = await getDb();
  const [row] = await db
    .select({ id: binEvents.id })
    .from(binEvents)
    .where(and(eq(binEvents.gardenId, gardenId), eq(binEvents.id, eventId)))
    .limit(1);
  return Boolean(row);
}

export async function createPhoto(input: {
  gardenId: string;
  uploadedBy: string;
  storageKey: string;
  byteSize: number;
  originalName: string;
  eventId: string | null;
}): Promise<{ id: string }> {
  const db = await getDb();
  const [row] = await db
    .insert(uploads)
    .values({
      gardenId: input.gardenId,
      uploadedBy: input.uploadedBy,
      storageKey: input.storageKey,
      contentType: "image/jpeg",
      byteSize: input.byteSize,
      originalName: input.originalName.slice(0, 200),
      attachedToType: input.eventId ? PHOTO_OWNER_TYPE : null,
      attachedToId: input.eventId,
    })
    .returning({ id: uploads.id });
  return row!;
}

export async function getPhoto({ gardenId, photoId }: { gardenId: string; photoId: string }) {
  const db = await getDb();
  const [row] = await db
    .select({ id: uploads.id, storageKey: uploads.storageKey, contentType: uploads.contentType })
    .from(uploads)
    .where(and(eq(uploads.gardenId, gardenId), eq(uploads.id, photoId)))
    .limit(1);
  return row ?? null;
}
