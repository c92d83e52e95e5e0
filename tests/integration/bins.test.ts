import "@/tests/support/integration/env";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as binEvents from "@/app/api/gardens/[gardenId]/bins/[binId]/events/route";
import * as bin from "@/app/api/gardens/[gardenId]/bins/[binId]/route";
import * as bins from "@/app/api/gardens/[gardenId]/bins/route";
import * as lot from "@/app/api/gardens/[gardenId]/lots/[lotId]/route";
import * as lots from "@/app/api/gardens/[gardenId]/lots/route";
import { getDb } from "@/db";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { memberships } from "@/db/schema";
import { computePlan } from "@/lib/engine";
import { binBody, seedBin, seedBoughtLot } from "@/tests/support/integration/bins";
import {
  call,
  closeHarness,
  cookieFor,
  countRows,
  createGardenAs,
  makeGardenWithRoles,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// Figures checked here come from outside the code: PS 20 dry board sizes
// (American Softwood Lumber Standard) and the product brief's worked tray
// (24 × 20 in outside from 2×6 → 21 × 17 × 5½ in ≈ 1,963.5 in³ ≈ 32.2 L);
// 1 in = 0.0254 m and 1 in³ = 16.387064 mL (NIST Handbook 44 App. C).

const INCH = 0.0254;
const TRAY_L = 1963.5 * 0.016387064; // 32.175 L, the brief's tray
const DENSITY = 0.7; // kg/L, the brief's default bulk density
const FILL = 0.9; // the brief's default fill fraction

let world: GardenWorld;
beforeAll(async () => {
  world = await makeGardenWithRoles();
});
afterAll(closeHarness);

const binUrl = (gardenId: string, binId: string, rest = "") => ({
  url: `/api/gardens/${gardenId}/bins/${binId}${rest}`,
  params: { gardenId, binId },
});

async function logEvent(
  who: "helper" | "grower" | "owner",
  binId: string,
  body: unknown,
  rest = "",
) {
  return call(binEvents.POST, {
    ...binUrl(world.gardenId, binId, `/events${rest}`),
    cookie: await cookieFor(world[who]),
    body,
  });
}

describe("bins", () => {
  it("takes the outer size and a 2×6 and stores the PS 20 inside size", async () => {
    const res = await call(bins.POST, {
      url: `/api/gardens/${world.gardenId}/bins`,
      params: { gardenId: world.gardenId },
      cookie: await cookieFor(world.grower),
      body: binBody(),
    });
    expect(res.status).toBe(201);
    expect(res.json.bin.trayLengthM).toBeCloseTo(21 * INCH, 6);
    expect(res.json.bin.trayWidthM).toBeCloseTo(17 * INCH, 6);
    expect(res.json.bin.trayDepthM).toBeCloseTo(5.5 * INCH, 6);
    // Blank engine parameters stay null: the engine's default.
    expect(res.json.bin.processingDays).toBeNull();
  });

  it("answers bad input with a 400 naming the field", async () => {
    const cookie = await cookieFor(world.grower);
    const post = (body: unknown) =>
      call(bins.POST, {
        url: `/api/gardens/${world.gardenId}/bins`,
        params: { gardenId: world.gardenId },
        cookie,
        body,
      });
    const cases: [Record<string, unknown>, string][] = [
      [{ trayCount: 0 }, "trayCount"],
      [
        { tray: { mode: "outer", outerLengthM: 0.6, outerWidthM: 0.5, board: "2x7" } },
        "tray.board",
      ],
      // Outer 2 in wide from 2× boards (1½ in thick each side) leaves no inside.
      [{ tray: { mode: "outer", outerLengthM: 0.6, outerWidthM: 2 * INCH, board: "2x6" } }, "tray"],
      [{ startedOn: "2026-02-30" }, "startedOn"],
      [{ startingWorms: { count: -5 } }, "startingWorms"],
      [{ fillFraction: 3 }, "fillFraction"],
      [{ dormantMonths: [1, 1] }, "dormantMonths"],
    ];
    for (const [override, field] of cases) {
      const res = await post(binBody(override));
      expect(res.status, JSON.stringify(override)).toBe(400);
      expect(Object.keys(res.json.error.fields).join(" "), JSON.stringify(override)).toContain(
        field,
      );
    }
  });

  it("retires a bin without deleting it", async () => {
    const made = await seedBin(world.gardenId);
    const res = await call(bin.DELETE, {
      ...binUrl(world.gardenId, made.id),
      method: "DELETE",
      cookie: await cookieFor(world.grower),
    });
    expect(res.status).toBe(200);
    expect(res.json.bin.retiredOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });
});

describe("the bin log", () => {
  it("refuses an entry before the bin started or in the future", async () => {
    const made = await seedBin(world.gardenId, { startedOn: "2026-03-01" });
    const early = await logEvent("helper", made.id, { kind: "tray-added", on: "2026-02-28" });
    expect(early.status).toBe(400);
    expect(early.json.error.fields.on).toMatch(/before the bin started/);
    const future = await logEvent("helper", made.id, { kind: "tray-added", on: "2999-01-01" });
    expect(future.status).toBe(400);
    expect(future.json.error.fields.on).toMatch(/future/);
  });

  it("warns on citrus and meat and still logs the feeding", async () => {
    const made = await seedBin(world.gardenId);
    const res = await logEvent("helper", made.id, {
      kind: "food-added",
      on: "2026-05-02",
      foodKg: 0.9,
      foods: ["vegetable scraps", "citrus", "meat or fish"],
    });
    expect(res.status).toBe(201);
    expect(res.json.warnings).toHaveLength(2);
    const log = await call(binEvents.GET, {
      ...binUrl(world.gardenId, made.id, "/events"),
      cookie: await cookieFor(world.viewer),
    });
    expect(log.json.entries[0].kind).toBe("food-added");
    expect(log.json.entries[0].loggedBy).toBe(world.helper.name);
  });

  it("a harvest makes a castings lot in the same write and shows in stock", async () => {
    const made = await seedBin(world.gardenId);
    const before = await countRows("stock_lots");
    const res = await logEvent("helper", made.id, {
      kind: "tray-harvested",
      on: "2026-04-20",
      castingsKg: 18,
    });
    expect(res.status).toBe(201);
    expect(await countRows("stock_lots")).toBe(before + 1);
    const stock = await call(lots.GET, {
      url: `/api/gardens/${world.gardenId}/lots`,
      params: { gardenId: world.gardenId },
      cookie: await cookieFor(world.viewer),
    });
    const made18 = stock.json.lots.find((l: { id: string }) => l.id === res.json.lotId);
    expect(made18).toMatchObject({ material: "castings", initialSi: 18, origin: "bin-log" });
  });

  it("refuses a harvest larger than a full tray, naming the maximum, unless confirmed", async () => {
    const made = await seedBin(world.gardenId);
    const maxKg = TRAY_L * DENSITY; // ≈ 22.5 kg
    const before = await countRows("bin_events");
    const res = await logEvent("helper", made.id, {
      kind: "tray-harvested",
      on: "2026-04-20",
      castingsKg: 40,
    });
    expect(res.status).toBe(400);
    // A US garden hears it in pounds: 1 lb = 0.45359237 kg (NIST HB 44, App. C), whole pounds from 10 up.
    expect(res.json.error.fields.castingsKg).toContain(`max ${Math.round(maxKg / 0.45359237)} lb`);
    expect(res.json.error.fields.castingsKg).not.toMatch(/\bkg\b|\bL\b/);
    expect(await countRows("bin_events")).toBe(before);
    const byVolume = await logEvent("helper", made.id, {
      kind: "tray-harvested",
      on: "2026-04-20",
      castingsL: 40,
    });
    expect(byVolume.status).toBe(400);
    expect(byVolume.json.error.fields.castingsL).toBeDefined();
    const confirmed = await logEvent(
      "helper",
      made.id,
      { kind: "tray-harvested", on: "2026-04-20", castingsKg: 40 },
      "?confirm",
    );
    expect(confirmed.status).toBe(201);
  });

  it("a logged harvest calibrates the bin's forecast", async () => {
    const garden = await createGardenAs(await cookieFor(world.owner), { name: "Calibration plot" });
    const made = await seedBin(garden.id);
    const asOf = "2026-11-30";
    const plan0 = computePlan(await loadGardenInputs({ gardenId: garden.id, asOf }));
    expect(plan0.bins[0]!.calibration).toEqual({ factor: 1, harvestsUsed: 0 });
    const res = await call(binEvents.POST, {
      ...binUrl(garden.id, made.id, "/events"),
      cookie: await cookieFor(world.owner),
      body: { kind: "tray-harvested", on: "2026-04-20", castingsKg: 18 },
    });
    expect(res.status).toBe(201);
    const plan1 = computePlan(await loadGardenInputs({ gardenId: garden.id, asOf }));
    const predicted = TRAY_L * FILL * DENSITY; // ≈ 20.27 kg, the brief's formula
    expect(plan1.bins[0]!.calibration.harvestsUsed).toBe(1);
    expect(plan1.bins[0]!.calibration.factor).toBeCloseTo(18 / predicted, 3);
  });

  it("a drain makes a leachate lot", async () => {
    const made = await seedBin(world.gardenId);
    const res = await logEvent("helper", made.id, {
      kind: "liquid-drained",
      on: "2026-06-01",
      litres: 1.2,
    });
    expect(res.status).toBe(201);
    expect(res.json.lotId).toBeTruthy();
  });
});

describe("worm moves", () => {
  it("never moves more worms than the bin has by its log", async () => {
    const from = await seedBin(world.gardenId, { startingWormCount: 1000 });
    const to = await seedBin(world.gardenId, { name: "New stack", startedOn: "2026-02-01" });
    const target = { gardenId: world.gardenId, binId: to.id };
    const over = await logEvent("helper", from.id, {
      kind: "worms-moved",
      on: "2026-05-01",
      worms: { count: 1001 },
      to: target,
    });
    expect(over.status).toBe(409);
    expect(over.json.error.fields.worms).toContain("1000");
    const ok = await logEvent("helper", from.id, {
      kind: "worms-moved",
      on: "2026-05-01",
      worms: { count: 600 },
      to: target,
    });
    expect(ok.status).toBe(201);
    // 1000 − 600 = 400 left on the log: 401 is refused, and out of the system counts too.
    const second = await logEvent("helper", from.id, {
      kind: "worms-moved",
      on: "2026-05-02",
      worms: { count: 401 },
      to: null,
    });
    expect(second.status).toBe(409);
    // A head count lifts the limit.
    await logEvent("helper", from.id, { kind: "observation", on: "2026-06-01", wormCount: 3000 });
    const after = await logEvent("helper", from.id, {
      kind: "worms-moved",
      on: "2026-06-02",
      worms: { count: 2500 },
      to: null,
    });
    expect(after.status).toBe(201);
  });

  it("moves 500 worms to a bin in another garden the grower belongs to, and checks the role there", async () => {
    const from = await seedBin(world.gardenId, { startingWormCount: 2000 });
    const other = await createGardenAs(await cookieFor(world.owner), { name: "Linden Row Plots" });
    const db = await getDb();
    await db.insert(memberships).values([
      { gardenId: other.id, userId: world.grower.id, role: "grower" },
      { gardenId: other.id, userId: world.helper.id, role: "viewer" },
    ]);
    const otherBin = await seedBin(other.id, { name: "Linden stack", startingWormCount: 0 + 1 });
    const body = {
      kind: "worms-moved",
      on: "2026-05-01",
      worms: { count: 500 },
      to: { gardenId: other.id, binId: otherBin.id },
    };
    const moves0 = await countRows("worm_moves");
    // The helper is only a viewer there.
    const refused = await logEvent("helper", from.id, body);
    expect(refused.status).toBe(403);
    const res = await logEvent("grower", from.id, body);
    expect(res.status).toBe(201);
    expect(res.json.moveIds).toHaveLength(2);
    expect(await countRows("worm_moves")).toBe(moves0 + 2);
    const inputs = await loadGardenInputs({ gardenId: other.id, asOf: "2026-11-30" });
    expect(inputs.logs.wormMoves).toContainEqual(
      expect.objectContaining({ fromBinId: null, toBinId: otherBin.id, worms: 500 }),
    );
    // A garden the person does not belong to is a 400 on the field, revealing nothing.
    const outsiderBin = await seedBin(world.outsiderGardenId);
    const stranger = await logEvent("grower", from.id, {
      ...body,
      to: { gardenId: world.outsiderGardenId, binId: outsiderBin.id },
    });
    expect(stranger.status).toBe(400);
    expect(stranger.json.error.fields["to.gardenId"]).toBeDefined();
  });
});

describe("stock", () => {
  it("never goes below zero", async () => {
    const { lotId } = await seedBoughtLot(world.gardenId, 5);
    const cookie = await cookieFor(world.grower);
    const at = {
      url: `/api/gardens/${world.gardenId}/lots/${lotId}`,
      params: { gardenId: world.gardenId, lotId },
    };
    const over = await call(lot.PATCH, {
      ...at,
      method: "PATCH",
      cookie,
      body: { reason: "spilled", removeSi: 5.5 },
    });
    expect(over.status).toBe(409);
    expect(over.json.error.fields.removeSi).toBeDefined();
    const negative = await call(lot.PATCH, {
      ...at,
      method: "PATCH",
      cookie,
      body: { reason: "spilled", removeSi: -1 },
    });
    expect(negative.status).toBe(400);
    const ok = await call(lot.PATCH, {
      ...at,
      method: "PATCH",
      cookie,
      body: { reason: "given-away", removeSi: 5 },
    });
    expect(ok.status).toBe(200);
    expect(ok.json.lot.remainingSi).toBe(0);
    const again = await call(lot.PATCH, {
      ...at,
      method: "PATCH",
      cookie,
      body: { reason: "spilled", removeSi: 0.1 },
    });
    expect(again.status).toBe(409);
  });

  it("takes a spill out of a harvested lot, and the plan's stock sees it", async () => {
    const made = await seedBin(world.gardenId);
    const harvest = await logEvent("helper", made.id, {
      kind: "tray-harvested",
      on: "2026-11-25",
      castingsKg: 10,
    });
    const lotId = harvest.json.lotId as string;
    const res = await call(lot.PATCH, {
      url: `/api/gardens/${world.gardenId}/lots/${lotId}`,
      params: { gardenId: world.gardenId, lotId },
      method: "PATCH",
      cookie: await cookieFor(world.grower),
      body: { reason: "spilled", removeSi: 4 },
    });
    expect(res.status).toBe(200);
    expect(res.json.lot.remainingSi).toBeCloseTo(6, 9);
    const helperTry = await call(lot.PATCH, {
      url: `/api/gardens/${world.gardenId}/lots/${lotId}`,
      params: { gardenId: world.gardenId, lotId },
      method: "PATCH",
      cookie: await cookieFor(world.helper),
      body: { reason: "spilled", removeSi: 1 },
    });
    expect(helperTry.status).toBe(403);
  });

  it("records a bought bag without a manure flag unless stated", async () => {
    const res = await call(lots.POST, {
      url: `/api/gardens/${world.gardenId}/lots`,
      params: { gardenId: world.gardenId },
      cookie: await cookieFor(world.grower),
      body: { reason: "bought", material: "castings", producedOn: "2026-11-01", amountSi: 9.07 },
    });
    expect(res.status).toBe(201);
    const one = await call(lot.GET, {
      url: `/api/gardens/${world.gardenId}/lots/${res.json.lotId}`,
      params: { gardenId: world.gardenId, lotId: res.json.lotId },
      cookie: await cookieFor(world.viewer),
    });
    expect(one.json.lot).toMatchObject({
      manureFeedstock: false,
      origin: "entered",
      binName: null,
    });
  });
});
