import "@/tests/support/integration/env";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as crop from "@/app/api/gardens/[gardenId]/crops/[cropId]/route";
import * as crops from "@/app/api/gardens/[gardenId]/crops/route";
import * as planting from "@/app/api/gardens/[gardenId]/plantings/[plantingId]/route";
import * as plantings from "@/app/api/gardens/[gardenId]/plantings/route";
import { getDb } from "@/db";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { feedingRules } from "@/db/schema";
import { computePlan } from "@/lib/engine";
import { makeBed, starterCropId } from "@/tests/support/integration/beds-fixtures";
import {
  call,
  closeHarness,
  cookieFor,
  makeGardenWithRoles,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// Issue 10, item 3: a planting (and a crop, for its plantings) holds several
// rules — "castings monthly and tea every two weeks" — sent as `rules: [...]`
// through the API; today's single `rule` is still accepted.

let world: GardenWorld;
let grower: string;
const url = (path: string) => `/api/gardens/${world.gardenId}/${path}`;
const params = (extra: Record<string, string> = {}) => ({ gardenId: world.gardenId, ...extra });

// 1 cup = 0.2365882365 L and 250 mL = 0.25 L (NIST HB 44, App. C).
const CUP_L = 0.2365882365;
const castingsMonthly = {
  material: "castings",
  method: "top-dress",
  basis: "per-plant",
  amount: { value: 1, unit: "cup" },
  recurrence: "FREQ=MONTHLY",
};
const teaFortnightly = {
  material: "tea",
  method: "drench",
  basis: "per-plant",
  amount: { value: 250, unit: "mL" },
  recurrence: "freq=weekly;interval=2",
};

beforeAll(async () => {
  world = await makeGardenWithRoles();
  grower = await cookieFor(world.grower);
});
afterAll(closeHarness);

async function plant(body: Record<string, unknown>) {
  const b = await makeBed(world.gardenId);
  return call(plantings.POST, {
    url: url("plantings"),
    params: params(),
    cookie: grower,
    body: {
      bedId: b.id,
      cropId: await starterCropId("Tomato"),
      plantCount: 6,
      plantedOn: "2026-05-01",
      ...body,
    },
  });
}

const patch = (id: string, body: Record<string, unknown>) =>
  call(planting.PATCH, {
    url: url(`plantings/${id}`),
    params: params({ plantingId: id }),
    cookie: grower,
    body,
  });

describe("a planting with two rules", () => {
  it("is created with castings monthly and tea every two weeks, both reach the plan in order", async () => {
    const res = await plant({ rules: [castingsMonthly, teaFortnightly] });
    expect(res.status).toBe(201);
    const p = res.json.plantings[0];
    expect(p.ruleSource).toBe("planting");
    expect(p.rules.map((r: { material: string }) => r.material)).toEqual(["castings", "tea"]);
    expect(p.rules[0].amount).toBeCloseTo(CUP_L, 12);
    expect(p.rules[1].amount).toBeCloseTo(0.25, 12);
    expect(p.rules[1].recurrence).toBe("FREQ=WEEKLY;INTERVAL=2");
    expect(p.effectiveRules).toEqual(p.rules);

    const got = await call(planting.GET, {
      url: url(`plantings/${p.id}`),
      params: params({ plantingId: p.id }),
      cookie: grower,
    });
    expect(got.json.planting.rules).toEqual(p.rules);

    const inputs = await loadGardenInputs({ gardenId: world.gardenId, asOf: "2026-04-30" });
    const mine = inputs.plantings.find((x) => x.id === p.id)!;
    expect(mine.rules.map((r) => [r.material, r.recurrence])).toEqual([
      ["castings", "FREQ=MONTHLY"],
      ["tea", "FREQ=WEEKLY;INTERVAL=2"],
    ]);
    const plan = computePlan(inputs, { from: "2026-05", months: 1, suggestions: false });
    const may = plan.feedings.filter((f) => f.plantingId === p.id).map((f) => [f.material, f.date]);
    // RFC 5545: monthly from 1 May → 1 May; every two weeks from 1 May → 1, 15, 29 May.
    expect(may.sort()).toEqual([
      ["castings", "2026-05-01"],
      ["tea", "2026-05-01"],
      ["tea", "2026-05-15"],
      ["tea", "2026-05-29"],
    ]);
  });

  it("PATCH rules replaces the list; a single rule becomes the only rule; rules [] goes back to the crop's", async () => {
    const p = (await plant({ rules: [castingsMonthly, teaFortnightly] })).json.plantings[0];
    const one = await patch(p.id, { rules: [teaFortnightly] });
    expect(one.status).toBe(200);
    expect(one.json.planting.rules.map((r: { material: string }) => r.material)).toEqual(["tea"]);
    const single = await patch(p.id, { rule: castingsMonthly });
    expect(single.json.planting.rules.map((r: { material: string }) => r.material)).toEqual([
      "castings",
    ]);
    const none = await patch(p.id, { rules: [] });
    expect(none.json.planting.rules).toEqual([]);
    expect(none.json.planting.ruleSource).toBe("default");
    // A PATCH that names no rule leaves them as they are.
    await patch(p.id, { rules: [castingsMonthly, teaFortnightly] });
    const kept = await patch(p.id, { plantCount: 5 });
    expect(kept.json.planting.rules).toHaveLength(2);
    const db = await getDb();
    expect(
      await db.select().from(feedingRules).where(eq(feedingRules.plantingId, p.id)),
    ).toHaveLength(2);
  });

  it("refuses rule and rules together, too many rules, and a bad rule inside the list, naming the field", async () => {
    const both = await plant({ rule: castingsMonthly, rules: [teaFortnightly] });
    expect(both.status).toBe(400);
    expect(both.json.error.fields).toHaveProperty("rules");
    const many = await plant({ rules: Array.from({ length: 11 }, () => castingsMonthly) });
    expect(many.status).toBe(400);
    expect(many.json.error.fields).toHaveProperty("rules");
    const bad = await plant({
      rules: [castingsMonthly, { ...teaFortnightly, recurrence: "FREQ=HOURLY" }],
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.error.fields)).toContain("rules.1.recurrence");
  });

  it("a removed planting takes its rules with it", async () => {
    const p = (await plant({ rules: [castingsMonthly, teaFortnightly] })).json.plantings[0];
    const res = await call(planting.DELETE, {
      url: url(`plantings/${p.id}`),
      params: params({ plantingId: p.id }),
      cookie: grower,
    });
    expect(res.json).toEqual({ removed: true });
    const db = await getDb();
    expect(await db.select().from(feedingRules).where(eq(feedingRules.plantingId, p.id))).toEqual(
      [],
    );
  });
});

describe("a crop with two rules", () => {
  it("passes both to a planting with none of its own, and a planting's own rules replace them", async () => {
    const made = await call(crops.POST, {
      url: url("crops"),
      params: params(),
      cookie: grower,
      body: { name: "Delicata", feederClass: "heavy", rules: [castingsMonthly, teaFortnightly] },
    });
    expect(made.status).toBe(201);
    const cropId = made.json.crop.id;
    expect(made.json.crop.rules).toHaveLength(2);
    expect(made.json.crop.ruleSource).toBe("crop");

    const b = await makeBed(world.gardenId);
    const body = { bedId: b.id, cropId, plantCount: 2, plantedOn: "2026-05-01" };
    const inherits = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body,
    });
    const p = inherits.json.plantings[0];
    expect(p.rules).toEqual([]);
    expect(p.ruleSource).toBe("crop");
    expect(p.effectiveRules).toEqual(made.json.crop.rules);
    const inputs = await loadGardenInputs({ gardenId: world.gardenId, asOf: "2026-04-30" });
    expect(inputs.plantings.find((x) => x.id === p.id)!.rules).toEqual(made.json.crop.rules);

    const own = await patch(p.id, { rules: [teaFortnightly] });
    expect(own.json.planting.ruleSource).toBe("planting");
    expect(own.json.planting.effectiveRules).toHaveLength(1);

    // The crop's one-rule form still works: a single rule replaces both.
    const single = await call(crop.PATCH, {
      url: url(`crops/${cropId}`),
      params: params({ cropId }),
      cookie: grower,
      body: { rule: castingsMonthly },
    });
    expect(single.status).toBe(200);
    expect(single.json.crop.rules).toHaveLength(1);
  });
});
