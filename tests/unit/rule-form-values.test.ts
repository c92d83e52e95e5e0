import { describe, expect, it } from "vitest";
import type { FeedingRuleInput } from "@/lib/engine";
import {
  rateCutFromSearch,
  recurrenceForm,
  ruleFormValues,
} from "@/lib/plantings/rule-form-values";

// NIST Handbook 44 App. C: 1 gal = 231 in³ = 3.785411784 L; 1 cup = 1/16 gal
// = 0.2365882365 L; 1 in = 25.4 mm.
const CUP_L = 3.785411784 / 16;

const rule = (over: Partial<FeedingRuleInput>): FeedingRuleInput => ({
  material: "castings",
  method: "top-dress",
  basis: "per-plant",
  measure: "volume",
  amount: CUP_L,
  recurrence: "FREQ=MONTHLY",
  dilutionWaterParts: null,
  teaCastingsPerWater: null,
  ...over,
});

describe("ruleFormValues", () => {
  it("shows 1 cup per plant (heavy feeder default, PRODUCT.md) as 1 cup, or 236.59 mL in metric", () => {
    expect(ruleFormValues(rule({}), "us").amount).toEqual({ value: 1, unit: "cup" });
    expect(ruleFormValues(rule({}), "metric").amount).toEqual({ value: 236.59, unit: "mL" });
  });

  it("takes the Balance's rate cut off the amount: 25 % of 1 cup leaves 0.75 cup (177.44 mL)", () => {
    expect(ruleFormValues(rule({}), "us", 25).amount).toEqual({ value: 0.75, unit: "cup" });
    expect(ruleFormValues(rule({}), "metric", 25).amount).toEqual({ value: 177.44, unit: "mL" });
  });

  it("reads a container rule back per gallon and a bed layer back as a depth", () => {
    // 1 cup per gallon of pot = 1/16 L per L.
    expect(
      ruleFormValues(rule({ basis: "per-container-volume", amount: 1 / 16 }), "us").amount,
    ).toEqual({ value: 1, unit: "cup", per: "gal" });
    // A ½ in layer: 12.7 mm over 1 m² is 12.7 L.
    expect(ruleFormValues(rule({ basis: "per-area", amount: 12.7 }), "us").amount).toEqual({
      value: 0.5,
      unit: "in",
    });
  });

  it("keeps the recurrence and leaves out unset recipe fields (the rule schema is strict)", () => {
    const v = ruleFormValues(rule({ recurrence: "FREQ=WEEKLY;INTERVAL=2" }), "us");
    expect(v.recurrence).toBe("FREQ=WEEKLY;INTERVAL=2");
    expect("dilutionWaterParts" in v).toBe(false);
  });
});

describe("recurrenceForm", () => {
  it("reads what the simple form builds, and gives null for what it cannot show", () => {
    expect(recurrenceForm("FREQ=WEEKLY;INTERVAL=2;BYDAY=SA")).toEqual({
      every: 2,
      unit: "weeks",
      weekday: "SA",
      monthDay: null,
      until: null,
      months: null,
    });
    expect(recurrenceForm("FREQ=MONTHLY;BYMONTHDAY=15;BYMONTH=5,6;UNTIL=20270930")).toMatchObject({
      monthDay: 15,
      months: [5, 6],
      until: "2027-09-30",
    });
    expect(recurrenceForm("FREQ=MONTHLY;BYDAY=1SA")).toBeNull();
    expect(recurrenceForm("FREQ=DAILY")).toBeNull();
  });
});

describe("rateCutFromSearch (RULES.md: ?planting={id}&cut={percent})", () => {
  const id = "3f0c8d7e-2b1a-4c5d-9e8f-0a1b2c3d4e5f";
  it("opens the named planting with its cut", () => {
    expect(rateCutFromSearch({ planting: id, cut: "25" }, [id])).toEqual({
      plantingId: id,
      cutPercent: 25,
    });
  });
  it.each([
    [{ planting: "someone-else", cut: "25" }],
    [{ planting: id, cut: "abc" }],
    [{ planting: id, cut: "100" }],
    [{ planting: id, cut: "0" }],
    [{ planting: id, cut: "-5" }],
    [{ planting: [id, id], cut: "25" }],
    [{ planting: id }],
  ])("ignores bad or unknown params %j", (search) => {
    expect(rateCutFromSearch(search, [id])).toBeNull();
  });
});
