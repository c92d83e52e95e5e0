import type { MetadataRoute } from "next";
import { palette } from "@/tailwind.config";

// Served at /manifest.webmanifest and linked from every page by Next. Colours are the
// palette's page background (loam-50) and primary green (leaf-700); the icons are
// drawn from public/icon.svg by scripts/make-icons.ts.
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Castline",
    short_name: "Castline",
    description: "Plans a garden's feeding around what its worm bins actually make.",
    start_url: "/gardens",
    scope: "/",
    display: "standalone",
    background_color: palette.loam[50],
    theme_color: palette.leaf[700],
    icons: [
      { src: "/icon.svg", type: "image/svg+xml", sizes: "any" },
      { src: "/icon-192.png", type: "image/png", sizes: "192x192", purpose: "any" },
      { src: "/icon-512.png", type: "image/png", sizes: "512x512", purpose: "any" },
      { src: "/icon-maskable-512.png", type: "image/png", sizes: "512x512", purpose: "maskable" },
    ],
  };
}
