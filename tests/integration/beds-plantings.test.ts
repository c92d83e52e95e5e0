import "@/tests/support/integration/env";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as bed from "@/app/api/gardens/[gardenId]/beds/[bedId]/route";
import * as beds from "@/app/api/gardens/[gardenId]/beds/route";
import * as crops from "@/app/api/gardens/[gardenId]/crops/route";
import * as planting from "@/app/api/gardens/[gardenId]/plantings/[plantingId]/route";
import * as plantings from "@/app/api/gardens/[gardenId]/plantings/route";
import { getDb } from "@/db";
import { loadGardenInputs } from "@/db/queries/garden-inputs";
import { applications } from "@/db/schema";
import {
  makeBed,
  makeOwnCrop,
  makePlanting,
  starterCropId,
} from "@/tests/support/integration/beds-fixtures";
import {
  call,
  closeHarness,
  cookieFor,
  makeGardenWithRoles,
  type GardenWorld,
} from "@/tests/support/integration/harness";

let world: GardenWorld;
let grower: string;
const url = (path: string) => `/api/gardens/${world.gardenId}/${path}`;
const params = (extra: Record<string, string> = {}) => ({ gardenId: world.gardenId, ...extra });

beforeAll(async () => {
  world = await makeGardenWithRoles();
  grower = await cookieFor(world.grower);
  await starterCropId("Tomato");
});
afterAll(closeHarness);

describe("beds", () => {
  it("stores an 8 × 4 ft bed in SI: 32 ft² = 2.97289728 m² (NIST HB 44 App. C: 1 ft = 0.3048 m)", async () => {
    const res = await call(beds.POST, {
      url: url("beds"),
      params: params(),
      cookie: grower,
      body: {
        name: "Bed A",
        kind: "bed",
        length: { value: 8, unit: "ft" },
        width: { value: 4, unit: "ft" },
      },
    });
    expect(res.status).toBe(201);
    expect(res.json.bed.lengthM).toBeCloseTo(2.4384, 6);
    expect(res.json.bed.areaM2).toBeCloseTo(2.97289728, 6);
  });

  it("stores a 5-gallon pot as 18.92705892 L (NIST HB 44: 1 gal = 3.785411784 L)", async () => {
    const res = await call(beds.POST, {
      url: url("beds"),
      params: params(),
      cookie: grower,
      body: { name: "Pot", kind: "container", volume: { value: 5, unit: "gal" } },
    });
    expect(res.status).toBe(201);
    expect(res.json.bed.containerVolumeL).toBeCloseTo(18.92705892, 6);
  });

  it.each([
    [
      {
        name: "Zero",
        kind: "bed",
        length: { value: 0, unit: "ft" },
        width: { value: 4, unit: "ft" },
      },
      "length.value",
    ],
    [
      {
        name: "Neg",
        kind: "bed",
        length: { value: 8, unit: "ft" },
        width: { value: -4, unit: "ft" },
      },
      "width.value",
    ],
    [{ name: "No width", kind: "bed", length: { value: 8, unit: "ft" } }, "width"],
    [{ name: "Pot", kind: "container" }, "volume"],
    [
      {
        name: "Mixed",
        kind: "bed",
        length: { value: 8, unit: "gal" },
        width: { value: 4, unit: "ft" },
      },
      "length.unit",
    ],
    [
      { name: "", kind: "bed", length: { value: 8, unit: "ft" }, width: { value: 4, unit: "ft" } },
      "name",
    ],
  ])("refuses bad sizes with a 400 naming the field (%#)", async (body, field) => {
    const res = await call(beds.POST, { url: url("beds"), params: params(), cookie: grower, body });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain(field);
  });

  it("bounds the page size and filters by kind", async () => {
    const tooMany = await call(beds.GET, {
      url: url("beds?limit=5000"),
      params: params(),
      cookie: grower,
    });
    expect(tooMany.status).toBe(400);
    expect(tooMany.json.error.fields).toHaveProperty("limit");
    const pots = await call(beds.GET, {
      url: url("beds?kind=container"),
      params: params(),
      cookie: grower,
    });
    expect(pots.status).toBe(200);
    expect(pots.json.beds.every((b: { kind: string }) => b.kind === "container")).toBe(true);
  });

  it("refuses a PATCH that turns a bed into a container with no volume", async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(bed.PATCH, {
      url: url(`beds/${b.id}`),
      params: params({ bedId: b.id }),
      cookie: grower,
      body: { kind: "container" },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("volume");
  });
});

describe("plantings", () => {
  it('quick entry "6 tomato, 4 pepper" makes two plantings that loadGardenInputs hands the engine', async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: { bedId: b.id, plantedOn: "2026-05-01", quick: "6 tomatoes, 4 Pepper" },
    });
    expect(res.status).toBe(201);
    const made = res.json.plantings as {
      cropName: string;
      plantCount: number;
      ruleSource: string;
    }[];
    expect(made.map((p) => [p.cropName, p.plantCount])).toEqual([
      ["Tomato", 6],
      ["Pepper", 4],
    ]);
    expect(made.every((p) => p.ruleSource === "default")).toBe(true);
    const inputs = await loadGardenInputs({ gardenId: world.gardenId, asOf: "2026-05-01" });
    const inBed = inputs.plantings.filter((p) => p.bedId === b.id);
    expect(inBed.map((p) => p.plantCount).sort()).toEqual([4, 6]);
    // Heavy feeders (PRODUCT.md: tomato and pepper fed 1 cup per plant monthly by default).
    expect(inBed.every((p) => p.feederClass === "heavy" && p.rules.length === 0)).toBe(true);
  });

  it("names an unknown crop in quick entry and writes nothing", async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: { bedId: b.id, plantedOn: "2026-05-01", quick: "6 tomato, 3 dragonfruit" },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.quick).toContain("dragonfruit");
    const list = await call(plantings.GET, {
      url: url(`plantings?bedId=${b.id}`),
      params: params(),
      cookie: grower,
    });
    expect(list.json.plantings).toEqual([]);
  });

  it("refuses 10,000 tomatoes in a 2 ft² bed, naming the spacing, unless confirmed", async () => {
    const small = await call(beds.POST, {
      url: url("beds"),
      params: params(),
      cookie: grower,
      body: {
        name: "Tiny",
        kind: "bed",
        length: { value: 2, unit: "ft" },
        width: { value: 1, unit: "ft" },
      },
    });
    const body = {
      bedId: small.json.bed.id,
      cropId: await starterCropId("Tomato"),
      plantCount: 10_000,
      plantedOn: "2026-05-01",
    };
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body,
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.plantCount).toMatch(/spacing/);
    const confirmed = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: { ...body, confirmCrowded: true },
    });
    expect(confirmed.status).toBe(201);
    expect(confirmed.json.warnings[0].field).toBe("plantCount");
  });

  it("refuses an end before the start, on create and on a PATCH of the end alone", async () => {
    const b = await makeBed(world.gardenId);
    const body = {
      bedId: b.id,
      cropId: await starterCropId("Tomato"),
      plantCount: 2,
      plantedOn: "2026-05-01",
      endedOn: "2026-04-01",
    };
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body,
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("endedOn");
    const ok = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: { ...body, endedOn: null },
    });
    const id = ok.json.plantings[0].id;
    const patch = await call(planting.PATCH, {
      url: url(`plantings/${id}`),
      params: params({ plantingId: id }),
      cookie: grower,
      body: { endedOn: "2026-01-01" },
    });
    expect(patch.status).toBe(400);
    expect(patch.json.error.fields).toHaveProperty("endedOn");
  });

  it("refuses a crop or bed of another garden as a field error", async () => {
    const theirCrop = await makeOwnCrop(world.outsiderGardenId, "Their tomatillo");
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: { bedId: b.id, cropId: theirCrop.id, plantCount: 1, plantedOn: "2026-05-01" },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("cropId");
    const theirBed = await makeBed(world.outsiderGardenId);
    const res2 = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: {
        bedId: theirBed.id,
        cropId: await starterCropId("Tomato"),
        plantCount: 1,
        plantedOn: "2026-05-01",
      },
    });
    expect(res2.status).toBe(400);
    expect(res2.json.error.fields).toHaveProperty("bedId");
  });

  it("an override rule in lower case (legal per RFC 5545 §2) is stored upper-case and reaches the engine", async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: {
        bedId: b.id,
        cropId: await starterCropId("Tomato"),
        plantCount: 6,
        plantedOn: "2026-05-01",
        rule: {
          material: "tea",
          method: "drench",
          basis: "per-plant",
          amount: { value: 100, unit: "mL" },
          recurrence: "freq=weekly;interval=2;byday=mo",
        },
      },
    });
    expect(res.status).toBe(201);
    const p = res.json.plantings[0];
    expect(p.ruleSource).toBe("planting");
    expect(p.rule.recurrence).toBe("FREQ=WEEKLY;INTERVAL=2;BYDAY=MO");
    expect(p.rule.amount).toBeCloseTo(0.1, 9); // 100 mL = 0.1 L
    const back = await call(planting.PATCH, {
      url: url(`plantings/${p.id}`),
      params: params({ plantingId: p.id }),
      cookie: grower,
      body: { rule: null },
    });
    expect(back.json.planting.ruleSource).toBe("default");
  });

  it("refuses a rule whose RRULE cannot be read, on the recurrence field", async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: {
        bedId: b.id,
        cropId: await starterCropId("Tomato"),
        plantCount: 1,
        plantedOn: "2026-05-01",
        rule: {
          material: "castings",
          method: "top-dress",
          basis: "per-plant",
          amount: { value: 1, unit: "cup" },
          recurrence: "FREQ=HOURLY",
        },
      },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain("rule.recurrence");
  });
});

describe("expected end from the season", () => {
  // Tomato: 75 days to harvest on the crop list (common practice, from memory). The test
  // garden's first fall frost is 20 October (tests/support/integration/harness.ts).
  async function plantTomato(bedId: string, plantedOn: string) {
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: { bedId, cropId: await starterCropId("Tomato"), plantCount: 1, plantedOn },
    });
    expect(res.status, res.text).toBe(201);
    return res.json.plantings[0];
  }

  it("is planted day + days to harvest when that comes before the frost", async () => {
    const b = await makeBed(world.gardenId);
    // 1 May + 75 days = 15 July (31 + 30 + 14 days to 15 July).
    expect((await plantTomato(b.id, "2026-05-01")).expectedHarvestOn).toBe("2026-07-15");
  });

  it("stops at the first fall frost outdoors, not after it", async () => {
    const b = await makeBed(world.gardenId);
    // 15 Aug + 75 days = 29 Oct, past the 20 Oct frost.
    expect((await plantTomato(b.id, "2026-08-15")).expectedHarvestOn).toBe("2026-10-20");
  });

  it("runs the full days to harvest indoors (no frost there)", async () => {
    const created = await call(beds.POST, {
      url: url("beds"),
      params: params(),
      cookie: grower,
      body: {
        name: "Sunroom pot",
        kind: "container",
        indoors: true,
        volume: { value: 5, unit: "gal" },
      },
    });
    expect((await plantTomato(created.json.bed.id, "2026-08-15")).expectedHarvestOn).toBe(
      "2026-10-29",
    );
  });

  it("stays editable: a given expected end is kept", async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: {
        bedId: b.id,
        cropId: await starterCropId("Tomato"),
        plantCount: 1,
        plantedOn: "2026-08-15",
        expectedHarvestOn: "2026-11-05",
      },
    });
    expect(res.json.plantings[0].expectedHarvestOn).toBe("2026-11-05");
  });
});

describe("rules that give no dates", () => {
  const rule = (recurrence: string) => ({
    material: "castings",
    method: "top-dress",
    basis: "per-plant",
    amount: { value: 1, unit: "cup" },
    recurrence,
  });

  // RFC 5545 §3.3.10: BYMONTHDAY days a month does not have are ignored, so June (30 days) and the 31st give no dates.
  it("refuses BYMONTHDAY=31 with BYMONTH=6 on a new planting, naming the field and saying why", async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: {
        bedId: b.id,
        cropId: await starterCropId("Tomato"),
        plantCount: 1,
        plantedOn: "2026-05-01",
        rule: rule("FREQ=MONTHLY;BYMONTHDAY=31;BYMONTH=6"),
      },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields["rule.recurrence"]).toMatch(/June never has a 31st day/);
  });

  it("names which of several rules gives no dates (rules[1]: an UNTIL before the planting day)", async () => {
    const b = await makeBed(world.gardenId);
    const res = await call(plantings.POST, {
      url: url("plantings"),
      params: params(),
      cookie: grower,
      body: {
        bedId: b.id,
        cropId: await starterCropId("Tomato"),
        plantCount: 1,
        plantedOn: "2026-05-01",
        rules: [rule("FREQ=MONTHLY"), rule("FREQ=WEEKLY;INTERVAL=2;UNTIL=20260401")],
      },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields["rules.1.recurrence"]).toMatch(
      /UNTIL 1 Apr 2026 is before the first day/,
    );
  });

  it("refuses it on a crop's default rule too", async () => {
    const res = await call(crops.POST, {
      url: url("crops"),
      params: params(),
      cookie: grower,
      body: {
        name: "June-31 squash",
        feederClass: "heavy",
        rule: rule("freq=monthly;bymonthday=31;bymonth=6"),
      },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields["rule.recurrence"]).toMatch(/June never has a 31st day/);
  });

  it("refuses, on a planting's PATCH, a rule whose UNTIL is before the planting day", async () => {
    const p = await makePlanting(world.gardenId);
    const res = await call(planting.PATCH, {
      url: url(`plantings/${p.id}`),
      params: params({ plantingId: p.id }),
      cookie: grower,
      body: { rule: rule("FREQ=MONTHLY;UNTIL=20260101") },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields["rule.recurrence"]).toMatch(
      /UNTIL 1 Jan 2026 is before the first day 1 May 2026/,
    );
  });
});

describe("crops", () => {
  it("lists at least 40 crops, and a garden's change to a starter crop becomes its own copy", async () => {
    const list = await call(crops.GET, { url: url("crops"), params: params(), cookie: grower });
    expect(list.json.total).toBeGreaterThanOrEqual(40);
    const dup = await call(crops.POST, {
      url: url("crops"),
      params: params(),
      cookie: grower,
      body: { name: "Okra patch", feederClass: "heavy" },
    });
    expect(dup.status).toBe(201);
    const again = await call(crops.POST, {
      url: url("crops"),
      params: params(),
      cookie: grower,
      body: { name: "okra PATCH", feederClass: "heavy" },
    });
    expect(again.status).toBe(400);
    expect(again.json.error.fields).toHaveProperty("name");
  });
});

describe("archive, not delete, while logs refer to it", () => {
  it("archives a bed whose planting has a logged application, keeps the log and ends the planting", async () => {
    const p = await makePlanting(world.gardenId);
    const db = await getDb();
    await db.insert(applications).values({
      gardenId: world.gardenId,
      plantingId: p.id,
      material: "castings",
      method: "top-dress",
      amountSi: 0.5,
      appliedOn: "2026-06-01",
    });
    const res = await call(bed.DELETE, {
      url: url(`beds/${p.bedId}`),
      params: params({ bedId: p.bedId }),
      cookie: grower,
    });
    expect(res.status, res.text).toBe(200);
    expect(res.json.archivedOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const listed = await call(beds.GET, {
      url: url("beds?limit=100"),
      params: params(),
      cookie: grower,
    });
    expect(listed.json.beds.map((b: { id: string }) => b.id)).not.toContain(p.bedId);
    const archived = await call(beds.GET, {
      url: url("beds?archived=true"),
      params: params(),
      cookie: grower,
    });
    expect(archived.json.beds.map((b: { id: string }) => b.id)).toContain(p.bedId);
    const logs = await db.select().from(applications);
    expect(logs.some((a) => a.plantingId === p.id)).toBe(true);
    const inputs = await loadGardenInputs({ gardenId: world.gardenId, asOf: "2026-06-01" });
    expect(inputs.plantings.find((x) => x.id === p.id)?.endDate).toBe(res.json.archivedOn);
    const again = await call(bed.DELETE, {
      url: url(`beds/${p.bedId}`),
      params: params({ bedId: p.bedId }),
      cookie: grower,
    });
    expect(again.status).toBe(409);
  });

  it("removes a planting with no logs outright", async () => {
    const p = await makePlanting(world.gardenId);
    const res = await call(planting.DELETE, {
      url: url(`plantings/${p.id}`),
      params: params({ plantingId: p.id }),
      cookie: grower,
    });
    expect(res.json).toEqual({ removed: true });
    const gone = await call(planting.GET, {
      url: url(`plantings/${p.id}`),
      params: params({ plantingId: p.id }),
      cookie: grower,
    });
    expect(gone.status).toBe(404);
  });
});
