import { describe, expect, it } from "vitest";
import { computePlan } from "@/lib/engine";
import { garden, planting } from "./garden-fixtures";

// The plan lists feedings by date, then by id in plain string order (JavaScript's `<` on
// strings: UTF-16 code units, RFC-free and outside this project). Same-day ids are ordered
// through a rank of their "planting:material:" prefix; these cases check that shortcut against
// the plain order worked out by hand.
const firstDay = (ids: string[]) =>
  computePlan(
    garden({
      asOf: "2026-04-30",
      plantings: ids.map((id) => planting({ id, startDate: "2026-05-01", endDate: "2026-05-31" })),
    }),
    { from: "2026-05", months: 1, suggestions: false },
  )
    .feedings.filter((f) => f.date === "2026-05-01")
    .map((f) => f.plantingId);

describe("order of one day's feedings", () => {
  it("p-10 before p-1 before p-2: ':' (0x3A) sorts after '0' (0x30), '1' before '2'", () => {
    expect(firstDay(["p-2", "p-1", "p-10"])).toEqual(["p-10", "p-1", "p-2"]);
  });

  it("a planting id that starts like another's feeding id still sorts as its id does", () => {
    // "x:castings:0:castings:2026-05-01" < "x:castings:2026-05-01": at character 12, '0' < '2',
    // although the prefix "x:castings:" sorts before "x:castings:0:castings:".
    expect(firstDay(["x", "x:castings:0"])).toEqual(["x:castings:0", "x"]);
  });
});
