// @vitest-environment node
import { readFileSync } from "node:fs";
import path from "node:path";

import tailwind from "@tailwindcss/postcss";
import postcss from "postcss";
import { beforeAll, describe, expect, it } from "vitest";

import { palette } from "@/tailwind.config";

const root = path.resolve(__dirname, "../../..");
const from = path.join(root, "app/globals.css");

// Proves the JS theme reaches the built CSS through `@config` (Tailwind 4 no
// longer reads tailwind.config.ts on its own) and that classes in components/ui
// are picked up by source detection.
describe("built stylesheet", () => {
  let css = "";
  beforeAll(async () => {
    const result = await postcss([tailwind({ base: root })]).process(readFileSync(from, "utf8"), {
      from,
    });
    css = result.css;
  }, 30_000);

  function rule(selector: string): string {
    const start = css.indexOf(`${selector} {`);
    expect(start, `no rule for ${selector}`).toBeGreaterThanOrEqual(0);
    return css.slice(start, css.indexOf("}", start));
  }

  it("emits palette colours used by the primitives with our values", () => {
    expect(rule(".bg-leaf-700")).toContain(palette.leaf[700]);
    expect(rule(".bg-bloom-700")).toContain(palette.bloom[700]);
    expect(rule(".text-soil-900")).toContain(palette.soil[900]);
    expect(rule(".border-loam-400")).toContain(palette.loam[400]);
  });

  it("emits the font families on the next/font variables and the radii", () => {
    expect(rule(".font-body")).toContain("var(--font-body)");
    expect(rule(".font-display")).toContain("var(--font-display)");
    expect(rule(".rounded-control")).toContain("0.625rem");
    expect(rule(".rounded-card")).toContain("1rem");
  });

  it("keeps 44 px tap targets and stops the pulse for reduced motion", () => {
    // Tailwind 4 spacing: min-h-11 = calc(var(--spacing) * 11) with --spacing 0.25rem → 2.75rem = 44 px.
    expect(rule(".min-h-11")).toContain("calc(var(--spacing) * 11)");
    expect(css).toMatch(/--spacing: 0\.25rem/);
    expect(css).toMatch(/prefers-reduced-motion: reduce[\s\S]*animation: none/);
  });
});
