import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { LiquidCaution, PreHarvestCaution } from "@/components/balance/feeding-cautions";
import { BinCautions } from "@/components/bins/bin-cautions";

// Cautions speak a grower's words in the garden's units; citations sit behind
// "Sources". Figures checked: 1 lb = 0.45359237 kg (NIST HB 44, App. C);
// °C = (°F − 32) × 5/9 (NIST SP 811, B.8); the worms' band 55–77 °F (PRODUCT.md,
// NC State Extension); the NIOSH load constant 23 kg / 51 lb (Waters et al. 1993,
// from memory); pre-harvest 120 / 90 days (7 CFR 205.203(c)(1)).

// A number followed by a unit ("in" and "m" alone are ordinary words).
const US_UNITS = /\d\s?(lb|lbs|oz|fl oz|gal|gallons?|cups?|qt|in|ft|ft²|ft³|°F)(?![\p{L}])/u;
const METRIC_UNITS = /\d\s?(kg|g|L|mL|litres?|cm|m|m²|°C)(?![\p{L}])/u;
const CITATION = /CFR|NIOSH|et al\.|USDA|Extension|UF\/IFAS|\bEPA\b|§/;

/** The words a grower reads without opening "Sources". */
function bodyText(container: HTMLElement): string {
  const copy = container.cloneNode(true) as HTMLElement;
  copy.querySelectorAll("details").forEach((d) => d.remove());
  return copy.textContent ?? "";
}

const heavyBin = { fullTrayKg: 30, manureFeedstock: true, indoors: false };

describe("bin cautions", () => {
  it("a metric garden reads kg and °C only", () => {
    const { container } = render(<BinCautions {...heavyBin} system="metric" />);
    const text = container.textContent ?? "";
    expect(text).not.toMatch(US_UNITS);
    expect(text).toContain("30 kg"); // the bin's own full tray
    expect(text).toContain("23 kg"); // the one-person limit
    expect(text).toMatch(/between 13 °C and 25 °C/); // 55 °F = 12.8 °C, 77 °F = 25 °C
  });

  it("a US garden reads lb and °F only", () => {
    const { container } = render(<BinCautions {...heavyBin} system="us" />);
    const text = container.textContent ?? "";
    expect(text).not.toMatch(METRIC_UNITS);
    expect(text).toContain("66 lb"); // 30 kg / 0.45359237 = 66.1 lb
    expect(text).toContain("51 lb"); // 23 kg = 50.7 lb
    expect(text).toMatch(/between 55 °F and 77 °F/);
  });

  it("says it in plain words, with the citations behind Sources", () => {
    const { container } = render(<BinCautions {...heavyBin} system="metric" />);
    expect(bodyText(container)).not.toMatch(CITATION);
    expect(bodyText(container)).toMatch(/120 days/);
    const manure = screen.getByTestId("caution-pre-harvest");
    const sources = within(manure).getByText("Sources").closest("details")!;
    expect(sources).not.toHaveAttribute("open");
    expect(sources).toHaveTextContent("7 CFR 205.203(c)(1)");
    expect(bodyText(container)).toMatch(/local rules/i);
  });

  it("leaves the manure caution off a bin with no manure", () => {
    render(<BinCautions {...heavyBin} manureFeedstock={false} system="us" />);
    expect(screen.queryByTestId("caution-pre-harvest")).toBeNull();
  });
});

describe("feeding cautions", () => {
  it("liquids and pre-harvest lines carry no citation in their words", () => {
    const { container } = render(
      <>
        <LiquidCaution />
        <PreHarvestCaution />
      </>,
    );
    expect(bodyText(container)).not.toMatch(CITATION);
    expect(bodyText(container)).toMatch(/molasses/);
    expect(container.querySelectorAll("details summary")).toHaveLength(2);
  });
});
