import "@/tests/support/integration/env";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import * as balanceRoute from "@/app/api/gardens/[gardenId]/balance/route";
import * as exportRoute from "@/app/api/gardens/[gardenId]/export/route";
import * as whatIfRoute from "@/app/api/gardens/[gardenId]/what-if/route";
import * as lotsRoute from "@/app/api/gardens/[gardenId]/lots/route";
import * as gardenRoute from "@/app/api/gardens/[gardenId]/route";
import * as importRoute from "@/app/api/gardens/import/route";
import { recordHarvest } from "@/db/queries/lots";
import { getDb } from "@/db";
import type { BalanceBody, WhatIfBody } from "@/lib/balance/types";
import type { MonthRow } from "@/lib/engine";
import {
  call,
  closeHarness,
  countRows,
  schemaTableNames,
  signUpUser,
  type TestUser,
} from "@/tests/support/integration/harness";
import fixture from "@/tests/fixtures/scenarios/quince-court-porch.json";

// The Balance API against an invented one-bin, one-bed, two-planting garden
// (tests/fixtures/scenarios/quince-court-porch.json). Every expected number is
// worked out by hand below from PRODUCT.md's published figures and NIST HB 44
// Appendix C factors, never by calling the engine.
//
// "Today" is fixed at 2027-02-15 (noon in Chicago), so the plan is all forecast.
//
// Supply (PRODUCT.md "Output forecast", defaults P = 30 d, T = 90 d, fill 0.9, 0.7 kg/L):
//   tray inside 21 × 17 × 5½ in = 1,963.5 in³ × 0.016387064 L/in³ (1 in = 2.54 cm exactly,
//   NIST HB 44 App. C) = 32.176 L; × 0.9 × 0.7 kg/L = 20.27088 kg per harvest.
//   First harvest = start + T = 2027-01-01 + 90 d = 2027-04-01 (31 + 28 + 31 = 90);
//   then every max(P, T / trays) = max(30, 22.5) = 30 d: 05-01, 05-31, 06-30, 07-30, 08-29.
//   So March 0, April 1 harvest, May 2, June 1, July 1, August 1.
// Demand (PRODUCT.md "Demand", feeder-class defaults, indoor bed so no frost season):
//   1 US cup = 0.2365882365 L (NIST HB 44 App. C); castings at 0.7 kg/L → 0.16561176555 kg.
//   tomatoes: heavy, 30 plants × 1 cup monthly from 03-05 → 30 cups = 4.96835 kg each month.
//   lettuce: light, 10 plants × ½ cup every two months from 03-05 → 5 cups = 0.82806 kg
//   in March, May, July.
// Shelf life is set to 3,650 days so nothing ages out in the range.
const TRAY_L = 1963.5 * 0.016387064;
const HARVEST_KG = TRAY_L * 0.9 * 0.7; // 20.27088…
const CUP_KG = 0.2365882365 * 0.7;
const TOMATO_KG = 30 * CUP_KG; // 4.96835…
const LETTUCE_KG = 10 * 0.5 * CUP_KG; // 0.82806…
const LB = 0.45359237; // kg per lb, NIST HB 44 App. C

const castings = (body: BalanceBody, month: string): MonthRow => {
  const row = body.plan.rows.find((r) => r.month === month && r.pool === "castings");
  if (!row) throw new Error(`no castings row for ${month}`);
  return row;
};

let owner: TestUser;
let gardenId: string;
const url = (id: string, tail: string) => `/api/gardens/${id}${tail}`;

async function getBalance(id: string, query: string, user = owner) {
  return call(balanceRoute.GET, {
    url: url(id, `/balance${query}`),
    params: { gardenId: id },
    cookie: user.cookie,
  });
}

/** Row count and an md5 of every row of every table: any write shows up. */
async function databaseChecksum(): Promise<Record<string, string>> {
  const db = await getDb();
  const out: Record<string, string> = {};
  for (const table of schemaTableNames()) {
    const result = (await db.execute(
      sql.raw(
        `select count(*)::int as n, md5(coalesce(string_agg(t::text, '|' order by t::text), '')) as h from "${table}" t`,
      ),
    )) as unknown as { rows: { n: number; h: string }[] };
    out[table] = `${result.rows[0]!.n}:${result.rows[0]!.h}`;
  }
  return out;
}

beforeAll(async () => {
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(new Date("2027-02-15T18:00:00Z"));
  owner = await signUpUser("owner");
  const res = await call(importRoute.POST, {
    url: "/api/gardens/import",
    body: fixture,
    cookie: owner.cookie,
  });
  expect(res.status, res.text).toBe(201);
  gardenId = res.json.garden.id;
});

afterAll(async () => {
  vi.useRealTimers();
  await closeHarness();
});

describe("GET balance", () => {
  it("gives hand-checked castings figures month by month", async () => {
    const res = await getBalance(gardenId, "?from=2027-03&months=6");
    expect(res.status, res.text).toBe(200);
    const body = res.json as BalanceBody;
    expect(body.range).toEqual({ from: "2027-03", months: 6 });
    expect(body.asOf).toBe("2027-02-15");
    expect(body.settings.unitSystem).toBe("us");
    expect(body.settings.timeZone).toBe("America/Chicago");
    expect(body.plan.months).toEqual([
      "2027-03",
      "2027-04",
      "2027-05",
      "2027-06",
      "2027-07",
      "2027-08",
    ]);

    // March: no harvest yet, nothing in stock: all 35 cups short.
    const mar = castings(body, "2027-03");
    expect(mar.opening).toBeCloseTo(0, 6);
    expect(mar.supplied).toBeCloseTo(0, 6);
    expect(mar.demand).toBeCloseTo(TOMATO_KG + LETTUCE_KG, 4); // 5.79641 kg
    expect(mar.allocated).toBeCloseTo(0, 6);
    expect(mar.shortfall).toBeCloseTo(TOMATO_KG + LETTUCE_KG, 4);
    expect(mar.closing).toBeCloseTo(0, 6);

    // April: the 04-01 harvest serves the 04-05 feeding; the rest carries.
    const apr = castings(body, "2027-04");
    expect(apr.supplied).toBeCloseTo(HARVEST_KG, 3); // 20.27088 kg
    expect(apr.demand).toBeCloseTo(TOMATO_KG, 4); // 4.96835 kg
    expect(apr.allocated).toBeCloseTo(TOMATO_KG, 4);
    expect(apr.shortfall).toBeCloseTo(0, 6);
    expect(apr.closing).toBeCloseTo(HARVEST_KG - TOMATO_KG, 3); // 15.30253 kg

    // May: two harvests (05-01, 05-31); April's closing is May's opening.
    const may = castings(body, "2027-05");
    expect(may.opening).toBeCloseTo(HARVEST_KG - TOMATO_KG, 3);
    expect(may.supplied).toBeCloseTo(2 * HARVEST_KG, 3); // 40.54176 kg
    expect(may.demand).toBeCloseTo(TOMATO_KG + LETTUCE_KG, 4);
    expect(may.closing).toBeCloseTo(3 * HARVEST_KG - 2 * TOMATO_KG - LETTUCE_KG, 3); // 50.04788 kg

    // June: one harvest (06-30), tomatoes only.
    const jun = castings(body, "2027-06");
    expect(jun.supplied).toBeCloseTo(HARVEST_KG, 3);
    expect(jun.demand).toBeCloseTo(TOMATO_KG, 4);
    expect(jun.closing).toBeCloseTo(4 * HARVEST_KG - 3 * TOMATO_KG - LETTUCE_KG, 3); // 65.35041 kg

    expect(body.plan.gap).not.toBeNull();
  });

  it("defaults to 12 months from this month in the garden's zone", async () => {
    const res = await getBalance(gardenId, "");
    expect(res.status, res.text).toBe(200);
    expect(res.json.range).toEqual({ from: "2027-02", months: 12 });
    expect(res.json.plan.months).toHaveLength(12);
  });

  it("exports the month table as CSV in the garden's units, unit in each header", async () => {
    const res = await getBalance(gardenId, "?from=2027-03&months=6&format=csv");
    expect(res.status, res.text).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(
      /^attachment; filename="balance-2027-03-6-months\.csv"$/,
    );
    const [header, ...lines] = res.text
      .trim()
      .split(/\r?\n/)
      .map((l) => l.split(","));
    expect(header).toContain("Castings opening (lb)");
    expect(header).toContain("Castings harvested (lb)");
    expect(header).toContain("Leachate collected (gal)");
    expect(header).toContain("Castings coverage (%)");
    expect(lines).toHaveLength(6);
    const col = (name: string) => header!.indexOf(name);
    const april = lines.find((l) => l[0] === "2027-04")!;
    // 20.27088 kg ÷ 0.45359237 kg/lb = 44.69 lb → 45 (whole pounds from 10 lb up).
    expect(april[col("Castings harvested (lb)")]).toBe("45");
    // 4.96835 kg ÷ 0.45359237 = 10.95 lb → 11.
    expect(april[col("Castings demand (lb)")]).toBe("11");
    // 15.30253 kg ÷ 0.45359237 = 33.74 lb → 34.
    expect(april[col("Castings closing (lb)")]).toBe("34");
    const march = lines.find((l) => l[0] === "2027-03")!;
    // 5.79641 kg ÷ 0.45359237 = 12.78 lb → 13; nothing allocated → 0 % covered.
    expect(march[col("Castings shortfall (lb)")]).toBe("13");
    expect(march[col("Castings coverage (%)")]).toBe("0");
    expect(HARVEST_KG / LB).toBeCloseTo(44.69, 2); // the arithmetic above, kept honest
  });

  it.each([
    ["?months=2", "months"],
    ["?months=25", "months"],
    ["?months=abc", "months"],
    ["?months=6.5", "months"],
    ["?from=2027-13", "from"],
    ["?from=2027-3", "from"],
    ["?from=March", "from"],
    ["?format=xlsx", "format"],
  ])("%s → 400 naming %s", async (query, field) => {
    const res = await getBalance(gardenId, query);
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain(field);
  });
});

describe("POST what-if", () => {
  const whatIf = (body: unknown) =>
    call(whatIfRoute.POST, {
      url: url(gardenId, "/what-if"),
      params: { gardenId },
      cookie: owner.cookie,
      body,
    });

  it("a second bin started 2026-12-01 closes March's shortfall, and nothing is written", async () => {
    const current = (await getBalance(gardenId, "?from=2027-03&months=6")).json as BalanceBody;
    const binId = current.plan.bins[0]!.binId;
    const before = await databaseChecksum();
    const res = await whatIf({
      from: "2027-03",
      months: 6,
      changes: [{ kind: "add-bin", likeBinId: binId, startDate: "2026-12-01" }],
    });
    expect(res.status, res.text).toBe(200);
    const body = res.json as WhatIfBody;
    // Same garden as the GET: the current side is today's Balance.
    expect(castings(body.current, "2027-03").shortfall).toBeCloseTo(TOMATO_KG + LETTUCE_KG, 4);
    // 2026-12-01 + 90 d = 2027-03-01 (31 + 31 + 28 = 90), then + 30 d = 03-31: two 20.27 kg
    // harvests in March, the first before the 03-05 feeding of 5.79641 kg, so March is covered.
    const mar = castings(body.changed, "2027-03");
    expect(mar.supplied).toBeCloseTo(2 * HARVEST_KG, 3);
    expect(mar.shortfall).toBeCloseTo(0, 6);
    const diff = body.diff.find((d) => d.month === "2027-03" && d.pool === "castings")!;
    expect(diff.shortfall).toBeCloseTo(-(TOMATO_KG + LETTUCE_KG), 4);
    expect(diff.supplied).toBeCloseTo(2 * HARVEST_KG, 3);
    expect(await databaseChecksum()).toEqual(before);
  });

  it("one extra tray harvested on 2027-03-05 covers March's 5.80 kg shortfall, and nothing is written", async () => {
    const current = (await getBalance(gardenId, "?from=2027-03&months=6")).json as BalanceBody;
    const binId = current.plan.bins[0]!.binId;
    const before = await databaseChecksum();
    const res = await whatIf({
      from: "2027-03",
      months: 6,
      changes: [{ kind: "extra-trays", binId, harvestDates: ["2027-03-05"] }],
    });
    expect(res.status, res.text).toBe(200);
    const body = res.json as WhatIfBody;
    // One tray like the bin's own makes 20.27 kg (32.18 L × 0.9 × 0.7 kg/L, PRODUCT.md),
    // more than March's shortfall of 5.79641 kg: the month is covered.
    const mar = castings(body.changed, "2027-03");
    expect(mar.shortfall).toBeCloseTo(0, 6);
    expect(castings(body.current, "2027-03").shortfall).toBeCloseTo(TOMATO_KG + LETTUCE_KG, 4);
    expect(await databaseChecksum()).toEqual(before);
  });

  it("an extra-trays change for an unknown bin is refused, naming the field", async () => {
    const res = await whatIf({
      changes: [{ kind: "extra-trays", binId: "no-such-bin", harvestDates: ["2027-03-05"] }],
    });
    expect(res.status).toBe(400);
    expect((res.json as { error: { fields: Record<string, string> } }).error.fields).toHaveProperty(
      "changes.0.binId",
    );
  });

  it("halving the tomatoes' rate halves their demand (½ cup × 30 plants)", async () => {
    const before = await databaseChecksum();
    const res = await whatIf({
      from: "2027-03",
      months: 6,
      changes: [
        {
          kind: "planting-amount",
          plantingId: await plantingId("tomato"),
          amount: 0.2365882365 / 2,
        },
      ],
    });
    expect(res.status, res.text).toBe(200);
    // April: 30 × ½ cup = 15 cups × 0.16561 kg = 2.48418 kg.
    expect(castings(res.json.changed, "2027-04").demand).toBeCloseTo(TOMATO_KG / 2, 4);
    expect(await databaseChecksum()).toEqual(before);
  });

  it("refuses changes that make no sense, naming the field", async () => {
    const binId = (await getBalance(gardenId, "?from=2027-03&months=3")).json.plan.bins[0].binId;
    const trays = await whatIf({ changes: [{ kind: "bin-trays", binId, trays: -3 }] });
    expect(trays.status).toBe(400);
    expect(Object.keys(trays.json.error.fields)).toContain("changes.0.trays");
    // Tomatoes are fed by volume (L per plant): 10 per plant is ~42 cups, past the 3 L bound.
    const rate = await whatIf({
      changes: [{ kind: "planting-amount", plantingId: await plantingId("tomato"), amount: 10 }],
    });
    expect(rate.status).toBe(400);
    expect(Object.keys(rate.json.error.fields)).toContain("changes.0.amount");
    const unknown = await whatIf({ changes: [{ kind: "bin-trays", binId: "nope", trays: 5 }] });
    expect(unknown.status).toBe(400);
    expect(Object.keys(unknown.json.error.fields)).toContain("changes.0.binId");
    const months = await whatIf({ months: 30, changes: [{ kind: "bin-trays", binId, trays: 5 }] });
    expect(months.status).toBe(400);
    expect(Object.keys(months.json.error.fields)).toContain("months");
    // A JSON body's numbers are numbers: "6" or [6] is not coerced into one.
    for (const odd of ["6", [6], true]) {
      const res = await whatIf({ months: odd, changes: [{ kind: "bin-trays", binId, trays: 5 }] });
      expect(res.status, JSON.stringify(odd)).toBe(400);
    }
  });

  async function plantingId(crop: string): Promise<string> {
    const db = await getDb();
    const result = (await db.execute(
      sql`select p.id from plantings p join crops c on c.id = p.crop_id where p.garden_id = ${gardenId} and c.name = ${crop}`,
    )) as unknown as { rows: { id: string }[] };
    return result.rows[0]!.id;
  }
});

describe("plan cache", () => {
  it("a logged harvest and a settings change reach the next request (the cache is invalidated)", async () => {
    const first = (await getBalance(gardenId, "?from=2027-03&months=3")).json as BalanceBody;
    expect(castings(first, "2027-03").opening).toBeCloseTo(0, 6);
    // A 12 kg harvest logged on 2027-02-10 (before today) is on the shelf on 03-01:
    // March opens with 12 kg and the 5.79641 kg feeding is served from it.
    await recordHarvest({
      gardenId,
      binId: first.plan.bins[0]!.binId,
      on: "2027-02-10",
      castingsKg: 12,
    });
    const second = (await getBalance(gardenId, "?from=2027-03&months=3")).json as BalanceBody;
    expect(castings(second, "2027-03").opening).toBeCloseTo(12, 6);
    expect(castings(second, "2027-03").shortfall).toBeCloseTo(0, 6);
    expect(second.inputsVersion).toBeGreaterThan(first.inputsVersion);

    const patched = await call(gardenRoute.PATCH, {
      url: url(gardenId, ""),
      params: { gardenId },
      cookie: owner.cookie,
      body: { unitSystem: "metric" },
    });
    expect(patched.status, patched.text).toBe(200);
    const third = (await getBalance(gardenId, "?from=2027-03&months=3")).json as BalanceBody;
    expect(third.settings.unitSystem).toBe("metric");
    expect(third.settings.units.castingsMass).toBe("kg");
  });

  it("a bag of castings entered on the stock page reaches the next Balance", async () => {
    // Regression: POST /lots did not bump the inputs version, so the cached plan
    // kept the old stock. A bought bag is a lot like any other (issue 11, "Stock").
    const before = (await getBalance(gardenId, "?from=2027-03&months=3")).json as BalanceBody;
    const added = await call(lotsRoute.POST, {
      url: url(gardenId, "/lots"),
      params: { gardenId },
      cookie: owner.cookie,
      body: { reason: "bought", material: "castings", producedOn: "2027-02-12", amountSi: 9 },
    });
    expect(added.status, added.text).toBe(201);
    const after = (await getBalance(gardenId, "?from=2027-03&months=3")).json as BalanceBody;
    // Nothing is drawn before March (the first feeding is 03-05): March opens 9 kg higher.
    expect(castings(after, "2027-03").opening - castings(before, "2027-03").opening).toBeCloseTo(
      9,
      6,
    );
    expect(after.inputsVersion).toBeGreaterThan(before.inputsVersion);
  });
});

describe("export and import", () => {
  it("export → import reproduces the same Balance", async () => {
    const exported = await call(exportRoute.GET, {
      url: url(gardenId, "/export"),
      params: { gardenId },
      cookie: owner.cookie,
    });
    expect(exported.status, exported.text).toBe(200);
    expect(exported.headers.get("content-disposition")).toBe(
      'attachment; filename="quince-court-porch-2027-02-15.json"',
    );
    const other = await signUpUser("importer");
    const imported = await call(importRoute.POST, {
      url: "/api/gardens/import",
      body: exported.text,
      cookie: other.cookie,
    });
    expect(imported.status, imported.text).toBe(201);
    const copyId = imported.json.garden.id as string;
    expect(copyId).not.toBe(gardenId);
    const a = (await getBalance(gardenId, "?from=2027-03&months=12")).json as BalanceBody;
    const b = (await getBalance(copyId, "?from=2027-03&months=12", other)).json as BalanceBody;
    const figures = (p: BalanceBody) => p.plan.rows.map(({ explanation: _e, ...r }) => r);
    expect(figures(b)).toEqual(figures(a));
    expect(b.plan.rows.length).toBe(24);
  });

  const importAs = (body: string, headers: Record<string, string> = {}) =>
    call(importRoute.POST, { url: "/api/gardens/import", body, cookie: owner.cookie, headers });

  it("refuses a file that is not JSON", async () => {
    const gardens = await countRows("gardens");
    const res = await importAs("this is not json");
    expect(res.status).toBe(400);
    expect(await countRows("gardens")).toBe(gardens);
  });

  it("refuses a 20 MB file by its size", async () => {
    const body = `{"pad":"${"x".repeat(20_000_000)}"}`;
    const res = await importAs(body, { "content-length": String(Buffer.byteLength(body)) });
    expect([400, 413]).toContain(res.status);
    expect(res.json.error.message).toMatch(/larger/);
  });

  it("answers a file that fails validation with every failing path, and creates nothing", async () => {
    const before = await databaseChecksum();
    const bad = structuredClone(fixture) as Record<string, unknown> & typeof fixture;
    (bad.bins[0] as Record<string, unknown>).trays = -3;
    (bad.plantings[0] as Record<string, unknown>).plantCount = 2.5;
    (bad.settings as Record<string, unknown>).timeZone = "Mars/Olympus";
    const res = await importAs(JSON.stringify(bad));
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toEqual(
      expect.arrayContaining(["bins[0].trays", "plantings[0].plantCount", "settings.timeZone"]),
    );
    expect(await databaseChecksum()).toEqual(before);
  });
});
