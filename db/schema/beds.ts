import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  date,
  foreignKey,
  index,
  integer,
  pgTable,
  smallint,
  text,
  unique,
  uuid,
} from "drizzle-orm/pg-core";
import { createdAt, id, quantity } from "./columns";
import {
  amountMeasureEnum,
  basisEnum,
  bedKindEnum,
  feederClassEnum,
  materialEnum,
  methodEnum,
} from "./enums";
import { gardens } from "./gardens";

// Garden scoping: every table a garden owns has a unique (garden_id, id), and
// every reference between them is a composite foreign key (garden_id, x_id) →
// parent (garden_id, id), so the database itself refuses a row that points into
// another garden. Nullable engine parameters mean "the engine's default"
// (lib/engine/defaults.ts); no default is copied into a column.

export const beds = pgTable(
  "beds",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    kind: bedKindEnum("kind").notNull(),
    indoors: boolean("indoors").notNull().default(false),
    lengthM: quantity("length_m"),
    widthM: quantity("width_m"),
    depthM: quantity("depth_m"),
    containerVolumeL: quantity("container_volume_l"),
    notes: text("notes"),
    // Archived beds keep their history (plantings, logged applications) but
    // leave the plan; there is no hard delete while logs refer to a bed.
    archivedOn: date("archived_on"),
    createdAt: createdAt(),
  },
  (t) => [
    index("beds_garden_idx").on(t.gardenId),
    unique("beds_garden_id_id").on(t.gardenId, t.id),
    // A bed is fed per area, a container per volume: each needs its size.
    check(
      "beds_size_for_kind",
      sql`(${t.kind} = 'bed' and ${t.lengthM} > 0 and ${t.widthM} > 0)
        or (${t.kind} = 'container' and ${t.containerVolumeL} > 0)`,
    ),
  ],
);

export const crops = pgTable(
  "crops",
  {
    id: id(),
    // null = part of the shared starter list every garden sees.
    gardenId: uuid("garden_id").references(() => gardens.id, { onDelete: "cascade" }),
    // null only for a garden's own unnamed crop (a scenario planting without a crop name).
    name: text("name"),
    feederClass: feederClassEnum("feeder_class").notNull(),
    // Decides 120 vs 90 days for manure-fed outputs (7 CFR 205.203(c)(1)).
    edibleTouchesSoil: boolean("edible_touches_soil").notNull(),
    edible: boolean("edible").notNull(),
    // Typical days from planting to harvest and spacing between plants; null =
    // not known (a garden's own crop entered without them).
    daysToHarvest: smallint("days_to_harvest"),
    spacingM: quantity("spacing_m"),
    archivedOn: date("archived_on"),
    createdAt: createdAt(),
  },
  (t) => [
    index("crops_garden_idx").on(t.gardenId),
    unique("crops_garden_id_id").on(t.gardenId, t.id),
    check("crops_starter_named", sql`${t.gardenId} is not null or ${t.name} is not null`),
  ],
);

export const plantings = pgTable(
  "plantings",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    bedId: uuid("bed_id").notNull(),
    // A crop of this garden's own list (the starter list is copied in when used),
    // so the composite key below can hold.
    cropId: uuid("crop_id").notNull(),
    // Whole plants: an integer here and in the scenario file.
    plantCount: integer("plant_count").notNull(),
    // Part of the bed this planting covers, for per-area rules; null = whole bed.
    areaM2: quantity("area_m2"),
    plantedOn: date("planted_on").notNull(),
    expectedHarvestOn: date("expected_harvest_on"),
    endedOn: date("ended_on"),
    // 1 is fed first when stock is short; null = the engine's default.
    priority: integer("priority"),
    notes: text("notes"),
    archivedOn: date("archived_on"),
    createdAt: createdAt(),
  },
  (t) => [
    index("plantings_garden_idx").on(t.gardenId),
    index("plantings_bed_idx").on(t.bedId),
    unique("plantings_garden_id_id").on(t.gardenId, t.id),
    check("plantings_plant_count_positive", sql`${t.plantCount} > 0`),
    check("plantings_end_after_start", sql`${t.endedOn} is null or ${t.endedOn} >= ${t.plantedOn}`),
    foreignKey({
      name: "plantings_bed_same_garden_fk",
      columns: [t.gardenId, t.bedId],
      foreignColumns: [beds.gardenId, beds.id],
    }).onDelete("cascade"),
    foreignKey({
      name: "plantings_crop_same_garden_fk",
      columns: [t.gardenId, t.cropId],
      foreignColumns: [crops.gardenId, crops.id],
    }),
  ],
);

// Feeding rules: each belongs to exactly one owner, a crop (its defaults) or a
// planting (its own rules, which replace the crop's: a planting with none
// inherits them; a crop with none has the engine's default for its feeder
// class). An owner holds several (castings monthly and tea every two weeks),
// in `position` order. The owner keys are composite with garden_id, so a rule
// can only belong to a crop or planting of its own garden, and it goes with
// its owner. The shared starter crops carry no rules (garden_id is required).
export const feedingRules = pgTable(
  "feeding_rules",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    plantingId: uuid("planting_id"),
    cropId: uuid("crop_id"),
    // Order within the owner (0, 1, …): the first rule of a material keeps the
    // plain stable feeding id (lib/engine/plan/demand.ts).
    position: smallint("position").notNull(),
    material: materialEnum("material").notNull(),
    method: methodEnum("method").notNull(),
    basis: basisEnum("basis").notNull(),
    // What amount_si measures per basis unit (plant, m² of bed, L of container):
    // kg ("mass"), L ("volume"; liquids as applied), or percent 0–100 of the mix volume.
    amountMeasure: amountMeasureEnum("amount_measure").notNull(),
    amountSi: quantity("amount_si").notNull(),
    // Leachate: parts of water per part of leachate; null = the engine's default.
    dilutionWaterParts: quantity("dilution_water_parts"),
    // Tea: litres of castings per litre of water; null = the garden's setting.
    teaCastingsPerWater: quantity("tea_castings_per_water"),
    // RFC 5545 RRULE body, e.g. "FREQ=MONTHLY;BYMONTHDAY=1".
    rrule: text("rrule").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index("feeding_rules_garden_idx").on(t.gardenId),
    unique("feeding_rules_garden_id_id").on(t.gardenId, t.id),
    unique("feeding_rules_planting_position").on(t.plantingId, t.position),
    unique("feeding_rules_crop_position").on(t.cropId, t.position),
    check("feeding_rules_one_owner", sql`num_nonnulls(${t.plantingId}, ${t.cropId}) = 1`),
    check("feeding_rules_position_non_negative", sql`${t.position} >= 0`),
    check("feeding_rules_amount_non_negative", sql`${t.amountSi} >= 0`),
    check(
      "feeding_rules_percent_of_mix",
      sql`(${t.basis} = 'percent-of-mix') = (${t.amountMeasure} = 'percent-of-mix')`,
    ),
    check(
      "feeding_rules_liquids_by_volume",
      sql`${t.material} = 'castings' or ${t.amountMeasure} = 'volume'`,
    ),
    foreignKey({
      name: "feeding_rules_planting_same_garden_fk",
      columns: [t.gardenId, t.plantingId],
      foreignColumns: [plantings.gardenId, plantings.id],
    }).onDelete("cascade"),
    foreignKey({
      name: "feeding_rules_crop_same_garden_fk",
      columns: [t.gardenId, t.cropId],
      foreignColumns: [crops.gardenId, crops.id],
    }).onDelete("cascade"),
  ],
);
