import { describe, expect, it } from "vitest";
import { createBinSchema, updateBinSchema } from "@/lib/validation/bin";
import { binEventSchema, warningsForFoods } from "@/lib/validation/bin-event";
import { insideBox, todayIn, wormCount } from "@/lib/validation/bin-values";
import { adjustLotSchema, createLotSchema } from "@/lib/validation/lot";
import { lotStatus } from "@/lib/validation/lot-status";

const INCH = 0.0254; // m, exact (NIST Handbook 44 App. C)

const bin = {
  name: "Porch stack",
  kind: "stacked-tray",
  trayCount: 4,
  tray: { mode: "inside", lengthM: 0.5, widthM: 0.4, depthM: 0.14 },
  startedOn: "2026-01-10",
  startingWorms: { count: 2000 },
};

const fieldsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
  (r.error?.issues ?? []).map((i) => i.path.join("."));

describe("bin schema", () => {
  it("accepts a bin with blank engine parameters and fills the flags' defaults", () => {
    const parsed = createBinSchema.parse(bin);
    expect(parsed.manureFeedstock).toBe(false);
    expect(parsed.indoors).toBe(true);
    expect(parsed.rotationDays).toBeUndefined();
  });

  it("names the field that is wrong", () => {
    expect(fieldsOf(createBinSchema.safeParse({ ...bin, trayCount: 2.5 }))).toEqual(["trayCount"]);
    expect(fieldsOf(createBinSchema.safeParse({ ...bin, startedOn: "2026-02-30" }))).toEqual([
      "startedOn",
    ]);
    expect(fieldsOf(createBinSchema.safeParse({ ...bin, processingDays: 0 }))).toEqual([
      "processingDays",
    ]);
    expect(fieldsOf(createBinSchema.safeParse({ ...bin, dormantMonths: [13] }))).toEqual([
      "dormantMonths.0",
    ]);
  });

  it("an edit needs at least one field; null puts a parameter back to its default", () => {
    expect(updateBinSchema.safeParse({}).success).toBe(false);
    expect(updateBinSchema.parse({ fillFraction: null }).fillFraction).toBeNull();
  });

  it("turns a 24 × 20 in outer size from 2×6 into 21 × 17 × 5½ in inside (PS 20 dry sizes)", () => {
    const box = insideBox({
      mode: "outer",
      outerLengthM: 24 * INCH,
      outerWidthM: 20 * INCH,
      board: "2x6",
    });
    expect(box.lengthM / INCH).toBeCloseTo(21, 9);
    expect(box.widthM / INCH).toBeCloseTo(17, 9);
    expect(box.depthM / INCH).toBeCloseTo(5.5, 9);
  });

  it("counts worms from a weight at about 1,000 per lb (from memory, PRODUCT.md)", () => {
    expect(wormCount({ count: 1500 })).toBe(1500);
    // 1 lb = 0.45359237 kg exactly (NIST Handbook 44 App. C).
    expect(wormCount({ kg: 0.45359237 })).toBe(1000);
  });
});

describe("bin event schema", () => {
  it("a harvest needs a weight or a volume, never a negative one", () => {
    expect(
      fieldsOf(binEventSchema.safeParse({ kind: "tray-harvested", on: "2026-04-01" })),
    ).toEqual(["castingsKg"]);
    expect(
      fieldsOf(
        binEventSchema.safeParse({ kind: "tray-harvested", on: "2026-04-01", castingsKg: -2 }),
      ),
    ).toEqual(["castingsKg"]);
    expect(
      binEventSchema.safeParse({ kind: "tray-harvested", on: "2026-04-01", castingsL: 20 }).success,
    ).toBe(true);
  });

  it("an observation needs something observed", () => {
    expect(binEventSchema.safeParse({ kind: "observation", on: "2026-04-01" }).success).toBe(false);
    expect(
      binEventSchema.safeParse({ kind: "observation", on: "2026-04-01", temperatureC: 18 }).success,
    ).toBe(true);
  });

  it("a worm move names worms and a target or null (out)", () => {
    const move = { kind: "worms-moved", on: "2026-04-01", worms: { count: 500 } };
    expect(binEventSchema.safeParse({ ...move, to: null }).success).toBe(true);
    expect(
      fieldsOf(binEventSchema.safeParse({ ...move, to: { gardenId: "x", binId: "y" } })),
    ).toContain("to.gardenId");
    expect(
      fieldsOf(binEventSchema.safeParse({ ...move, worms: { count: 0 }, to: null }))[0],
    ).toMatch(/^worms/);
  });

  it("warns on citrus, spicy, meat, dairy and oily food (common practice) and not on vegetable scraps", () => {
    expect(warningsForFoods(["vegetable scraps", "coffee grounds"])).toEqual([]);
    expect(
      warningsForFoods(["citrus", "spicy food", "meat or fish", "dairy", "oily food"]),
    ).toHaveLength(5);
  });
});

describe("lot schemas and status", () => {
  it("bought castings carry no manure flag unless stated", () => {
    const lot = createLotSchema.parse({
      reason: "bought",
      material: "castings",
      producedOn: "2026-11-01",
      amountSi: 9,
    });
    expect(lot.manureFeedstock).toBe(false);
  });

  it("an adjustment takes a positive amount with a reason", () => {
    expect(fieldsOf(adjustLotSchema.safeParse({ reason: "spilled", removeSi: 0 }))).toEqual([
      "removeSi",
    ]);
    expect(fieldsOf(adjustLotSchema.safeParse({ reason: "lost", removeSi: 1 }))).toEqual([
      "reason",
    ]);
  });

  it("ages castings out after 60 days (Harit et al. 2014) and leachate after 7 (from memory)", () => {
    const limits = { shelfLifeDays: null, liquidMaxAgeDays: null };
    const castings = { material: "castings" as const, producedOn: "2026-01-01", remainingSi: 5 };
    expect(lotStatus(castings, "2026-03-02", limits)).toMatchObject({
      ageDays: 60,
      status: "use-soon",
    });
    expect(lotStatus(castings, "2026-03-03", limits)).toMatchObject({
      ageDays: 61,
      status: "aged-out",
    });
    expect(lotStatus({ ...castings, material: "leachate" }, "2026-01-09", limits).status).toBe(
      "aged-out",
    );
    expect(lotStatus({ ...castings, remainingSi: 0 }, "2026-01-02", limits).status).toBe("used-up");
  });

  it("today is the garden's calendar day, not the server's", () => {
    // 2026-12-02 03:00 UTC is still 1 December in Chicago (UTC−6 in winter).
    const now = new Date("2026-12-02T03:00:00Z");
    expect(todayIn("America/Chicago", now)).toBe("2026-12-01");
    expect(todayIn("Europe/Berlin", now)).toBe("2026-12-02");
  });
});

describe("bin edit (regression)", () => {
  it("leaves out the flags an edit does not name, instead of resetting them to create's defaults", () => {
    const parsed = updateBinSchema.parse({ name: "Renamed" });
    expect(parsed).toEqual({ name: "Renamed" });
  });
});
