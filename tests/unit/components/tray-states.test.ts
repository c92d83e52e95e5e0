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
      tasks: [],
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
      tasks: [],
      today: "2026-04-15",
    });
    expect(trays.map((t) => t.state)).toEqual(["filling", "empty", "empty"]);
  });
});
