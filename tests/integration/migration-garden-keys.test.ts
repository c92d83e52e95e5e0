import fs from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

// Migration 0002 (garden-scoped keys) must apply to a database that already
// holds the old demo seed's kind of rows, not only to an empty one: developers'
// data directories have them. Its hand-written data steps (starter crops copied
// into the garden, worm moves and lot draws carried over) are what make the new
// keys hold; if the migration is regenerated without them this test fails.

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
const STARTER_CROP = "00000000-0000-4000-8000-0000000000c1";
const STARTER_RULE = "00000000-0000-4000-8000-0000000000f1";
const PLANTING = "00000000-0000-4000-8000-0000000000d1";
const STACK = "00000000-0000-4000-8000-0000000000e1";
const TOTE = "00000000-0000-4000-8000-0000000000e2";
const HARVEST = "00000000-0000-4000-8000-000000000011";
const LOT = "00000000-0000-4000-8000-000000000021";

beforeAll(async () => {
  await apply("0000_init.sql");
  await apply("0001_ended_sessions.sql");
  // Rows as the old seed wrote them (columns of migrations 0000–0001).
  await db.exec(`
    insert into gardens (id, name, time_zone, last_spring_frost, first_fall_frost)
      values ('${G}', 'Hollis Street Garden', 'America/Chicago', '2026-04-22', '2026-10-18');
    insert into feeding_rules (id, garden_id, material, method, basis, amount_si, rrule)
      values ('${STARTER_RULE}', null, 'castings', 'top-dress', 'per-plant', 0.165612, 'FREQ=MONTHLY;BYMONTHDAY=1');
    insert into crops (id, garden_id, name, feeder_class, feeding_rule_id)
      values ('${STARTER_CROP}', null, 'Tomato', 'heavy', '${STARTER_RULE}');
    insert into beds (id, garden_id, name, kind, length_m, width_m)
      values ('${BED}', '${G}', 'North raised bed', 'bed', 2.4384, 1.2192);
    insert into plantings (id, garden_id, bed_id, crop_id, plant_count, planted_on)
      values ('${PLANTING}', '${G}', '${BED}', '${STARTER_CROP}', 6, '2026-05-09');
    insert into bins (id, garden_id, name, tray_length_m, tray_width_m, tray_depth_m, tray_count, started_on, starting_worm_count)
      values ('${STACK}', '${G}', 'Cedar stack', 0.5334, 0.4318, 0.1397, 4, '2026-02-07', 1500),
             ('${TOTE}', '${G}', 'Porch tote', 0.4064, 0.3048, 0.1524, 2, '2026-06-14', 400);
    insert into bin_events (garden_id, bin_id, kind, occurred_on, worm_count, target_bin_id)
      values ('${G}', '${STACK}', 'worms-moved', '2026-06-14', 400, '${TOTE}');
    insert into bin_events (id, garden_id, bin_id, kind, occurred_on, castings_kg)
      values ('${HARVEST}', '${G}', '${STACK}', 'harvest', '2026-09-05', 18.6);
    insert into stock_lots (id, garden_id, bin_id, source_event_id, material, produced_on,
        initial_amount_si, remaining_amount_si, si_unit)
      values ('${LOT}', '${G}', '${STACK}', '${HARVEST}', 'castings', '2026-09-05', 18.6, 17.606, 'kg');
    insert into applications (garden_id, planting_id, bed_id, lot_id, material, method, amount_si, si_unit, applied_on)
      values ('${G}', '${PLANTING}', '${BED}', '${LOT}', 'castings', 'top-dress', 0.993672, 'kg', '2026-09-01');
  `);
  await apply("0002_garden_scoped_keys.sql");
});

afterAll(() => db.close());

describe("migration 0002 over existing rows", () => {
  it("moves each planting onto a copy of its starter crop in its own garden", async () => {
    expect(
      await rows(`select c.garden_id, c.name, c.feeder_class from plantings p
        join crops c on c.id = p.crop_id`),
    ).toEqual([{ garden_id: G, name: "Tomato", feeder_class: "heavy" }]);
  });

  it("leaves starter crops without rules (the engine's default applies) and no shared rules", async () => {
    expect(await rows(`select feeding_rule_id from crops where garden_id is null`)).toEqual([
      { feeding_rule_id: null },
    ]);
    expect(await rows(`select count(*)::int as n from feeding_rules`)).toEqual([{ n: 0 }]);
  });

  it("turns the worm split into a worm move and an application's lot into its draw", async () => {
    expect(
      await rows(`select moved_on::text, from_bin_id, to_bin_id, worm_count from worm_moves`),
    ).toEqual([{ moved_on: "2026-06-14", from_bin_id: STACK, to_bin_id: TOTE, worm_count: 400 }]);
    expect(await rows(`select lot_id, amount_si from application_draws`)).toEqual([
      { lot_id: LOT, amount_si: 0.993672 },
    ]);
    // What remains is now derived: 18.6 − 0.993672 = 17.606328 kg.
    const [left] = await rows<{ remaining: number }>(
      `select l.initial_amount_si - coalesce(sum(d.amount_si), 0) as remaining
       from stock_lots l left join application_draws d on d.lot_id = l.id group by l.id`,
    );
    expect(left!.remaining).toBeCloseTo(17.606328, 9);
  });
});
