import "server-only";
import { fileTypeFromBuffer } from "file-type";
import sharp from "sharp";
import { AppError } from "@/lib/errors";

// What a photo must be before it is stored: an image by its content (magic
// bytes, not its name), at most 10 MB, re-encoded as JPEG at most 2048 px on
// its long side. Re-encoding drops EXIF, GPS, XMP and ICC: a garden's
// location stays private.

export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
const ACCEPTED = new Set(["image/jpeg", "image/png", "image/webp", "image/heic", "image/avif"]);
const MAX_SIDE_PX = 2048;

export async function preparePhoto(bytes: Buffer): Promise<Buffer> {
  if (bytes.length > MAX_PHOTO_BYTES) throw tooLarge();
  const type = await fileTypeFromBuffer(bytes);
  // file-type answers undefined for text, so an SVG (with or without script) lands here too.
  if (!type || !ACCEPTED.has(type.mime))
    throw new AppError(
      "validation:photo_type",
      "That file is not a photo we can use. Send a JPEG, PNG, WebP or HEIC picture.",
      { file: type ? `is ${type.ext}, not a photo` : "is not a photo (by its content)" },
    );
  try {
    return await sharp(bytes, { limitInputPixels: 50_000_000 })
      .rotate() // apply the camera's orientation before the EXIF that carried it is dropped
      .resize({ width: MAX_SIDE_PX, height: MAX_SIDE_PX, fit: "inside", withoutEnlargement: true })
      .jpeg({ quality: 82 })
      .toBuffer();
  } catch {
    throw new AppError("validation:photo_type", "That picture could not be read.", {
      file: "could not be read as a picture",
    });
  }
}

export function tooLarge(): AppError {
  return new AppError("validation:photo_size", "Photos can be at most 10 MB.", {
    file: "is larger than 10 MB",
  });
}
