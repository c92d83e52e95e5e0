import { describe, expect, it } from "vitest";
import { applyWhatIf } from "@/lib/balance/what-if";
import type { GardenInputs } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { bin, garden, planting } from "./engine/garden-fixtures";

// What-if changes go on a copy; amounts beyond reason are refused by field.
// Bounds (lib/balance/what-if.ts) are several times common practice: heavy feeders
// get ¾–1 cup of castings per plant monthly (PRODUCT.md), 1 cup = 0.2365882365 L
// (NIST HB 44 App. C) ≈ 0.17 kg at 0.7 kg/L, so 10 kg per plant is ~60 cups.
// Built from the engine tests' fixtures (tests/unit/engine/garden-fixtures.ts): one 21 × 17 × 5½ in
// stack and one indoor bed of squash, a heavy feeder at 0.17 kg per plant monthly.
const inputs: GardenInputs = garden({
  garden: { id: "g", name: "Quince Court Porch" },
  settings: {
    ...garden().settings,
    unitSystem: "us",
    timeZone: "America/Chicago",
    lastSpringFrost: { month: 4, day: 15 },
    firstFallFrost: { month: 10, day: 20 },
  },
  bins: [bin({ id: "stack", name: "Porch stack", startDate: "2027-01-01" })],
  beds: [{ id: "bed", name: "Bed", kind: "bed", indoor: true, areaM2: 3, containerVolumeL: null }],
  plantings: [
    planting({
      id: "squash",
      crop: "squash",
      plantCount: 4,
      startDate: "2027-03-01",
      endDate: "2027-09-30",
      rules: [{ ...planting({ id: "x" }).rules[0]!, amount: 0.17 }],
    }),
  ],
  asOf: "2027-02-15",
});

function fieldsOf(fn: () => unknown): Record<string, string> {
  try {
    fn();
  } catch (error) {
    if (error instanceof AppError) return error.fields ?? {};
    throw error;
  }
  throw new Error("expected a refusal");
}

describe("applyWhatIf", () => {
  it("refuses 10 kg of castings per plant, naming the field", () => {
    const fields = fieldsOf(() =>
      applyWhatIf(inputs, [{ kind: "planting-amount", plantingId: "squash", amount: 10 }]),
    );
    expect(Object.keys(fields)).toEqual(["changes.0.amount"]);
  });

  it("names every bad change at once, unknown ids included", () => {
    const fields = fieldsOf(() =>
      applyWhatIf(inputs, [
        { kind: "bin-trays", binId: "nope", trays: 5 },
        { kind: "planting-amount", plantingId: "nope", amount: 0.1 },
        { kind: "add-bin", likeBinId: "nope", startDate: "2027-01-01" },
      ]),
    );
    expect(Object.keys(fields).sort()).toEqual([
      "changes.0.binId",
      "changes.1.plantingId",
      "changes.2.likeBinId",
    ]);
  });

  it("changes a copy and leaves the garden's inputs as they were", () => {
    const before = JSON.stringify(inputs);
    const next = applyWhatIf(inputs, [
      { kind: "bin-trays", binId: "stack", trays: 6 },
      { kind: "planting-amount", plantingId: "squash", amount: 0.085 },
      { kind: "add-bin", likeBinId: "stack", startDate: "2026-12-01", startingWorms: 500 },
    ]);
    expect(JSON.stringify(inputs)).toBe(before);
    expect(next.bins[0]!.trays).toBe(6);
    expect(next.plantings[0]!.rules[0]!.amount).toBe(0.085);
    expect(next.bins).toHaveLength(2);
    expect(next.bins[1]).toMatchObject({ startDate: "2026-12-01", startingWorms: 500, trays: 6 });
  });
});
