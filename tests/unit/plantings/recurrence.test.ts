import { describe, expect, it } from "vitest";
import {
  buildRrule,
  describeRrule,
  nextDates,
  normalizeRrule,
  rruleProblem,
  whyNoDates,
} from "@/lib/plantings/recurrence";

describe("normalizeRrule", () => {
  // RFC 5545 §2: "all names of properties, property parameters, enumerated
  // property values and property parameter values are case-insensitive".
  it("accepts lower-case names and weekday values", () => {
    expect(normalizeRrule(" rrule:freq=weekly;byday=mo ")).toBe("FREQ=WEEKLY;BYDAY=MO");
    expect(rruleProblem("freq=weekly;byday=mo")).toBeNull();
    // 2026-05-04 is a Monday (calendar); every Monday from a Friday start.
    expect(nextDates("freq=weekly;byday=mo", "2026-05-01", 2)).toEqual([
      "2026-05-04",
      "2026-05-11",
    ]);
  });
});

describe("buildRrule", () => {
  it("writes the form as an RRULE", () => {
    expect(buildRrule({ every: 2, unit: "weeks", weekday: "SA" })).toBe(
      "FREQ=WEEKLY;INTERVAL=2;BYDAY=SA",
    );
    expect(buildRrule({ every: 1, unit: "months", monthDay: 15, until: "2026-09-30" })).toBe(
      "FREQ=MONTHLY;BYMONTHDAY=15;UNTIL=20260930",
    );
  });
});

describe("describeRrule", () => {
  it("reads rules back in plain words", () => {
    expect(describeRrule("FREQ=MONTHLY")).toBe("every month");
    expect(describeRrule("FREQ=MONTHLY;INTERVAL=2")).toBe("every 2 months");
    expect(describeRrule("FREQ=WEEKLY;INTERVAL=2;BYDAY=MO")).toBe("every 2 weeks on Monday");
    expect(describeRrule("FREQ=MONTHLY;BYMONTHDAY=1,15")).toBe("every month on the 1st and 15th");
    expect(describeRrule("FREQ=DAILY;COUNT=1")).toBe("once, on the planting's first day");
    expect(describeRrule("FREQ=MONTHLY;BYMONTHDAY=1;UNTIL=20260930")).toBe(
      "every month on the 1st, until 30 Sep 2026",
    );
  });
});

describe("nextDates", () => {
  // RFC 5545 §3.8.5.3: "Monthly on the first and last day of the month for 10 occurrences:
  // DTSTART;TZID=America/New_York:19970930T090000 RRULE:FREQ=MONTHLY;COUNT=10;BYMONTHDAY=1,-1"
  // → Sep 30; Oct 1, 31; Nov 1, 30 … (floating dates here).
  it("matches the RFC 5545 example for BYMONTHDAY=1,-1", () => {
    expect(nextDates("FREQ=MONTHLY;COUNT=10;BYMONTHDAY=1,-1", "1997-09-30")).toEqual([
      "1997-09-30",
      "1997-10-01",
      "1997-10-31",
      "1997-11-01",
      "1997-11-30",
    ]);
  });
  it("skips months without the day: BYMONTHDAY=31 from 1 May 2026 gives May, July, August", () => {
    expect(nextDates("FREQ=MONTHLY;BYMONTHDAY=31", "2026-05-01", 3)).toEqual([
      "2026-05-31",
      "2026-07-31",
      "2026-08-31",
    ]);
  });
});

describe("whyNoDates", () => {
  it("says June never has a 31st", () => {
    const why = whyNoDates("FREQ=YEARLY;BYMONTH=6;BYMONTHDAY=31", "2026-05-01");
    expect(why).toMatch(/June never has a 31st day/);
  });
  it("names an UNTIL before the first day", () => {
    expect(whyNoDates("FREQ=WEEKLY;UNTIL=20260101", "2026-05-01")).toMatch(
      /UNTIL 1 Jan 2026 is before/,
    );
  });
  it("is null when the rule gives dates", () => {
    expect(whyNoDates("FREQ=MONTHLY", "2026-05-01")).toBeNull();
  });
});

describe("describeRule", () => {
  it("reads the heavy-feeder default as 1 cup castings per plant monthly (PRODUCT.md, common practice)", async () => {
    const { describeRule } = await import("@/lib/plantings/rule-words");
    const { defaultRuleInput } = await import("@/lib/plantings/rules");
    expect(describeRule(defaultRuleInput("heavy"), "us")).toBe(
      "1 cup castings per plant, top-dressed, every month",
    );
    expect(describeRule(defaultRuleInput("light"), "us")).toBe(
      "½ cup castings per plant, top-dressed, every 2 months",
    );
  });
  it("reads tea 100 mL per plant every two weeks; a ¼ in top-dressing as a depth", async () => {
    const { describeRule } = await import("@/lib/plantings/rule-words");
    const base = { dilutionWaterParts: null, teaCastingsPerWater: null };
    expect(
      describeRule(
        {
          ...base,
          material: "tea",
          method: "drench",
          basis: "per-plant",
          measure: "volume",
          amount: 0.1,
          recurrence: "FREQ=WEEKLY;INTERVAL=2",
        },
        "metric",
      ),
    ).toBe("100 mL worm tea per plant, as a soil drench, every 2 weeks");
    // ¼ in = 6.35 mm (NIST HB 44: 1 in = 25.4 mm) → 6.35 L per m².
    expect(
      describeRule(
        {
          ...base,
          material: "castings",
          method: "top-dress",
          basis: "per-area",
          measure: "volume",
          amount: 6.35,
          recurrence: "FREQ=DAILY;COUNT=1",
        },
        "us",
      ),
    ).toBe("castings ¼ in deep, top-dressed, once, on the planting's first day");
  });
});
