import { EngineInputError } from "@/lib/engine/core/errors";
import { expandRecurrence, isBoundedRule } from "@/lib/engine/demand/recurrence";

// Examples from RFC 5545 §3.8.5.3 ("Recurrence Rule", Examples). The RFC writes them
// with DTSTART;TZID=America/New_York at 09:00; as floating all-day dates the anchor is
// the calendar day of DTSTART and every expected date below is the RFC's listed day,
// typed out by hand from the RFC text.
const expand = (rule: string, anchor: string, to: string, from = anchor) =>
  expandRecurrence(rule, { from, to }, { anchor });

describe("RFC 5545 §3.8.5.3 examples as all-day dates", () => {
  it("Daily for 10 occurrences", () => {
    expect(expand("FREQ=DAILY;COUNT=10", "1997-09-02", "1997-12-31")).toEqual([
      "1997-09-02",
      "1997-09-03",
      "1997-09-04",
      "1997-09-05",
      "1997-09-06",
      "1997-09-07",
      "1997-09-08",
      "1997-09-09",
      "1997-09-10",
      "1997-09-11",
    ]);
  });

  it("Every other day – forever (bounded by the requested range)", () => {
    // RFC: September 2,4,6,…,30; October 2,4,…,24; October 26,28,30; November 1,3,5,…
    expect(isBoundedRule("FREQ=DAILY;INTERVAL=2")).toBe(false);
    expect(expand("FREQ=DAILY;INTERVAL=2", "1997-09-02", "1997-11-05")).toEqual([
      "1997-09-02",
      "1997-09-04",
      "1997-09-06",
      "1997-09-08",
      "1997-09-10",
      "1997-09-12",
      "1997-09-14",
      "1997-09-16",
      "1997-09-18",
      "1997-09-20",
      "1997-09-22",
      "1997-09-24",
      "1997-09-26",
      "1997-09-28",
      "1997-09-30",
      "1997-10-02",
      "1997-10-04",
      "1997-10-06",
      "1997-10-08",
      "1997-10-10",
      "1997-10-12",
      "1997-10-14",
      "1997-10-16",
      "1997-10-18",
      "1997-10-20",
      "1997-10-22",
      "1997-10-24",
      "1997-10-26",
      "1997-10-28",
      "1997-10-30",
      "1997-11-01",
      "1997-11-03",
      "1997-11-05",
    ]);
  });

  it("Weekly for 10 occurrences", () => {
    expect(expand("FREQ=WEEKLY;COUNT=10", "1997-09-02", "1998-12-31")).toEqual([
      "1997-09-02",
      "1997-09-09",
      "1997-09-16",
      "1997-09-23",
      "1997-09-30",
      "1997-10-07",
      "1997-10-14",
      "1997-10-21",
      "1997-10-28",
      "1997-11-04",
    ]);
  });

  it("Every other week on Monday, Wednesday, and Friday until December 24, 1997", () => {
    // UNTIL=19971224T000000Z is 1997-12-23 19:00 in New York, so as an all-day rule
    // the last allowed day is 1997-12-23: UNTIL=19971223.
    expect(
      expand(
        "FREQ=WEEKLY;INTERVAL=2;UNTIL=19971223;WKST=SU;BYDAY=MO,WE,FR",
        "1997-09-01",
        "1998-12-31",
      ),
    ).toEqual([
      "1997-09-01",
      "1997-09-03",
      "1997-09-05",
      "1997-09-15",
      "1997-09-17",
      "1997-09-19",
      "1997-09-29",
      "1997-10-01",
      "1997-10-03",
      "1997-10-13",
      "1997-10-15",
      "1997-10-17",
      "1997-10-27",
      "1997-10-29",
      "1997-10-31",
      "1997-11-10",
      "1997-11-12",
      "1997-11-14",
      "1997-11-24",
      "1997-11-26",
      "1997-11-28",
      "1997-12-08",
      "1997-12-10",
      "1997-12-12",
      "1997-12-22",
    ]);
  });

  it("an UNTIL with a time counts by its calendar day, inclusive", () => {
    // Same rule with the RFC's literal UNTIL: Wednesday 1997-12-24 is now inside.
    const dates = expand(
      "FREQ=WEEKLY;INTERVAL=2;UNTIL=19971224T000000Z;WKST=SU;BYDAY=MO,WE,FR",
      "1997-09-01",
      "1998-12-31",
    );
    expect(dates.slice(-2)).toEqual(["1997-12-22", "1997-12-24"]);
  });

  it("Monthly on the first Friday for 10 occurrences", () => {
    expect(expand("FREQ=MONTHLY;COUNT=10;BYDAY=1FR", "1997-09-05", "1999-12-31")).toEqual([
      "1997-09-05",
      "1997-10-03",
      "1997-11-07",
      "1997-12-05",
      "1998-01-02",
      "1998-02-06",
      "1998-03-06",
      "1998-04-03",
      "1998-05-01",
      "1998-06-05",
    ]);
  });

  it("Monthly on the second-to-last Monday of the month for 6 months", () => {
    expect(expand("FREQ=MONTHLY;COUNT=6;BYDAY=-2MO", "1997-09-22", "1999-12-31")).toEqual([
      "1997-09-22",
      "1997-10-20",
      "1997-11-17",
      "1997-12-22",
      "1998-01-19",
      "1998-02-16",
    ]);
  });

  it("Monthly on the first and last day of the month for 10 occurrences", () => {
    expect(expand("FREQ=MONTHLY;COUNT=10;BYMONTHDAY=1,-1", "1997-09-30", "1999-12-31")).toEqual([
      "1997-09-30",
      "1997-10-01",
      "1997-10-31",
      "1997-11-01",
      "1997-11-30",
      "1997-12-01",
      "1997-12-31",
      "1998-01-01",
      "1998-01-31",
      "1998-02-01",
    ]);
  });

  it("Every Tuesday, every other month", () => {
    expect(expand("FREQ=MONTHLY;INTERVAL=2;BYDAY=TU", "1997-09-02", "1998-03-31")).toEqual([
      "1997-09-02",
      "1997-09-09",
      "1997-09-16",
      "1997-09-23",
      "1997-09-30",
      "1997-11-04",
      "1997-11-11",
      "1997-11-18",
      "1997-11-25",
      "1998-01-06",
      "1998-01-13",
      "1998-01-20",
      "1998-01-27",
      "1998-03-03",
      "1998-03-10",
      "1998-03-17",
      "1998-03-24",
      "1998-03-31",
    ]);
  });

  it("Yearly in June and July for 10 occurrences", () => {
    expect(expand("FREQ=YEARLY;COUNT=10;BYMONTH=6,7", "1997-06-10", "2005-12-31")).toEqual([
      "1997-06-10",
      "1997-07-10",
      "1998-06-10",
      "1998-07-10",
      "1999-06-10",
      "1999-07-10",
      "2000-06-10",
      "2000-07-10",
      "2001-06-10",
      "2001-07-10",
    ]);
  });

  it("Every Friday the 13th, forever (the anchor itself is not one)", () => {
    // The RFC adds EXDATE for its DTSTART (a Tuesday); an anchor that does not match the
    // rule is simply not an occurrence here.
    expect(expand("FREQ=MONTHLY;BYDAY=FR;BYMONTHDAY=13", "1997-09-02", "2000-12-31")).toEqual([
      "1998-02-13",
      "1998-03-13",
      "1998-11-13",
      "1999-08-13",
      "2000-10-13",
    ]);
  });

  it("The third instance into the month of one of Tuesday, Wednesday, or Thursday, for the next 3 months", () => {
    expect(
      expand("FREQ=MONTHLY;COUNT=3;BYDAY=TU,WE,TH;BYSETPOS=3", "1997-09-04", "1998-12-31"),
    ).toEqual(["1997-09-04", "1997-10-07", "1997-11-06"]);
  });

  it("The second-to-last weekday of the month", () => {
    expect(
      expand("FREQ=MONTHLY;BYDAY=MO,TU,WE,TH,FR;BYSETPOS=-2", "1997-09-29", "1998-03-31"),
    ).toEqual([
      "1997-09-29",
      "1997-10-30",
      "1997-11-27",
      "1997-12-30",
      "1998-01-29",
      "1998-02-26",
      "1998-03-30",
    ]);
  });

  it("accepts the RFC's own two-line form and drops the TZID", () => {
    const rule = "DTSTART;TZID=America/New_York:19970902T090000\nRRULE:FREQ=DAILY;COUNT=3";
    expect(expand(rule, "2027-01-01", "1997-12-31", "1997-01-01")).toEqual([
      "1997-09-02",
      "1997-09-03",
      "1997-09-04",
    ]);
  });
});

describe("floating dates do not drift with DST", () => {
  // US DST 2027 starts 2027-03-14 and ends 2027-11-07 (second Sunday of March, first
  // Sunday of November, 15 U.S.C. 260a). A daily rule over both must give every day once.
  it("daily across both US DST changes: no missing or doubled day", () => {
    const dates = expand("FREQ=DAILY", "2027-03-01", "2027-11-30");
    expect(dates).toHaveLength(275); // Mar 31 + Apr 30 + May 31 + Jun 30 + Jul 31 + Aug 31 + Sep 30 + Oct 31 + Nov 30
    expect(new Set(dates).size).toBe(dates.length);
    for (let i = 1; i < dates.length; i++) {
      const gap =
        (Date.parse(dates[i] as string) - Date.parse(dates[i - 1] as string)) / 86_400_000;
      expect(gap).toBe(1);
    }
    expect(dates).toContain("2027-03-14");
    expect(dates).toContain("2027-11-07");
  });

  it("a New York DTSTART at 23:30 still lands on its own calendar day", () => {
    const ny = "DTSTART;TZID=America/New_York:20270313T233000\nRRULE:FREQ=WEEKLY;COUNT=3";
    expect(expand(ny, "2027-01-01", "2027-12-31", "2027-01-01")).toEqual([
      "2027-03-13",
      "2027-03-20",
      "2027-03-27",
    ]);
  });

  it("monthly on the 1st stays on the 1st across DST", () => {
    expect(expand("FREQ=MONTHLY", "2027-01-01", "2027-12-31")).toEqual(
      Array.from({ length: 12 }, (_, i) => `2027-${String(i + 1).padStart(2, "0")}-01`),
    );
  });
});

describe("bad rules", () => {
  it.each([
    "FREQ=BOGUS",
    "hello",
    "",
    "FREQ=DAILY;COUNT=abc",
    "FREQ=DAILY;BYDAY=XX",
    "FREQ=HOURLY;COUNT=3",
    "INTERVAL=2",
  ])("%j is an EngineInputError naming the field", (rule) => {
    let err: unknown;
    try {
      expandRecurrence(
        rule,
        { from: "2027-01-01", to: "2027-12-31" },
        { anchor: "2027-01-01", field: "plantings[2].rule.recurrence" },
      );
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(EngineInputError);
    expect((err as EngineInputError).field).toBe("plantings[2].rule.recurrence");
  });

  it("caches: the same rule and range give the same frozen result", () => {
    const a = expand("FREQ=WEEKLY", "2027-04-01", "2027-10-31");
    const b = expand("FREQ=WEEKLY", "2027-04-01", "2027-10-31");
    expect(b).toBe(a);
    expect(Object.isFrozen(a)).toBe(true);
  });
});
