import { describe, expect, it } from "vitest";
import { createGardenSchema, updateGardenSchema } from "@/lib/validation/garden";

// The zones a garden is stored with are exactly the runtime's own list (ECMA-402
// Intl.supportedValuesOf("timeZone")) plus "UTC"; an alias the runtime resolves is
// stored as the listed zone it stands for. Zone names and aliases are from the IANA
// tz database (zone1970.tab and the "backward" file; from memory).

const base = {
  name: "Hollis Street Garden",
  unitSystem: "us" as const,
  lastSpringFrost: "2026-04-15",
  firstFallFrost: "2026-10-15",
};
const stored = (timeZone: string) => {
  const result = createGardenSchema.safeParse({ ...base, timeZone });
  return result.success ? result.data.timeZone : null;
};
const listed = [...Intl.supportedValuesOf("timeZone"), "UTC"];

describe("garden time zone", () => {
  it("accepts every zone the runtime lists, and UTC, as typed", () => {
    expect(listed.length).toBeGreaterThan(300); // tzdata has several hundred zones
    expect(listed.filter((z) => stored(z) !== z)).toEqual([]);
  });

  it("stores an alias as the listed zone it stands for", () => {
    // IANA "backward": US/Eastern → America/New_York; Etc/UTC and GMT → UTC.
    expect(stored("US/Eastern")).toBe("America/New_York");
    expect(stored("Etc/UTC")).toBe("UTC");
    // Asia/Kathmandu is the current IANA name; some ICU builds list it as Asia/Katmandu.
    expect(listed).toContain(stored("Asia/Kathmandu"));
  });

  it("refuses offsets and names the runtime does not know, naming the field", () => {
    for (const zone of ["Mars/Olympus_Mons", "+05:45", "Etc/GMT+5", ""]) {
      const result = updateGardenSchema.safeParse({ timeZone: zone });
      expect(result.success, zone).toBe(false);
      expect(result.error?.issues[0]?.path).toEqual(["timeZone"]);
    }
  });
});
