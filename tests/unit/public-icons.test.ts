import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import manifest from "@/app/manifest";
import { siteIcons } from "@/lib/site-icons";
import { palette } from "@/tailwind.config";

// Issue 12 item 13: favicon, touch icon, install icons and a web app manifest.
const publicDir = path.resolve(__dirname, "../../public");

/** Width and height from a PNG's IHDR chunk (PNG spec, ISO/IEC 15948 §11.2.2). */
function pngSize(file: string): { width: number; height: number } {
  const bytes = fs.readFileSync(path.join(publicDir, file));
  expect(bytes.subarray(0, 8)).toEqual(Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]));
  expect(bytes.subarray(12, 16).toString("ascii")).toBe("IHDR");
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describe("icons in public/", () => {
  it.each([
    ["favicon-32.png", 32],
    ["apple-touch-icon.png", 180],
    ["icon-192.png", 192],
    ["icon-512.png", 512],
    ["icon-maskable-512.png", 512],
  ])("%s is a %i px square PNG", (file, size) => {
    expect(pngSize(file)).toEqual({ width: size, height: size });
  });

  it("the SVG favicon is an SVG drawn in the palette", () => {
    const svg = fs.readFileSync(path.join(publicDir, "icon.svg"), "utf8");
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    for (const colour of svg.match(/#[0-9a-f]{6}/gi) ?? []) {
      const inPalette = Object.values(palette).some((shades) =>
        Object.values(shades).includes(colour.toLowerCase() as never),
      );
      expect(inPalette, `${colour} is a palette colour (tailwind.config.ts)`).toBe(true);
    }
  });
});

describe("web app manifest and root metadata", () => {
  it("names the product, uses the palette's colours and lists icons that exist", () => {
    const m = manifest();
    expect(m.name).toBe("Castline");
    expect(m.short_name).toBe("Castline");
    expect(m.theme_color).toBe(palette.leaf[700]);
    expect(m.background_color).toBe(palette.loam[50]);
    const sizes = (m.icons ?? []).map((i) => i.sizes);
    expect(sizes).toEqual(expect.arrayContaining(["192x192", "512x512"]));
    for (const icon of m.icons ?? []) {
      expect(fs.existsSync(path.join(publicDir, icon.src)), icon.src).toBe(true);
    }
  });

  // The root layout passes siteIcons as metadata.icons; the browser test checks the <link>s.
  it("the icons every page links exist", () => {
    const urls = [...siteIcons.icon, ...siteIcons.apple].map((i) => i.url);
    expect(urls).toEqual(["/icon.svg", "/favicon-32.png", "/apple-touch-icon.png"]);
    for (const url of urls) expect(fs.existsSync(path.join(publicDir, url)), url).toBe(true);
  });
});
