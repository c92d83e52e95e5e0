import { describe, expect, it } from "vitest";
import { columnHeader, columnUnit, toColumnValue } from "@/lib/format-quantity";
import { balanceCsv } from "@/lib/balance/csv";
import type { BalanceBody } from "@/lib/balance/types";

// Table and CSV columns keep one unit for every row (no switch to oz or fl oz for
// small rows). SI inputs written out from NIST Handbook 44 Appendix C:
// 1 lb = 0.45359237 kg, 1 gal = 3.785411784 L.
const LB_KG = 0.45359237;
const GAL_L = 3.785411784;

describe("column units", () => {
  it("keeps pounds and gallons for a US garden, kilograms and litres for a metric one", () => {
    expect(columnUnit("castings-mass", "us")).toBe("lb");
    expect(columnUnit("liquid", "us")).toBe("gal");
    expect(columnUnit("castings-mass", "metric")).toBe("kg");
    expect(columnUnit("liquid", "metric")).toBe("L");
  });

  it("rounds like the screens: whole from 10 up, one decimal from 1, two figures below", () => {
    // 44.69 lb (PRODUCT.md's 20.27 kg tray) → 45; 1.23 gal → 1.2; 0.25 lb stays in lb.
    expect(toColumnValue(44.69 * LB_KG, "castings-mass", "us")).toBe(45);
    expect(toColumnValue(1.23 * GAL_L, "liquid", "us")).toBe(1.2);
    expect(toColumnValue(0.25 * LB_KG, "castings-mass", "us")).toBe(0.25);
    expect(columnHeader("Castings opening", "castings-mass", "us")).toBe("Castings opening (lb)");
  });
});

describe("balance CSV", () => {
  it("one line per month, a header with units, blank coverage when nothing was asked for", () => {
    const row = (pool: "castings" | "leachate", demand: number) => ({
      month: "2027-01",
      pool,
      opening: 0,
      supplied: 0,
      demand,
      allocated: 0,
      adjusted: 0,
      agedOut: 0,
      closing: 0,
      shortfall: demand,
      replayed: false,
      explanation: { kind: "pool-month" as const, inputs: {} },
    });
    const body = {
      range: { from: "2027-01", months: 3 },
      settings: { unitSystem: "metric" },
      plan: { months: ["2027-01"], rows: [row("castings", 2), row("leachate", 0)] },
    } as unknown as BalanceBody;
    const [header, line] = balanceCsv(body).split(/\r?\n/);
    expect(header!.split(",")[0]).toBe("Month");
    expect(header).toContain("Castings demand (kg)");
    expect(header).toContain("Leachate demand (L)");
    const cells = line!.split(",");
    expect(cells[0]).toBe("2027-01");
    expect(cells[header!.split(",").indexOf("Castings coverage (%)")]).toBe("0");
    expect(cells[header!.split(",").indexOf("Leachate coverage (%)")]).toBe("");
  });
});
