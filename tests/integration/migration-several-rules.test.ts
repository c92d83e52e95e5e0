import fs from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

// Migration 0007 (several feeding rules per planting and crop) must carry every
// rule a database already holds onto its owner, not only apply to an empty
// database. Its data step is hand-written; if the migration is regenerated
// without it, these rules are lost and this test fails.

const folder = path.join(process.cwd(), "db", "migrations");
const db = new PGlite();

async function apply(file: string): Promise<void> {
  const text = fs.readFileSync(path.join(folder, file), "utf8");
  for (const statement of text.split("--> statement-breakpoint"))
    if (statement.trim()) await db.exec(statement);
}

async function rows<T>(query: string): Promise<T[]> {
  return (await db.query<T>(query)).rows;
}

const G = "00000000-0000-4000-8000-0000000000a1";
const BED = "00000000-0000-4000-8000-0000000000b1";
const TOMATO = "00000000-0000-4000-8000-0000000000c1";
const KALE = "00000000-0000-4000-8000-0000000000c2";
const OWN = "00000000-0000-4000-8000-0000000000d1";
const INHERITS = "00000000-0000-4000-8000-0000000000d2";
const SHARES = "00000000-0000-4000-8000-0000000000d3";
const TEA_RULE = "00000000-0000-4000-8000-0000000000f1";
const CROP_RULE = "00000000-0000-4000-8000-0000000000f2";
const ORPHAN_RULE = "00000000-0000-4000-8000-0000000000f3";

beforeAll(async () => {
  for (const file of fs
    .readdirSync(folder)
    .filter((f) => f.endsWith(".sql"))
    .sort())
    if (file < "0007") await apply(file);
  // Rows as the schema of migrations 0000–0006 holds them: one rule per owner,
  // pointed at by crops.feeding_rule_id and plantings.feeding_rule_id.
  await db.exec(`
    insert into gardens (id, name, time_zone, last_spring_frost, first_fall_frost)
      values ('${G}', 'Hollis Street Garden', 'America/Chicago', '2026-04-22', '2026-10-18');
    insert into feeding_rules (id, garden_id, material, method, basis, amount_measure, amount_si,
        tea_castings_per_water, rrule)
      values ('${TEA_RULE}', '${G}', 'tea', 'drench', 'per-plant', 'volume', 0.25, 0.2, 'FREQ=WEEKLY;INTERVAL=2'),
             ('${CROP_RULE}', '${G}', 'castings', 'top-dress', 'per-plant', 'mass', 0.12, null, 'FREQ=MONTHLY'),
             ('${ORPHAN_RULE}', '${G}', 'castings', 'top-dress', 'per-plant', 'volume', 0.5, null, 'FREQ=MONTHLY');
    insert into crops (id, garden_id, name, feeder_class, edible, edible_touches_soil, feeding_rule_id)
      values ('${TOMATO}', '${G}', 'Tomato', 'heavy', true, false, '${CROP_RULE}'),
             ('${KALE}', '${G}', 'Kale', 'medium', true, false, null);
    insert into beds (id, garden_id, name, kind, length_m, width_m)
      values ('${BED}', '${G}', 'North raised bed', 'bed', 2.4384, 1.2192);
    insert into plantings (id, garden_id, bed_id, crop_id, plant_count, planted_on, feeding_rule_id)
      values ('${OWN}', '${G}', '${BED}', '${KALE}', 4, '2026-05-09', '${TEA_RULE}'),
             ('${INHERITS}', '${G}', '${BED}', '${TOMATO}', 6, '2026-05-09', null),
             ('${SHARES}', '${G}', '${BED}', '${TOMATO}', 2, '2026-05-20', '${CROP_RULE}');
  `);
  await apply("0007_several_rules_per_planting.sql");
});

afterAll(() => db.close());

type RuleRow = {
  planting_id: string | null;
  crop_id: string | null;
  position: number;
  material: string;
  amount_measure: string;
  amount_si: number;
  tea_castings_per_water: number | null;
  rrule: string;
};
const ruleRows = () =>
  rows<RuleRow>(`select planting_id, crop_id, position, material, amount_measure, amount_si,
    tea_castings_per_water, rrule from feeding_rules order by planting_id nulls last, crop_id`);

describe("migration 0007 over existing rows", () => {
  it("moves each planting's and crop's rule onto its owner as its first rule, every field kept", async () => {
    const all = await ruleRows();
    expect(all).toEqual(
      [
        {
          planting_id: OWN,
          crop_id: null,
          position: 0,
          material: "tea",
          amount_measure: "volume",
          amount_si: 0.25,
          tea_castings_per_water: 0.2,
          rrule: "FREQ=WEEKLY;INTERVAL=2",
        },
        {
          planting_id: SHARES,
          crop_id: null,
          position: 0,
          material: "castings",
          amount_measure: "mass",
          amount_si: 0.12,
          tea_castings_per_water: null,
          rrule: "FREQ=MONTHLY",
        },
        {
          planting_id: null,
          crop_id: TOMATO,
          position: 0,
          material: "castings",
          amount_measure: "mass",
          amount_si: 0.12,
          tea_castings_per_water: null,
          rrule: "FREQ=MONTHLY",
        },
      ].sort((a, b) => (a.planting_id ?? "z").localeCompare(b.planting_id ?? "z")),
    );
  });

  it("leaves a planting that inherited, and a crop without a rule, with no rules; drops a rule no one held", async () => {
    expect(
      await rows(`select count(*)::int as n from feeding_rules where planting_id = '${INHERITS}'`),
    ).toEqual([{ n: 0 }]);
    expect(
      await rows(`select count(*)::int as n from feeding_rules where crop_id = '${KALE}'`),
    ).toEqual([{ n: 0 }]);
    expect(
      await rows(`select count(*)::int as n from feeding_rules where id = '${ORPHAN_RULE}'`),
    ).toEqual([{ n: 0 }]);
  });

  it("refuses a rule for a planting of another garden, and one with two owners", async () => {
    const other = "00000000-0000-4000-8000-0000000000a2";
    await db.exec(`insert into gardens (id, name, time_zone, last_spring_frost, first_fall_frost)
      values ('${other}', 'Elsewhere', 'UTC', '2026-04-22', '2026-10-18')`);
    await expect(
      db.exec(`insert into feeding_rules (garden_id, planting_id, position, material, method, basis,
        amount_measure, amount_si, rrule) values ('${other}', '${OWN}', 1, 'castings', 'top-dress',
        'per-plant', 'volume', 0.5, 'FREQ=MONTHLY')`),
    ).rejects.toThrow(/feeding_rules_planting_same_garden_fk/);
    await expect(
      db.exec(`insert into feeding_rules (garden_id, planting_id, crop_id, position, material, method,
        basis, amount_measure, amount_si, rrule) values ('${G}', '${OWN}', '${KALE}', 1, 'castings',
        'top-dress', 'per-plant', 'volume', 0.5, 'FREQ=MONTHLY')`),
    ).rejects.toThrow(/feeding_rules_one_owner/);
  });
});
