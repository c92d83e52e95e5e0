import type { Config } from "tailwindcss";

/*
 * Castline palette. Tokens are named by the job they do, not by hue:
 *   soil  – text and dark ink          loam  – page, surfaces, borders
 *   leaf  – primary actions, success   clay  – caution / warning
 *   frost – information, focus ring    bloom – danger, destructive actions
 * Only the shades the UI primitives use are defined, so an unused shade cannot
 * drift in. Contrast pairs are checked in tests/unit/components/ui-palette.test.tsx
 * against the WCAG 2.2 formula (AA: 4.5:1 for text, 3:1 for control borders).
 */
export const palette = {
  soil: { 600: "#6b5a4b", 700: "#4f4237", 900: "#2b2119" },
  loam: { 50: "#faf6ef", 100: "#f1e9dc", 200: "#e4d8c5", 400: "#8f7d68" },
  leaf: { 50: "#edf5ea", 100: "#d6e8cf", 700: "#2e6b3a", 800: "#235530", 900: "#1a4024" },
  clay: { 50: "#fbf0e1", 200: "#f0cf9f", 700: "#93500f", 800: "#743f0c" },
  frost: { 50: "#eaf2f6", 200: "#bcd6e3", 700: "#245a78", 800: "#1b465e" },
  bloom: { 50: "#fbecee", 200: "#f0bcc4", 700: "#a32637", 800: "#84202f" },
} as const;

const config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: { ...palette, white: "#ffffff" },
      fontFamily: {
        // The CSS variables are set by next/font/local (app/fonts.ts) on <html>.
        body: ["var(--font-body)", "system-ui", "sans-serif"],
        display: ["var(--font-display)", "Georgia", "serif"],
      },
      borderRadius: {
        control: "0.625rem",
        card: "1rem",
        pill: "9999px",
      },
    },
  },
} satisfies Config;

export default config;
