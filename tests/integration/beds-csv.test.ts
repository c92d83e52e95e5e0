import "@/tests/support/integration/env";
import { count, eq } from "drizzle-orm";
import { parse } from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as bedsExport from "@/app/api/gardens/[gardenId]/beds/export/route";
import * as bedsImport from "@/app/api/gardens/[gardenId]/beds/import/route";
import * as bedsRoute from "@/app/api/gardens/[gardenId]/beds/route";
import { getDb } from "@/db";
import { beds, plantings } from "@/db/schema";
import { starterCropId } from "@/tests/support/integration/beds-fixtures";
import {
  call,
  closeHarness,
  cookieFor,
  makeGardenWithRoles,
  snapshotDb,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// The beds-and-plantings CSV (issue 10, item 6): template, import all or
// nothing with row-and-column errors, export with formula cells neutralised.

const HEADER =
  "Bed,Kind,Indoors,Length (ft),Width (ft),Depth (in),Volume (gal),Bed notes,Crop,Plants,Planted on,Expected end,Priority,Planting notes";

let world: GardenWorld;
let grower: string;
const url = (path: string, w = world) => `/api/gardens/${w.gardenId}/${path}`;

async function importCsv(csv: string, w = world, cookie = grower) {
  return call(bedsImport.POST, {
    url: url("beds/import", w),
    params: { gardenId: w.gardenId },
    cookie,
    body: { csv },
  });
}

async function counts(gardenId: string) {
  const db = await getDb();
  const [b] = await db.select({ n: count() }).from(beds).where(eq(beds.gardenId, gardenId));
  const [p] = await db
    .select({ n: count() })
    .from(plantings)
    .where(eq(plantings.gardenId, gardenId));
  return { beds: b!.n, plantings: p!.n };
}

/** `bedsN` beds of 8 × 4 ft, each with `perBed` rows of one tomato or one pepper. */
function bigCsv(bedsN: number, perBed: number, tag: string): string {
  const lines = [HEADER];
  for (let b = 1; b <= bedsN; b++)
    for (let i = 0; i < perBed; i++)
      lines.push(
        `${tag} bed ${b},bed,no,8,4,,,,${i % 2 ? "Pepper" : "Tomato"},1,2027-05-${String((i % 28) + 1).padStart(2, "0")},,normal,`,
      );
  return lines.join("\n");
}

beforeAll(async () => {
  world = await makeGardenWithRoles();
  grower = await cookieFor(world.grower);
  await starterCropId("Tomato");
});
afterAll(closeHarness);

describe("beds CSV import", () => {
  it("imports the downloadable template: an 8 × 4 ft bed is 2.4384 × 1.2192 m, a 5 gal pot 18.92705892 L (NIST HB 44 App. C)", async () => {
    const w = await makeGardenWithRoles(world);
    const template = await call(bedsExport.GET, {
      url: url("beds/export?template=1", w),
      params: { gardenId: w.gardenId },
      cookie: await cookieFor(w.viewer),
    });
    expect(template.status).toBe(200);
    expect(template.text.split(/\r?\n/)[0]).toBe(HEADER);
    const res = await importCsv(template.text, w, await cookieFor(w.grower));
    expect(res.status, res.text).toBe(201);
    expect(res.json.imported).toEqual({ beds: 2, plantings: 3 });
    const list = await call(bedsRoute.GET, {
      url: url("beds", w),
      params: { gardenId: w.gardenId },
      cookie: await cookieFor(w.grower),
    });
    const bed = list.json.beds.find((b: { name: string }) => b.name === "Raised bed 1");
    const pot = list.json.beds.find((b: { name: string }) => b.name === "Porch pot");
    expect(bed.lengthM).toBeCloseTo(2.4384, 9);
    expect(bed.widthM).toBeCloseTo(1.2192, 9);
    expect(pot.containerVolumeL).toBeCloseTo(18.92705892, 6);
    expect(bed.plantingCount).toBe(2);
  });

  it("imports 2,000 rows (200 beds × 10 plantings) in one request", async () => {
    const before = await counts(world.gardenId);
    const started = performance.now();
    const res = await importCsv(bigCsv(200, 10, "Big"));
    console.log(`[beds csv] 2,000 rows imported in ${Math.round(performance.now() - started)} ms`);
    expect(res.status, res.text.slice(0, 300)).toBe(201);
    expect(res.json.imported).toEqual({ beds: 200, plantings: 2000 });
    const after = await counts(world.gardenId);
    expect(after.beds - before.beds).toBe(200);
    expect(after.plantings - before.plantings).toBe(2000);
  });

  it("one bad row among 2,000 imports nothing and names its row and column", async () => {
    const lines = bigCsv(200, 10, "Bad").split("\n");
    // Line index 1500 is spreadsheet row 1501 (row 1 is the header).
    lines[1500] = lines[1500]!.replace(/Tomato|Pepper/, "Moonflower melon");
    const before = await snapshotDb();
    const res = await importCsv(lines.join("\n"));
    expect(res.status).toBe(400);
    expect(res.json.error.message).toContain("Nothing was imported");
    expect(res.json.error.message).toContain("Row 1501, Crop");
    expect(res.json.error.fields.csv).toMatch(
      /^Row 1501, Crop: "Moonflower melon" is not on this garden's crop list/,
    );
    expect(await snapshotDb()).toBe(before);
  });

  const refused: [string, string, RegExp][] = [
    [
      "wrong headers",
      "Bed,Type,Length,Width\nA,bed,8,4",
      /Row 1, Type: "Type" is not a column we know/,
    ],
    [
      "a size header without its unit",
      HEADER.replace("Length (ft)", "Length"),
      /Row 1, Length: Say the unit in the header/,
    ],
    [
      "mixed units (metres in a feet column)",
      `${HEADER}\nM1,bed,no,8,4,,,,Tomato,2,2027-05-01,,,\nM2,bed,no,2.4 m,1.2,,,,Tomato,2,2027-05-01,,,`,
      /Row 3, Length \(ft\): "2\.4 m" is in m but this column is in ft/,
    ],
    [
      "an unknown crop",
      `${HEADER}\nU1,bed,no,8,4,,,,Moonflower melon,2,2027-05-01,,,`,
      /Row 2, Crop: "Moonflower melon" is not on this garden's crop list/,
    ],
    [
      "a formula-looking cell",
      `${HEADER}\n"=HYPERLINK(""http://x.example"",""win"")",bed,no,8,4,,,,Tomato,2,2027-05-01,,,`,
      /Row 2, Bed: .* starts like a spreadsheet formula/,
    ],
    [
      "end before start",
      `${HEADER}\nE1,bed,no,8,4,,,,Tomato,2,2027-05-01,2027-04-01,,`,
      /Row 2, Expected end: The expected end must not be before the planting date/,
    ],
    ["zero size", `${HEADER}\nZ1,bed,no,0,4,,,,Tomato,2,2027-05-01,,,`, /Row 2, Length \(ft\):/],
    [
      "10,000 tomatoes in a 2 ft² bed",
      `${HEADER}\nT1,bed,no,2,1,,,,Tomato,10000,2027-05-01,,,`,
      /Row 2, Plants: .*times its area at the usual spacing/,
    ],
    [
      "rows of one bed that disagree",
      `${HEADER}\nD1,bed,no,8,4,,,,Tomato,2,2027-05-01,,,\nD1,bed,no,6,4,,,,Pepper,2,2027-05-01,,,`,
      /Row 3, Length \(ft\): Row 2 gives 8 here/,
    ],
  ];
  it.each(refused)(
    "refuses %s with a 400 naming row and column, writing nothing",
    async (_name, csv, message) => {
      const before = await snapshotDb();
      const res = await importCsv(csv);
      expect(res.status, res.text).toBe(400);
      expect(res.json.error.fields.csv).toMatch(message);
      expect(await snapshotDb()).toBe(before);
    },
  );

  it("skips blank lines and still names rows as the spreadsheet numbers them", async () => {
    const csv = `${HEADER}\n\nB1,bed,no,8,4,,,,Tomato,2,2027-05-01,,,\n,,,,,,,,,,,,,\nB1,bed,no,8,4,,,,Pepper,two,2027-05-01,,,\n`;
    const res = await importCsv(csv);
    expect(res.status).toBe(400);
    expect(res.json.error.fields.csv).toMatch(/^Row 5, Plants: "two" is not a whole number/);
    const ok = await importCsv(csv.replace(",two,", ",2,"));
    expect(ok.status, ok.text).toBe(201);
    expect(ok.json.imported).toEqual({ beds: 1, plantings: 2 });
  });

  it("refuses a 10 MB file at the route's byte limit (413), writing nothing", async () => {
    const before = await snapshotDb();
    const res = await importCsv(`${HEADER}\n${"x".repeat(10_000_000)}`);
    expect(res.status).toBe(413);
    expect(await snapshotDb()).toBe(before);
  });

  it("adds plantings to a bed the garden has when its size cells are blank or match, refuses a different size", async () => {
    await importCsv(`${HEADER}\nKeep,bed,no,8,4,,,,Tomato,2,2027-05-01,,,`);
    const again = await importCsv(
      `${HEADER}\nKeep,,,,,,,,Pepper,2,2027-05-01,,,\nkeep,bed,no,8.000,4,,,,Basil,2,2027-05-01,,,`,
    );
    expect(again.status, again.text).toBe(201);
    expect(again.json.imported).toEqual({ beds: 0, plantings: 2 });
    const different = await importCsv(`${HEADER}\nKeep,bed,no,10,4,,,,Pepper,2,2027-05-01,,,`);
    expect(different.status).toBe(400);
    expect(different.json.error.fields.csv).toMatch(
      /^Row 2, Length \(ft\): 10 ft differs from the bed "Keep"/,
    );
  });
});

describe("beds CSV export", () => {
  it("writes the import's format, neutralises formula-looking cells, and reads back into another garden unchanged", async () => {
    const w = await makeGardenWithRoles(world);
    const cookie = await cookieFor(w.grower);
    const made = await importCsv(
      `${HEADER}\nNorth,bed,no,8,4,10,,"'=SUM(A1:A9)",Tomato,6,2027-05-01,2027-08-01,high,"@mention me"`.replace(
        '"@mention me"',
        '"\'@mention me"',
      ),
      w,
      cookie,
    );
    expect(made.status, made.text).toBe(201);
    const res = await call(bedsExport.GET, {
      url: url("beds/export", w),
      params: { gardenId: w.gardenId },
      cookie: await cookieFor(w.viewer),
    });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    const rows = parse<string[]>(res.text.trim()).data;
    expect(rows[0]!.join(",")).toBe(HEADER);
    // OWASP CSV injection: a cell starting with = + - @ is prefixed with ' so a spreadsheet shows it as text.
    expect(rows[1]).toEqual([
      "North",
      "bed",
      "no",
      "8",
      "4",
      "10",
      "",
      "'=SUM(A1:A9)",
      "Tomato",
      "6",
      "2027-05-01",
      "2027-08-01",
      "high",
      "'@mention me",
    ]);
    const other = await makeGardenWithRoles(world);
    const back = await importCsv(res.text, other, await cookieFor(other.grower));
    expect(back.status, back.text).toBe(201);
    const again = await call(bedsExport.GET, {
      url: url("beds/export", other),
      params: { gardenId: other.gardenId },
      cookie: await cookieFor(other.grower),
    });
    expect(again.text).toBe(res.text);
  });
});
