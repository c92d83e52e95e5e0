import "@/tests/support/integration/env";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { insertGardenInputs } from "@/db/queries/garden-inputs-write";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { listLotStock, recordApplication, recordStockAdjustment } from "@/db/queries/lots";
import { getGardenSummary } from "@/db/queries/garden-summary";
import { applications, plantings, stockLots, users } from "@/db/schema";
import type { GardenInputs } from "@/lib/engine";
import { closeHarness, tableRows } from "@/tests/support/integration/harness";

afterAll(closeHarness);

// Exact NIST HB 44 Appendix C factors: 1 in = 0.0254 m, 1 lb = 0.45359237 kg,
// 1 US cup = 0.2365882365 L.
const IN = 0.0254;
const LB = 0.45359237;

// An invented garden with every kind of input: parameters both set and left to
// the engine (null), a tea and a leachate rule, bought stock, two harvests, a
// drain, a worm split, an observation and applications drawing on two lots.
const inputs: GardenInputs = {
  garden: { id: "g", name: "Hollis Street Garden" },
  settings: {
    unitSystem: "us",
    timeZone: "America/Chicago",
    lastSpringFrost: { month: 4, day: 15 },
    firstFallFrost: { month: 10, day: 20 },
    shelfLifeDays: 60,
    liquidMaxAgeDays: null,
    castingsPricePerKg: 1 / LB,
    teaCastingsPerWater: null,
  },
  bins: [
    {
      id: "stack",
      name: "Wooden four-tray stack",
      startDate: "2026-02-01",
      trays: 4,
      // 24 × 20 in outside from 2×6 (1½ × 5½ in, PS 20): 21 × 17 × 5½ in inside.
      tray: { insideLengthM: 21 * IN, insideWidthM: 17 * IN, insideDepthM: 5.5 * IN },
      rotationIntervalDays: 30,
      processingDays: null,
      fillFraction: null,
      bulkDensityKgPerL: 0.75,
      dormantMonths: [1],
      manureFeedstock: false,
      startingWorms: 1500,
      leachateEstimateLPerWeek: 0.5,
      intakeFractionPerDay: null,
      densityCeilingKgPerM2: null,
      retiredOn: null,
    },
    {
      id: "tote",
      name: "Two-tray plastic bin",
      startDate: "2026-06-14",
      trays: 2,
      tray: { insideLengthM: 16 * IN, insideWidthM: 12 * IN, insideDepthM: 8 * IN },
      rotationIntervalDays: null,
      processingDays: 120,
      fillFraction: 0.85,
      bulkDensityKgPerL: null,
      dormantMonths: [],
      manureFeedstock: true,
      startingWorms: 0,
      leachateEstimateLPerWeek: null,
      intakeFractionPerDay: 0.3,
      densityCeilingKgPerM2: 9.5,
      retiredOn: "2027-06-30",
    },
  ],
  beds: [
    {
      id: "north",
      name: "North raised bed",
      kind: "bed",
      indoor: false,
      areaM2: 2.4384 * 1.2192,
      containerVolumeL: null,
    },
    {
      id: "herbs",
      name: "Kitchen-window herb box",
      kind: "container",
      indoor: true,
      areaM2: null,
      containerVolumeL: 11.356235352,
    },
  ],
  plantings: [
    {
      id: "tomato",
      bedId: "north",
      crop: "tomato",
      feederClass: "heavy",
      plantCount: 6,
      startDate: "2026-05-10",
      endDate: "2026-10-10",
      harvestDate: null,
      priority: 1,
      edible: true,
      edibleTouchesSoil: false,
      rules: [],
    },
    {
      id: "kale",
      bedId: "north",
      crop: "kale",
      feederClass: "medium",
      plantCount: 4,
      startDate: "2026-04-20",
      endDate: null,
      harvestDate: "2026-09-30",
      priority: null,
      edible: true,
      edibleTouchesSoil: false,
      rules: [
        {
          material: "leachate",
          method: "drench",
          basis: "per-plant",
          measure: "volume",
          amount: 0.2365882365,
          recurrence: "FREQ=WEEKLY;BYDAY=SU",
          dilutionWaterParts: 10,
          teaCastingsPerWater: null,
        },
      ],
    },
    {
      id: "parsley",
      bedId: "herbs",
      crop: null,
      feederClass: "light",
      plantCount: 4,
      startDate: "2026-03-01",
      endDate: "2027-03-01",
      harvestDate: null,
      priority: 5,
      edible: true,
      edibleTouchesSoil: true,
      rules: [
        {
          material: "tea",
          method: "drench",
          basis: "per-container-volume",
          measure: "volume",
          amount: 0.01,
          recurrence: "FREQ=WEEKLY;BYDAY=SA",
          dilutionWaterParts: null,
          teaCastingsPerWater: 0.1,
        },
      ],
    },
  ],
  stockLots: [
    {
      id: "bought",
      binId: null,
      material: "castings",
      madeOn: "2026-04-20",
      amount: 6 * LB,
      manureFeedstock: null,
    },
  ],
  logs: {
    harvests: [
      { id: "h-june", binId: "stack", date: "2026-06-01", castingsKg: 46 * LB, predictedKg: 20.1 },
      { id: "h-july", binId: "stack", date: "2026-07-01", castingsKg: 44 * LB, predictedKg: null },
    ],
    drains: [{ id: "d-0726", binId: "stack", date: "2026-07-26", litres: 0.38 }],
    applications: [
      {
        id: "a1",
        plantingId: "tomato",
        date: "2026-07-01",
        material: "castings",
        method: "top-dress",
        amount: 1.2,
        plannedFeedingId: "tomato:castings:2026-07-01",
        draws: [
          { lotId: "bought", amount: 1 },
          { lotId: "h-june", amount: 0.2 },
        ],
      },
      {
        id: "a2",
        plantingId: "kale",
        date: "2026-07-26",
        material: "leachate",
        method: "drench",
        amount: 0.9,
        plannedFeedingId: null,
        draws: [{ lotId: "d-0726", amount: 0.08 }],
      },
      {
        id: "a3",
        plantingId: "parsley",
        date: "2026-07-04",
        material: "tea",
        method: "drench",
        amount: 0.4,
        plannedFeedingId: "parsley:tea:2026-07-04",
        draws: [],
      },
    ],
    adjustments: [
      {
        id: "adj-spill",
        lotId: "d-0726",
        date: "2026-07-27",
        amount: -0.1,
        reason: "spilled",
        note: "jar knocked over",
      },
    ],
    wormMoves: [
      { id: "split", date: "2026-06-14", fromBinId: "stack", toBinId: "tote", worms: 600 },
    ],
    observations: [
      {
        id: "o1",
        binId: "stack",
        date: "2026-07-15",
        wormCount: 3000,
        temperatureC: 19.5,
        moisturePercent: 80,
        note: "like a wrung sponge",
      },
    ],
  },
  asOf: "2026-07-31",
};

/** Replaces every id in a value by the input id it was made from (ids maps old → new). */
function backToInputIds<T>(value: T, ids: Map<string, string>): T {
  const old = new Map([...ids].map(([o, n]) => [n, o]));
  return JSON.parse(
    JSON.stringify(value).replace(
      /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/g,
      (id) => old.get(id) ?? id,
    ),
  ) as T;
}

let ownerId = "";
let gardenId = "";
let ids = new Map<string, string>();

beforeAll(async () => {
  const db = await getDb();
  const [owner] = await db
    .insert(users)
    .values({ email: "maren@example.com", name: "Maren", passwordHash: "x" })
    .returning({ id: users.id });
  ownerId = owner!.id;
  ({ gardenId, ids } = await db.transaction((tx) => insertGardenInputs(tx, { inputs, ownerId })));
});

describe("database → GardenInputs", () => {
  it("gives back exactly the inputs written, in SI, nulls kept as nulls", async () => {
    const loaded = await loadGardenInputs({ gardenId, asOf: inputs.asOf });
    const sortById = <T extends { id: string }>(list: T[]) =>
      [...list].sort((x, y) => x.id.localeCompare(y.id));
    const normalise = (g: GardenInputs) => ({
      ...g,
      garden: { ...g.garden, id: "g" },
      bins: sortById(g.bins),
      beds: sortById(g.beds),
      plantings: sortById(g.plantings),
      logs: {
        ...g.logs,
        applications: sortById(g.logs.applications).map((a) => ({
          ...a,
          draws: sortById(a.draws.map((d) => ({ ...d, id: d.lotId }))),
        })),
      },
    });
    const back = backToInputIds(loaded, ids);
    // Quantities are float8: every SI number comes back exactly as written.
    expect(normalise(back)).toEqual(normalise(inputs));
  });

  it("leaves out logs and stock after asOf", async () => {
    const loaded = await loadGardenInputs({ gardenId, asOf: "2026-06-30" });
    expect(loaded.logs.harvests.map((h) => h.date)).toEqual(["2026-06-01"]);
    expect(loaded.logs.applications).toEqual([]);
    expect(loaded.logs.observations).toEqual([]);
    expect(loaded.logs.adjustments).toEqual([]);
    expect(loaded.logs.wormMoves).toHaveLength(1);
    expect(loaded.stockLots).toHaveLength(1);
  });

  it("reads only the garden asked for", async () => {
    const db = await getDb();
    const other = await db.transaction((tx) =>
      insertGardenInputs(tx, {
        inputs: { ...inputs, garden: { id: "g2", name: "Alder Lane Plot" } },
        ownerId,
      }),
    );
    const loaded = await loadGardenInputs({ gardenId, asOf: inputs.asOf });
    const otherIds = new Set(other.ids.values());
    const everyId = JSON.stringify(loaded).match(/[0-9a-f]{8}-[0-9a-f-]{27}/g) ?? [];
    expect(everyId.length).toBeGreaterThan(10);
    expect(everyId.filter((id) => otherIds.has(id))).toEqual([]);
  });
});

describe("lots: what remains is derived from the draws and never goes below zero", () => {
  it("derives remaining stock: initial less every draw", async () => {
    const stock = await listLotStock({ gardenId });
    const bought = stock.find((l) => l.id === ids.get("bought"))!;
    const june = stock.find((l) => l.id === ids.get("h-june"))!;
    // 6 lb = 2.72155422 kg (NIST factor) less the 1 kg drawn by a1.
    expect(bought.remainingSi).toBeCloseTo(6 * LB - 1, 6);
    // 46 lb = 20.86524902 kg less 0.2 kg.
    expect(june.remainingSi).toBeCloseTo(46 * LB - 0.2, 6);
  });

  it("refuses a draw larger than what is left, and writes nothing", async () => {
    const before = await tableRows("applications");
    const attempt = recordApplication({
      gardenId,
      plantingId: ids.get("tomato")!,
      appliedOn: "2026-07-20",
      material: "castings",
      method: "top-dress",
      amountSi: 2,
      draws: [
        { lotId: ids.get("h-july")!, amountSi: 0.5 },
        // 2.72155422 − 1 = 1.72155422 kg left in the bought lot.
        { lotId: ids.get("bought")!, amountSi: 1.8 },
      ],
    });
    await expect(attempt).rejects.toMatchObject({
      code: "conflict:stock",
      fields: { "draws[1].amountSi": "is more than the lot has left" },
    });
    expect(await tableRows("applications")).toEqual(before);
  });

  it("takes the rest of a lot exactly, across two lots, and then the lot is empty", async () => {
    const left = 6 * LB - 1;
    const made = await recordApplication({
      gardenId,
      plantingId: ids.get("tomato")!,
      appliedOn: "2026-07-20",
      material: "castings",
      method: "top-dress",
      amountSi: left + 0.5,
      plannedKey: `${ids.get("tomato")}:castings:2026-07-20`,
      draws: [
        { lotId: ids.get("h-july")!, amountSi: 0.5 },
        { lotId: ids.get("bought")!, amountSi: left },
      ],
    });
    const stock = await listLotStock({ gardenId });
    expect(stock.find((l) => l.id === ids.get("bought"))!.remainingSi).toBeCloseTo(0, 6);
    const db = await getDb();
    const [row] = await db.select().from(applications).where(eq(applications.id, made.id));
    expect(row!.plannedFor).toBe("2026-07-20");
    const again = recordApplication({
      gardenId,
      plantingId: ids.get("tomato")!,
      appliedOn: "2026-07-21",
      material: "castings",
      method: "top-dress",
      amountSi: 0.1,
      draws: [{ lotId: ids.get("bought")!, amountSi: 0.01 }],
    });
    await expect(again).rejects.toMatchObject({ code: "conflict:stock" });
  });

  it("refuses logging the same planned feeding twice", async () => {
    const twice = recordApplication({
      gardenId,
      plantingId: ids.get("tomato")!,
      appliedOn: "2026-07-22",
      material: "castings",
      method: "top-dress",
      amountSi: 0.1,
      plannedKey: `${ids.get("tomato")}:castings:2026-07-20`,
      draws: [{ lotId: ids.get("h-july")!, amountSi: 0.1 }],
    });
    await expect(twice).rejects.toMatchObject({ code: "conflict:already_logged" });
  });

  it("refuses a lot of another garden, a lot of the wrong material, and a lot made later", async () => {
    const db = await getDb();
    const [foreign] = await db
      .select({ id: stockLots.id })
      .from(stockLots)
      .where(sql`${stockLots.gardenId} <> ${gardenId}`)
      .limit(1);
    const attempt = recordApplication({
      gardenId,
      plantingId: ids.get("kale")!,
      appliedOn: "2026-06-20",
      material: "leachate",
      method: "drench",
      amountSi: 0.5,
      draws: [
        { lotId: foreign!.id, amountSi: 0.01 },
        { lotId: ids.get("h-june")!, amountSi: 0.01 },
        { lotId: ids.get("d-0726")!, amountSi: 0.01 },
      ],
    });
    await expect(attempt).rejects.toMatchObject({
      code: "validation:draws",
      fields: {
        "draws[0].lotId": "no such lot in this garden",
        "draws[1].lotId": "is castings, not leachate",
        "draws[2].lotId": "was made after that day",
      },
    });
  });
});

describe("stock adjustments (spilled, given away) go through the same check", () => {
  it("lower what remains, refuse taking more than is left, and reach the inputs", async () => {
    const july = ids.get("h-july")!;
    const remaining = async () =>
      (await listLotStock({ gardenId })).find((l) => l.id === july)!.remainingSi;
    const before = await remaining();
    await recordStockAdjustment({
      gardenId,
      lotId: july,
      adjustedOn: "2026-07-10",
      amountSi: -2,
      reason: "given-away",
    });
    expect(await remaining()).toBeCloseTo(before - 2, 9);
    await expect(
      recordStockAdjustment({
        gardenId,
        lotId: july,
        adjustedOn: "2026-07-11",
        amountSi: -(before - 2) - 0.01,
        reason: "spilled",
      }),
    ).rejects.toMatchObject({ code: "conflict:stock" });
    // The adjustment is its own log on its own date; the harvest keeps its weight as made
    // (44 lb = 19.95806428 kg, NIST HB 44), so the lot is whole before 10 July.
    const loaded = await loadGardenInputs({ gardenId, asOf: inputs.asOf });
    expect(loaded.logs.harvests.find((h) => h.id === july)!.castingsKg).toBe(44 * LB);
    expect(loaded.logs.adjustments.filter((a) => a.lotId === july)).toEqual([
      expect.objectContaining({ date: "2026-07-10", amount: -2, reason: "given-away", note: null }),
    ]);
  });
});

describe("writing inputs is all or nothing", () => {
  it("leaves no garden behind when one application overdraws", async () => {
    const db = await getDb();
    const before = await tableRows("gardens");
    const bad: GardenInputs = {
      ...inputs,
      logs: {
        ...inputs.logs,
        applications: [
          { ...inputs.logs.applications[0]!, draws: [{ lotId: "bought", amount: 100 }] },
        ],
      },
    };
    await expect(
      db.transaction((tx) => insertGardenInputs(tx, { inputs: bad, ownerId })),
    ).rejects.toMatchObject({
      code: "conflict:stock",
    });
    expect(await tableRows("gardens")).toEqual(before);
  });
});

describe("archived plantings and beds", () => {
  it("end a planting's plan on the day it was archived; one archived before planting is left out", async () => {
    const db = await getDb();
    await db
      .update(plantings)
      .set({ archivedOn: "2026-07-15" })
      .where(eq(plantings.id, ids.get("parsley")!));
    const [kale] = await db
      .select()
      .from(plantings)
      .where(eq(plantings.id, ids.get("kale")!));
    const [planned] = await db
      .insert(plantings)
      .values({ ...kale!, id: undefined, plantedOn: "2026-09-01", archivedOn: "2026-08-01" })
      .returning({ id: plantings.id });
    const loaded = await loadGardenInputs({ gardenId, asOf: inputs.asOf });
    expect(loaded.plantings.find((p) => p.id === ids.get("parsley"))!.endDate).toBe("2026-07-15");
    expect(loaded.plantings.map((p) => p.id)).not.toContain(planned!.id);
    // Not archived: unchanged (endDate null stays null, the engine's season end applies).
    expect(loaded.plantings.find((p) => p.id === ids.get("kale"))!.endDate).toBeNull();
  });

  it("are not counted on the overview; plantings ended in the past are not either", async () => {
    const db = await getDb();
    const [kale] = await db
      .select()
      .from(plantings)
      .where(eq(plantings.id, ids.get("kale")!));
    await db
      .insert(plantings)
      .values({ ...kale!, id: undefined, plantedOn: "2019-05-01", endedOn: "2019-10-01" });
    const summary = await getGardenSummary({ gardenId });
    // kale (no end) counts; tomato ended 2026-10-10 and parsley is archived; the planned
    // planting is archived; the 2019 one ended long ago. tomato counts only before 2026-10-11.
    const today = new Date().toISOString().slice(0, 10);
    expect(summary.activePlantings).toBe(today <= "2026-10-10" ? 2 : 1);
    // The tote is retired on 2027-06-30; the stack never.
    expect(summary).toMatchObject({ beds: 1, containers: 1, bins: today <= "2027-06-30" ? 2 : 1 });
  });
});
