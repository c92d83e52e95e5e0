import { describe, expect, it } from "vitest";
import { trayStack } from "@/components/bins/tray-states";

// The brief's stacked-tray cadence (PRODUCT.md): a tray added every P days
// (default 30), a tray finished after T days of processing (default 90).

describe("tray stack today", () => {
  it("fills the top tray and readies the ones that have processed T days", () => {
    const trays = trayStack({
      startedOn: "2026-01-01",
      trayCount: 4,
      processingDays: 90,
      rotationDays: 30,
      today: "2026-04-15",
    });
    // Trays went on Jan 1, Jan 31, Mar 2, Apr 1 (every 30 days); the newest is on top.
    expect(trays.map((t) => t.addedOn)).toEqual([
      "2026-04-01",
      "2026-03-02",
      "2026-01-31",
      "2026-01-01",
    ]);
    expect(trays.map((t) => t.state)).toEqual(["filling", "processing", "processing", "ready"]);
    // Jan 1 + 90 days = Apr 1.
    expect(trays[3]!.readyOn).toBe("2026-04-01");
  });

  it("shows slots not used yet in a young bin", () => {
    const trays = trayStack({
      startedOn: "2026-04-01",
      trayCount: 3,
      processingDays: 90,
      rotationDays: 30,
      today: "2026-04-15",
    });
    expect(trays.map((t) => t.state)).toEqual(["filling", "empty", "empty"]);
  });

  it("starts a new filling tray on a logged harvest, and the harvested tray leaves the bottom", () => {
    // Same stack as above on 2026-04-15: Jan 1 (ready since Apr 1), Jan 31, Mar 2, Apr 1.
    // Harvesting the Jan 1 tray on Apr 15 empties it and it goes back on top to fill.
    const trays = trayStack({
      startedOn: "2026-01-01",
      trayCount: 4,
      processingDays: 90,
      rotationDays: 30,
      logged: [{ on: "2026-04-15", kind: "harvest" }],
      today: "2026-04-15",
    });
    expect(trays.map((t) => t.addedOn)).toEqual([
      "2026-04-15",
      "2026-04-01",
      "2026-03-02",
      "2026-01-31",
    ]);
    // Jan 31 + 90 days = May 1: nothing is ready any more.
    expect(trays.map((t) => t.state)).toEqual([
      "filling",
      "processing",
      "processing",
      "processing",
    ]);
  });

  it("lets a harvest logged a few days off the cadence stand in for the scheduled tray", () => {
    // The grower harvested the Jan 1 tray early, on Mar 29; the cadence restarts from that day
    // (next tray Apr 28), so there is no new tray on Apr 1.
    const trays = trayStack({
      startedOn: "2026-01-01",
      trayCount: 4,
      processingDays: 90,
      rotationDays: 30,
      logged: [{ on: "2026-03-29", kind: "harvest" }],
      today: "2026-04-15",
    });
    // Before Mar 29 the stack held Jan 1, Jan 31, Mar 2; the harvest took Jan 1 off the bottom.
    expect(trays.map((t) => t.addedOn)).toEqual(["2026-03-29", "2026-03-02", "2026-01-31", null]);
    expect(trays.map((t) => t.state)).toEqual(["filling", "processing", "processing", "empty"]);
  });

  it("does not count a harvest a few days late as a second new tray on a full stack", () => {
    // Full 3-tray stack: the cadence's Apr 1 tray would have meant harvesting the Jan 1 tray.
    // Logged on Apr 6 instead (5 days late, within half a rotation): one new tray, not two.
    const trays = trayStack({
      startedOn: "2026-01-01",
      trayCount: 3,
      processingDays: 60,
      rotationDays: 30,
      logged: [{ on: "2026-04-06", kind: "harvest" }],
      today: "2026-04-10",
    });
    // Jan 1, Jan 31, Mar 2 fill the 3 slots; the Apr 6 harvest empties Jan 1 and puts it on top.
    expect(trays.map((t) => t.addedOn)).toEqual(["2026-04-06", "2026-03-02", "2026-01-31"]);
    // Jan 31 + 60 = Apr 1 (ready); Mar 2 + 60 = May 1 (processing).
    expect(trays.map((t) => t.state)).toEqual(["filling", "processing", "ready"]);
  });
});
