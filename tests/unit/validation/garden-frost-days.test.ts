import { describe, expect, it } from "vitest";
import { createGardenSchema, updateGardenSchema } from "@/lib/validation/garden";

// Frost dates are the usual days, "MM-DD" with no year. Calendar facts (Gregorian
// calendar): April has 30 days; 29 February exists in leap years, so it is a day
// some years have; there is no month 13.

const base = {
  name: "Hollis Street Garden",
  timeZone: "America/Chicago",
  unitSystem: "us" as const,
};
const parse = (lastSpringFrost: string, firstFallFrost = "10-15") =>
  createGardenSchema.safeParse({ ...base, lastSpringFrost, firstFallFrost });

describe("garden frost days", () => {
  it("takes a month and day with no year", () => {
    const result = parse("04-15", "10-20");
    expect(result.success).toBe(true);
    expect(result.data).toMatchObject({ lastSpringFrost: "04-15", firstFallFrost: "10-20" });
    expect(parse("02-29").success).toBe(true);
  });

  it("keeps only the month and day of a full date (older clients)", () => {
    expect(parse("2026-04-15").data?.lastSpringFrost).toBe("04-15");
    expect(parse("2026-02-30").success).toBe(false);
  });

  it("refuses days no year has, naming the field", () => {
    for (const day of ["04-31", "02-30", "13-01", "00-10", "4-15", "April 15", ""]) {
      const result = updateGardenSchema.safeParse({ lastSpringFrost: day });
      expect(result.success, day).toBe(false);
      expect(result.error?.issues[0]?.path).toEqual(["lastSpringFrost"]);
    }
  });

  it("wants the fall frost after the spring frost within the year", () => {
    const result = parse("10-20", "04-15");
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(["firstFallFrost"]);
  });
});
