import "@/tests/support/integration/env";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { closeHarness } from "@/tests/support/integration/harness";

// Issue 8, item 8: every child row's foreign keys include garden_id, so no row
// can point at a bed, bin, planting, crop, rule or lot of another garden. Each
// case below inserts a child into garden A that names a parent of garden B and
// must be refused by the database itself (not by application code).

afterAll(closeHarness);

type Ids = Record<string, string>;
const a: Ids = {};
const b: Ids = {};

async function one(query: ReturnType<typeof sql>): Promise<string> {
  const db = await getDb();
  const res = (await db.execute(query)) as unknown as { rows: { id: string }[] };
  return res.rows[0]!.id;
}

async function makeGarden(ids: Ids, name: string): Promise<void> {
  ids.garden =
    await one(sql`insert into gardens (name, time_zone, last_spring_frost_md, first_fall_frost_md)
    values (${name}, 'America/Chicago', '04-15', '10-20') returning id`);
  ids.crop =
    await one(sql`insert into crops (garden_id, name, feeder_class, edible, edible_touches_soil)
    values (${ids.garden}, 'Tomato', 'heavy', true, false) returning id`);
  ids.bed = await one(sql`insert into beds (garden_id, name, kind, length_m, width_m)
    values (${ids.garden}, 'North', 'bed', 2.4384, 1.2192) returning id`);
  ids.planting =
    await one(sql`insert into plantings (garden_id, bed_id, crop_id, plant_count, planted_on)
    values (${ids.garden}, ${ids.bed}, ${ids.crop}, 6, '2026-05-10') returning id`);
  ids.rule =
    await one(sql`insert into feeding_rules (garden_id, planting_id, position, material, method, basis,
      amount_measure, amount_si, rrule)
    values (${ids.garden}, ${ids.planting}, 0, 'castings', 'top-dress', 'per-plant', 'mass', 0.1,
      'FREQ=MONTHLY') returning id`);
  ids.bin =
    await one(sql`insert into bins (garden_id, name, tray_length_m, tray_width_m, tray_depth_m,
      tray_count, started_on, starting_worm_count)
    values (${ids.garden}, 'Stack', 0.5334, 0.4318, 0.1397, 4, '2026-02-01', 1500) returning id`);
  ids.event =
    await one(sql`insert into bin_events (garden_id, bin_id, kind, occurred_on, castings_kg)
    values (${ids.garden}, ${ids.bin}, 'harvest', '2026-07-01', 19.958) returning id`);
  ids.lot =
    await one(sql`insert into stock_lots (garden_id, bin_id, source_event_id, material, produced_on,
      initial_amount_si)
    values (${ids.garden}, ${ids.bin}, ${ids.event}, 'castings', '2026-07-01', 19.958) returning id`);
  ids.application =
    await one(sql`insert into applications (garden_id, planting_id, material, method,
      amount_si, applied_on)
    values (${ids.garden}, ${ids.planting}, 'castings', 'top-dress', 0.1, '2026-07-02') returning id`);
}

beforeAll(async () => {
  await makeGarden(a, "Hollis Street Garden");
  await makeGarden(b, "Alder Lane Plot");
});

// Each statement writes a row of garden A whose reference is garden B's.
const crossGardenInserts: [string, () => ReturnType<typeof sql>][] = [
  [
    "a planting in another garden's bed",
    () => sql`insert into plantings (garden_id, bed_id, crop_id, plant_count, planted_on)
      values (${a.garden}, ${b.bed}, ${a.crop}, 1, '2026-05-10')`,
  ],
  [
    "a planting of another garden's crop",
    () => sql`insert into plantings (garden_id, bed_id, crop_id, plant_count, planted_on)
      values (${a.garden}, ${a.bed}, ${b.crop}, 1, '2026-05-10')`,
  ],
  [
    "a rule of another garden's planting",
    () => sql`insert into feeding_rules (garden_id, planting_id, position, material, method, basis,
        amount_measure, amount_si, rrule)
      values (${a.garden}, ${b.planting}, 1, 'tea', 'drench', 'per-plant', 'volume', 0.25,
        'FREQ=WEEKLY;INTERVAL=2')`,
  ],
  [
    "a rule of another garden's crop",
    () => sql`insert into feeding_rules (garden_id, crop_id, position, material, method, basis,
        amount_measure, amount_si, rrule)
      values (${a.garden}, ${b.crop}, 0, 'castings', 'top-dress', 'per-plant', 'mass', 0.1,
        'FREQ=MONTHLY')`,
  ],
  [
    "a bin split off another garden's bin",
    () => sql`insert into bins (garden_id, name, tray_length_m, tray_width_m, tray_depth_m,
        tray_count, started_on, starting_worm_count, parent_bin_id)
      values (${a.garden}, 'Tote', 0.4, 0.3, 0.2, 2, '2026-06-14', 600, ${b.bin})`,
  ],
  [
    "a bin event on another garden's bin",
    () => sql`insert into bin_events (garden_id, bin_id, kind, occurred_on)
      values (${a.garden}, ${b.bin}, 'feeding', '2026-07-03')`,
  ],
  [
    "worms moved into another garden's bin",
    () => sql`insert into worm_moves (garden_id, moved_on, from_bin_id, to_bin_id, worm_count)
      values (${a.garden}, '2026-07-03', ${a.bin}, ${b.bin}, 100)`,
  ],
  [
    "worms moved out of another garden's bin",
    () => sql`insert into worm_moves (garden_id, moved_on, from_bin_id, to_bin_id, worm_count)
      values (${a.garden}, '2026-07-03', ${b.bin}, ${a.bin}, 100)`,
  ],
  [
    "a lot from another garden's bin",
    () => sql`insert into stock_lots (garden_id, bin_id, material, produced_on, initial_amount_si)
      values (${a.garden}, ${b.bin}, 'castings', '2026-07-01', 1)`,
  ],
  [
    "a lot made by another garden's harvest",
    () => sql`insert into stock_lots (garden_id, bin_id, source_event_id, material, produced_on,
        initial_amount_si)
      values (${a.garden}, ${a.bin}, ${b.event}, 'castings', '2026-07-01', 1)`,
  ],
  [
    "an application to another garden's planting",
    () => sql`insert into applications (garden_id, planting_id, material, method, amount_si, applied_on)
      values (${a.garden}, ${b.planting}, 'castings', 'top-dress', 0.1, '2026-07-02')`,
  ],
  [
    "an application drawing from another garden's lot",
    () => sql`insert into application_draws (garden_id, application_id, lot_id, amount_si)
      values (${a.garden}, ${a.application}, ${b.lot}, 0.1)`,
  ],
];

/** The PostgreSQL error code of a failed statement, or "ok" when it succeeded. */
async function outcome(query: ReturnType<typeof sql>): Promise<string> {
  const db = await getDb();
  try {
    await db.execute(query);
    return "ok";
  } catch (error) {
    const e = error as { code?: string; cause?: { code?: string } };
    return e.code ?? e.cause?.code ?? "unknown";
  }
}

describe("garden-scoped foreign keys", () => {
  it.each(crossGardenInserts)("refuse %s (foreign_key_violation)", async (_name, query) => {
    // 23503 = foreign_key_violation (PostgreSQL error codes, Appendix A).
    expect(await outcome(query())).toBe("23503");
  });

  it("accept the same kinds of rows pointing into their own garden", async () => {
    expect(
      await outcome(sql`insert into bin_events (garden_id, bin_id, kind, occurred_on)
        values (${a.garden}, ${a.bin}, 'feeding', '2026-07-03')`),
    ).toBe("ok");
    // A second rule of the planting (castings monthly and tea every two weeks), and a crop's rule.
    expect(
      await outcome(sql`insert into feeding_rules (garden_id, planting_id, position, material, method,
          basis, amount_measure, amount_si, rrule)
        values (${a.garden}, ${a.planting}, 1, 'tea', 'drench', 'per-plant', 'volume', 0.25,
          'FREQ=WEEKLY;INTERVAL=2')`),
    ).toBe("ok");
    expect(
      await outcome(sql`insert into feeding_rules (garden_id, crop_id, position, material, method,
          basis, amount_measure, amount_si, rrule)
        values (${a.garden}, ${a.crop}, 0, 'castings', 'top-dress', 'per-plant', 'mass', 0.1,
          'FREQ=MONTHLY')`),
    ).toBe("ok");
  });

  it("log one planned feeding once per garden; unplanned logs (no key) are not limited", async () => {
    const insert = (garden: string, planting: string, key: string | null) =>
      outcome(sql`insert into applications (garden_id, planting_id, material, method, amount_si,
          applied_on, planned_key)
        values (${garden}, ${planting}, 'castings', 'top-dress', 0.1, '2026-08-01', ${key})`);
    const key = `${a.planting}:castings:2026-08-01`;
    expect(await insert(a.garden!, a.planting!, key)).toBe("ok");
    // 23505 = unique_violation (PostgreSQL error codes, Appendix A).
    expect(await insert(a.garden!, a.planting!, key)).toBe("23505");
    expect(await insert(b.garden!, b.planting!, key)).toBe("ok");
    expect(await insert(a.garden!, a.planting!, null)).toBe("ok");
    expect(await insert(a.garden!, a.planting!, null)).toBe("ok");
  });

  it("let a whole garden be deleted at once (children go with it, the other garden stays)", async () => {
    const db = await getDb();
    expect(await outcome(sql`delete from gardens where id = ${b.garden}`)).toBe("ok");
    const left = (await db.execute(
      sql`select (select count(*)::int from plantings where garden_id = ${b.garden}) as b_plantings,
        (select count(*)::int from feeding_rules where garden_id = ${b.garden}) as b_rules,
        (select count(*)::int from plantings where garden_id = ${a.garden}) as a_plantings,
        (select count(*)::int from feeding_rules where garden_id = ${a.garden}) as a_rules`,
    )) as unknown as { rows: Record<string, number>[] };
    // Garden A keeps its planting with its two rules and its crop's rule.
    expect(left.rows[0]).toEqual({ b_plantings: 0, b_rules: 0, a_plantings: 1, a_rules: 3 });
  });
});
