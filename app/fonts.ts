import localFont from "next/font/local";

/*
 * Fonts ship inside the app (OFL files beside them in app/fonts/) because
 * next/font/google fetches at build time and these machines have no network.
 * Only the latin subset of each variable font is bundled to keep pages light.
 * Apply both `.variable` class names on <html> so the Tailwind families
 * `font-body` and `font-display` resolve.
 */
export const bodyFont = localFont({
  src: [
    { path: "./fonts/public-sans-latin-wght-normal.woff2", weight: "100 900", style: "normal" },
    { path: "./fonts/public-sans-latin-wght-italic.woff2", weight: "100 900", style: "italic" },
  ],
  variable: "--font-body",
  display: "swap",
  fallback: ["system-ui", "sans-serif"],
});

export const displayFont = localFont({
  src: [{ path: "./fonts/fraunces-latin-wght-normal.woff2", weight: "100 900", style: "normal" }],
  variable: "--font-display",
  display: "swap",
  fallback: ["Georgia", "serif"],
  adjustFontFallback: "Times New Roman",
});
