// npm run icons: the PNG icons in public/ from public/icon.svg (the one drawing of the
// mark), so every size is the same picture. The outputs are committed; run this again
// after changing the SVG.
//
// Sizes: 32 px favicon; 180 px apple-touch-icon (Apple's size for current iPhones);
// 192 and 512 px for the web app manifest (the sizes Chromium asks for to install).
// Touch and "maskable" icons are full squares in the mark's own green: the platform
// rounds or masks them itself and would otherwise fill the transparent corners.
import fs from "node:fs";
import path from "node:path";
import sharp from "sharp";
import { palette } from "../tailwind.config";

const publicDir = path.resolve(__dirname, "../public");
const svg = fs.readFileSync(path.join(publicDir, "icon.svg"));

const outputs: { file: string; size: number; square: boolean }[] = [
  { file: "favicon-32.png", size: 32, square: false },
  { file: "apple-touch-icon.png", size: 180, square: true },
  { file: "icon-192.png", size: 192, square: false },
  { file: "icon-512.png", size: 512, square: false },
  { file: "icon-maskable-512.png", size: 512, square: true },
];

async function main() {
  for (const { file, size, square } of outputs) {
    // Rasterise at the target size (density scales the 32-unit viewBox), not by
    // shrinking a large bitmap, so thin strokes stay crisp at 32 px.
    let image = sharp(svg, { density: (72 * size) / 32, limitInputPixels: 4096 * 4096 }).resize(
      size,
      size,
    );
    if (square) image = image.flatten({ background: palette.leaf[700] });
    await image.png({ compressionLevel: 9 }).toFile(path.join(publicDir, file));
    console.log(`public/${file}  ${size} × ${size}${square ? " (full square)" : ""}`);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
