import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ExplanationProvider, ExplanationText, Figure } from "@/components/balance/explanation";
import type { Explanation } from "@/lib/engine";

// 1 gal = 3.785411784 L and 1 lb = 0.45359237 kg (NIST Handbook 44, Appendix C).
const GAL = 3.785411784;
const LB = 0.45359237;

const teaMonth: Explanation = {
  kind: "tea-brewed",
  // PRODUCT.md: tea recipe 10 % castings per water; 0.7 kg/L bulk density.
  inputs: {
    tea: { unit: "L", value: 2 * GAL },
    castingsPerWater: { unit: "ratio", value: 0.1 },
    bulkDensity: { unit: "ratio", value: 0.7 },
    castings: { unit: "kg", value: 2 * GAL * 0.1 * 0.7 },
  },
  parts: [
    {
      kind: "harvest-logged",
      inputs: { bin: { ref: "bin", id: "b1" }, castings: { unit: "kg", value: 44 * LB } },
    },
  ],
};

describe("ExplanationText", () => {
  it("writes the engine's figures in the garden's units, parts nested", () => {
    render(<ExplanationText explanation={teaMonth} system="us" nameOf={() => "Cedar stack"} />);
    // 2 gal × 0.1 × 0.7 kg/L = 0.53 kg = 1.17 lb → "1.2 lb".
    expect(
      screen.getByText(/2 gal of tea brewed at 10 % castings to water takes 1.2 lb of castings/),
    ).toBeTruthy();
    expect(screen.getByRole("listitem").textContent).toBe(
      "Cedar stack: a harvest of 44 lb was logged.",
    );
  });

  it("uses litres and kilograms in a metric garden", () => {
    render(<ExplanationText explanation={teaMonth} system="metric" />);
    // 2 gal = 7.57 L → "7.6 L"; 0.53 kg → "530 g".
    expect(screen.getByText(/7.6 L of tea brewed .* takes 530 g of castings/)).toBeTruthy();
  });
});

describe("Figure", () => {
  it("opens the explanation in a dialog when pressed", () => {
    render(
      <ExplanationProvider system="us" nameOf={() => undefined}>
        <Figure title="Tea, Jul 2026" explanation={teaMonth}>
          1.2 lb
        </Figure>
      </ExplanationProvider>,
    );
    expect(screen.queryByTestId("explanation")).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: /1.2 lb/ }));
    expect(screen.getByTestId("explanation").textContent).toContain("takes 1.2 lb of castings");
  });

  it("is plain text outside a provider", () => {
    render(
      <Figure title="x" explanation={teaMonth}>
        3 lb
      </Figure>,
    );
    expect(screen.queryByRole("button")).toBeNull();
    expect(screen.getByText("3 lb")).toBeTruthy();
  });
});
