import "@/tests/support/integration/env";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as binEvents from "@/app/api/gardens/[gardenId]/bins/[binId]/events/route";
import * as photo from "@/app/api/gardens/[gardenId]/photos/[photoId]/route";
import * as photos from "@/app/api/gardens/[gardenId]/photos/route";
import { getPhoto } from "@/db/queries/photos";
import { getStorage, stopLocalS3 } from "@/services/storage";
import { seedBin } from "@/tests/support/integration/bins";
import {
  BASE_URL,
  closeHarness,
  cookieFor,
  countRows,
  makeGardenWithRoles,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// Uploads go through the route with a real multipart Request against the
// local fake S3 (s3rver) that the app starts when S3_ENDPOINT is unset.

let world: GardenWorld;
beforeAll(async () => {
  world = await makeGardenWithRoles();
});
afterAll(async () => {
  await stopLocalS3();
  await closeHarness();
});

async function upload(
  file: Blob,
  name: string,
  who: keyof GardenWorld = "helper",
  eventId?: string,
) {
  const form = new FormData();
  form.set("file", file, name);
  if (eventId) form.set("eventId", eventId);
  const request = new Request(`${BASE_URL}/api/gardens/${world.gardenId}/photos`, {
    method: "POST",
    body: form,
    headers: { cookie: await cookieFor(world[who] as { id: string }) },
  });
  const res = await photos.POST(request, { params: Promise.resolve({ gardenId: world.gardenId }) });
  return { status: res.status, json: await res.json() };
}

/** A JPEG carrying GPS EXIF, as a phone would write it. */
async function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 48, channels: 3, background: "#6b5a4b" } })
    .jpeg()
    .withExif({
      IFD0: { Make: "TestCam", Model: "Garden 1" },
      IFD3: {
        GPSLatitudeRef: "N",
        GPSLatitude: "41/1 52/1 0/1",
        GPSLongitudeRef: "W",
        GPSLongitude: "87/1 37/1 0/1",
      },
    })
    .toBuffer();
}

describe("photos", () => {
  it("stores a re-encoded photo with EXIF and GPS gone, under a generated key", async () => {
    const original = await jpegWithGps();
    // The test photo really carries the tags before upload (else the check below proves nothing).
    const before = await sharp(original).metadata();
    expect(before.exif).toBeDefined();
    expect(before.exif!.toString("latin1")).toContain("TestCam");

    const bin = await seedBin(world.gardenId);
    const logged = await (async () => {
      const body = JSON.stringify({ kind: "tray-harvested", on: "2026-04-20", castingsKg: 18 });
      const req = new Request(`${BASE_URL}/api/gardens/${world.gardenId}/bins/${bin.id}/events`, {
        method: "POST",
        body,
        headers: { "content-type": "application/json", cookie: await cookieFor(world.helper) },
      });
      const res = await binEvents.POST(req, {
        params: Promise.resolve({ gardenId: world.gardenId, binId: bin.id }),
      });
      return res.json();
    })();
    const res = await upload(
      new Blob([new Uint8Array(original)], { type: "image/jpeg" }),
      "IMG_0042 at home.jpg",
      "helper",
      logged.eventId,
    );
    expect(res.status).toBe(201);
    const stored = await getPhoto({ gardenId: world.gardenId, photoId: res.json.photo.id });
    expect(stored!.storageKey).toMatch(/^photos\/[0-9a-f-]{36}\/[0-9a-f-]{36}\.jpg$/);
    expect(stored!.storageKey).not.toContain("IMG_0042");
    const bytes = await (await getStorage()).get(stored!.storageKey);
    const after = await sharp(bytes).metadata();
    expect(after.format).toBe("jpeg");
    expect(after.exif).toBeUndefined();
    expect(bytes.toString("latin1")).not.toContain("TestCam");
    // A presigned GET link exists for the driver (s3rver does not check signatures: this shows the shape only).
    expect(await (await getStorage()).signedUrl(stored!.storageKey, 60)).toContain(
      "X-Amz-Signature=",
    );
  });

  it("serves a photo to members of that garden only", async () => {
    const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: "#2e6b3a" } })
      .png()
      .toBuffer();
    const up = await upload(new Blob([new Uint8Array(png)]), "leaf.png");
    const get = async (who: keyof GardenWorld) =>
      photo.GET(
        new Request(`${BASE_URL}${up.json.photo.url}`, {
          headers: { cookie: await cookieFor(world[who] as { id: string }) },
        }),
        { params: Promise.resolve({ gardenId: world.gardenId, photoId: up.json.photo.id }) },
      );
    const viewer = await get("viewer");
    expect(viewer.status).toBe(200);
    expect(viewer.headers.get("content-type")).toBe("image/jpeg");
    expect((await get("outsider")).status).toBe(404);
  });

  it("refuses a PDF renamed .jpg, an SVG with script, and a 50 MB file, by content and size", async () => {
    const pdf = Buffer.from(
      "%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\ntrailer << >>\n%%EOF\n",
    );
    const asJpg = await upload(new Blob([pdf], { type: "image/jpeg" }), "harvest.jpg");
    expect(asJpg.status).toBe(400);
    expect(asJpg.json.error.fields.file).toMatch(/pdf/);
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>';
    const svgRes = await upload(new Blob([svg], { type: "image/svg+xml" }), "tray.svg");
    expect(svgRes.status).toBe(400);
    expect(svgRes.json.error.fields.file).toMatch(/not a photo/);
    const big = await upload(
      new Blob([new Uint8Array(50 * 1024 * 1024)], { type: "image/jpeg" }),
      "big.jpg",
    );
    expect(big.status).toBe(400);
    expect(big.json.error.fields.file).toMatch(/10 MB/);
  });

  it("storage down: the log entry stays and the upload says to try the photo again", async () => {
    const bin = await seedBin(world.gardenId);
    const req = new Request(`${BASE_URL}/api/gardens/${world.gardenId}/bins/${bin.id}/events`, {
      method: "POST",
      body: JSON.stringify({ kind: "tray-harvested", on: "2026-04-21", castingsKg: 17 }),
      headers: { "content-type": "application/json", cookie: await cookieFor(world.helper) },
    });
    const logged = await (
      await binEvents.POST(req, {
        params: Promise.resolve({ gardenId: world.gardenId, binId: bin.id }),
      })
    ).json();
    const events = await countRows("bin_events");
    const uploadsBefore = await countRows("uploads");
    await stopLocalS3();
    const jpeg = await jpegWithGps();
    const down = await upload(new Blob([new Uint8Array(jpeg)]), "a.jpg", "helper", logged.eventId);
    expect(down.status).toBe(503);
    expect(down.json.error.message).toMatch(/log entry is saved/);
    expect(await countRows("bin_events")).toBe(events);
    expect(await countRows("uploads")).toBe(uploadsBefore);
  });
});
