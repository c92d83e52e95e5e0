import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import config, { palette } from "@/tailwind.config";

const root = path.resolve(__dirname, "../../..");

// WCAG 2.2, "relative luminance" and "contrast ratio" definitions (Understanding SC 1.4.3).
function luminance(hex: string): number {
  const n = Number.parseInt(hex.slice(1), 16);
  const [r, g, b] = [n >> 16, (n >> 8) & 255, n & 255].map((v) => {
    const c = v / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

type Token = `${keyof typeof palette}-${string}`;
function hex(token: Token | "white"): string {
  if (token === "white") return "#ffffff";
  const [family, shade] = token.split("-") as [keyof typeof palette, string];
  const value = (palette[family] as Record<string, string>)[shade];
  if (!value) throw new Error(`No colour token ${token} in tailwind.config.ts`);
  return value;
}

describe("contrast formula", () => {
  it("matches the WCAG end points and a known AA threshold grey", () => {
    // WCAG 2.2 definition: ratios range from 1:1 to 21:1 (black on white).
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 5);
    expect(contrast("#2e6b3a", "#2e6b3a")).toBeCloseTo(1, 5);
    // From memory: #767676 on white is ≈ 4.54:1, the lightest grey passing AA body text.
    expect(contrast("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
  });
});

describe("palette contrast (WCAG 2.2 AA)", () => {
  // [text, background] pairs as the primitives use them.
  const textPairs: Array<[Token | "white", Token | "white", string]> = [
    ["soil-900", "loam-50", "body text on the page"],
    ["soil-900", "white", "text in cards, fields, dialogs"],
    ["soil-700", "white", "hints and descriptions"],
    ["soil-700", "loam-100", "empty-state text"],
    ["soil-600", "white", "placeholder text"],
    ["white", "leaf-700", "primary button"],
    ["white", "leaf-900", "primary button pressed"],
    ["white", "bloom-700", "danger button"],
    ["white", "bloom-800", "danger button hover"],
    ["leaf-800", "white", "ghost button and toast action"],
    ["leaf-800", "leaf-50", "ghost button hover"],
    ["bloom-700", "white", "field error text"],
    ["leaf-900", "leaf-100", "positive badge"],
    ["clay-800", "clay-50", "caution badge"],
    ["frost-800", "frost-50", "info badge"],
    ["bloom-800", "bloom-50", "danger badge"],
    ["soil-900", "clay-50", "caution box"],
    ["soil-900", "frost-50", "info box"],
    ["soil-900", "bloom-50", "danger box"],
  ];
  it.each(textPairs)("%s on %s (%s) is at least 4.5:1 (SC 1.4.3)", (fg, bg) => {
    expect(contrast(hex(fg), hex(bg))).toBeGreaterThanOrEqual(4.5);
  });

  // SC 1.4.11 non-text contrast: control edges, focus ring and state icons need 3:1.
  const uiPairs: Array<[Token, Token | "white"]> = [
    ["loam-400", "white"],
    ["loam-400", "loam-50"],
    ["frost-700", "loam-50"],
    ["frost-700", "white"],
    ["clay-700", "clay-50"],
    ["bloom-700", "bloom-50"],
  ];
  it.each(uiPairs)("%s against %s is at least 3:1 (SC 1.4.11)", (fg, bg) => {
    expect(contrast(hex(fg), hex(bg))).toBeGreaterThanOrEqual(3);
  });
});

describe("tokens in tailwind.config.ts", () => {
  const dir = path.join(root, "components/ui");
  const sources = [
    ...readdirSync(dir)
      .filter((f) => /\.tsx?$/.test(f))
      .map((f) => readFileSync(path.join(dir, f), "utf8")),
    readFileSync(path.join(root, "app/globals.css"), "utf8"),
  ].join("\n");
  const families = Object.keys(palette).join("|");
  const used = new Set(
    [...sources.matchAll(new RegExp(`\\b(${families})[-.](\\d{2,3})\\b`, "g"))].map(
      (m) => `${m[1]}-${m[2]}`,
    ),
  );
  const defined = Object.entries(palette).flatMap(([family, shades]) =>
    Object.keys(shades).map((shade) => `${family}-${shade}`),
  );

  it("every colour class the primitives use is defined", () => {
    expect([...used].filter((token) => !defined.includes(token))).toEqual([]);
  });

  it("every defined colour is used by a primitive (no dead tokens)", () => {
    expect(defined.filter((token) => !used.has(token))).toEqual([]);
  });

  it("every defined radius and font family is used", () => {
    const { borderRadius, fontFamily } = config.theme.extend;
    for (const name of Object.keys(borderRadius)) expect(sources).toContain(`rounded-${name}`);
    for (const name of Object.keys(fontFamily)) expect(sources).toContain(`font-${name}`);
  });
});
