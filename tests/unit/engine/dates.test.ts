import { describe, expect, it } from "vitest";
import { fromDayNumber, monthOfDay, toDayNumber } from "@/lib/engine";

// The engine's day arithmetic (lib/engine/core/dates.ts) is its own code, not Date: checked here
// against the Unix epoch and against ECMAScript's Date in UTC (ECMA-262 §21.4.1, proleptic
// Gregorian), an implementation outside this project.
const MS_PER_DAY = 86_400_000;

describe("calendar days", () => {
  it("counts from the Unix epoch: 1970-01-01 is day 0, 2000-01-01 is 946,684,800 s ÷ 86,400 = 10,957", () => {
    expect(toDayNumber("1970-01-01")).toBe(0);
    expect(toDayNumber("2000-01-01")).toBe(10_957);
    // 2000 is a leap year (divisible by 400): 1 March is 31 + 29 days after 1 January.
    expect(toDayNumber("2000-03-01")).toBe(10_957 + 60);
  });

  it("agrees with Date in UTC on every day from 1900 to 2199: day number, date and month", () => {
    const first = Date.UTC(1900, 0, 1) / MS_PER_DAY;
    const last = Date.UTC(2199, 11, 31) / MS_PER_DAY;
    let checked = 0;
    for (let day = first; day <= last; day++) {
      const d = new Date(day * MS_PER_DAY);
      const iso = d.toISOString().slice(0, 10);
      if (toDayNumber(iso) !== day) expect(toDayNumber(iso)).toBe(day);
      if (fromDayNumber(day) !== iso) expect(fromDayNumber(day)).toBe(iso);
      if (monthOfDay(day) !== d.getUTCMonth() + 1)
        expect(monthOfDay(day)).toBe(d.getUTCMonth() + 1);
      checked++;
    }
    // 300 years: 300 × 365 days + 73 leap days (every fourth year from 1904 to 2196 is 74 of them,
    // less 2100, which is not divisible by 400; 1900 is not a leap year either, 2000 is).
    expect(checked).toBe(109_573);
  });

  it("refuses a day that is not in the calendar, naming the field", () => {
    expect(() => toDayNumber("2027-02-29", "plantings[0].startDate")).toThrow(
      /plantings\[0\]\.startDate/,
    );
    expect(() => toDayNumber("2026-13-01", "asOf")).toThrow(/asOf/);
  });
});
