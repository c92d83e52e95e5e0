import type { Metadata } from "next";

// The icons every page links (root layout metadata). Files in public/, drawn from
// public/icon.svg by scripts/make-icons.ts; the manifest is app/manifest.ts.
export const siteIcons = {
  icon: [
    { url: "/icon.svg", type: "image/svg+xml" },
    { url: "/favicon-32.png", type: "image/png", sizes: "32x32" },
  ],
  apple: [{ url: "/apple-touch-icon.png", sizes: "180x180" }],
} satisfies Metadata["icons"];
