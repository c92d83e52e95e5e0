import "@/tests/support/integration/env";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as beds from "@/app/api/gardens/[gardenId]/beds/route";
import * as bins from "@/app/api/gardens/[gardenId]/bins/route";
import * as lots from "@/app/api/gardens/[gardenId]/lots/route";
import { binBody } from "@/tests/support/integration/bins";
import {
  call,
  closeHarness,
  cookieFor,
  countRows,
  makeGardenWithRoles,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// Bed name and notes, bin name and a lot's note took control characters (U+0007
// BEL here: Unicode general category Cc) where garden names already refused them
// (lib/validation/text.ts). Each is a 400 naming the field, and nothing is written.

let world: GardenWorld;
let grower: string;
beforeAll(async () => {
  world = await makeGardenWithRoles();
  grower = await cookieFor(world.grower);
});
afterAll(closeHarness);

const BEL = "\u0007";
const bed = (overrides: Record<string, unknown>) => ({
  name: "Bed C",
  kind: "bed",
  length: { value: 8, unit: "ft" },
  width: { value: 4, unit: "ft" },
  ...overrides,
});
const at = (path: string) => ({
  url: `/api/gardens/${world.gardenId}/${path}`,
  params: { gardenId: world.gardenId },
  cookie: grower,
});

describe("control characters in names and notes", () => {
  it.each([
    ["name", { name: `Bed${BEL} C` }],
    ["notes", { notes: `Shady${BEL} corner` }],
  ])("a bed with U+0007 in %s is a 400 naming it", async (field, overrides) => {
    const before = await countRows("beds");
    const res = await call(beds.POST, { ...at("beds"), body: bed(overrides) });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty(field);
    expect(await countRows("beds")).toBe(before);
  });

  it("bed notes still keep their line breaks (the form's field is a textarea)", async () => {
    const res = await call(beds.POST, {
      ...at("beds"),
      body: bed({ name: "Bed D", notes: "Shady corner\nMulch in May" }),
    });
    expect(res.status).toBe(201);
    expect(res.json.bed.notes).toBe("Shady corner\nMulch in May");
  });

  it("a bin named with U+0007 is a 400 naming name", async () => {
    const before = await countRows("bins");
    const res = await call(bins.POST, { ...at("bins"), body: binBody({ name: `Porch${BEL}` }) });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("name");
    expect(await countRows("bins")).toBe(before);
  });

  it("a lot note with U+0007 is a 400 naming note", async () => {
    const before = await countRows("stock_lots");
    const res = await call(lots.POST, {
      ...at("lots"),
      body: {
        reason: "bought",
        material: "castings",
        producedOn: "2026-11-01",
        amountSi: 9.07,
        note: `Bag${BEL} from the co-op`,
      },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("note");
    expect(await countRows("stock_lots")).toBe(before);
  });
});
