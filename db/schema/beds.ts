import { boolean, date, index, integer, pgTable, text, uuid } from "drizzle-orm/pg-core";
import { createdAt, id, quantity } from "./columns";
import { basisEnum, bedKindEnum, feederClassEnum, materialEnum, methodEnum } from "./enums";
import { gardens } from "./gardens";

// A feeding rule is owned by a crop (its default) or by a planting (an override).
export const feedingRules = pgTable(
  "feeding_rules",
  {
    id: id(),
    gardenId: uuid("garden_id").references(() => gardens.id, { onDelete: "cascade" }),
    material: materialEnum("material").notNull(),
    method: methodEnum("method").notNull(),
    basis: basisEnum("basis").notNull(),
    // SI per basis unit: kg (castings) or L (liquids) per plant, per m², per L of
    // container; or a percentage of mix volume for "percent-of-mix".
    amountSi: quantity("amount_si").notNull(),
    // RFC 5545 RRULE body, e.g. "FREQ=MONTHLY;BYMONTHDAY=1".
    rrule: text("rrule").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("feeding_rules_garden_idx").on(t.gardenId)],
);

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
    createdAt: createdAt(),
  },
  (t) => [index("beds_garden_idx").on(t.gardenId)],
);

export const crops = pgTable(
  "crops",
  {
    id: id(),
    // null = part of the shared starter list every garden sees.
    gardenId: uuid("garden_id").references(() => gardens.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    feederClass: feederClassEnum("feeder_class").notNull(),
    // Decides 120 vs 90 days for manure-fed outputs (7 CFR 205.203(c)(1)).
    edibleTouchesSoil: boolean("edible_touches_soil").notNull().default(false),
    edible: boolean("edible").notNull().default(true),
    feedingRuleId: uuid("feeding_rule_id").references(() => feedingRules.id, {
      onDelete: "set null",
    }),
    createdAt: createdAt(),
  },
  (t) => [index("crops_garden_idx").on(t.gardenId)],
);

export const plantings = pgTable(
  "plantings",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    bedId: uuid("bed_id")
      .notNull()
      .references(() => beds.id, { onDelete: "cascade" }),
    cropId: uuid("crop_id")
      .notNull()
      .references(() => crops.id, { onDelete: "restrict" }),
    plantCount: integer("plant_count").notNull().default(1),
    // Part of the bed this planting covers, for per-area rules; null = whole bed.
    areaM2: quantity("area_m2"),
    plantedOn: date("planted_on").notNull(),
    expectedHarvestOn: date("expected_harvest_on"),
    endedOn: date("ended_on"),
    // 1 is fed first when stock is short.
    priority: integer("priority").notNull().default(3),
    feedingRuleId: uuid("feeding_rule_id").references(() => feedingRules.id, {
      onDelete: "set null",
    }),
    notes: text("notes"),
    createdAt: createdAt(),
  },
  (t) => [index("plantings_garden_idx").on(t.gardenId), index("plantings_bed_idx").on(t.bedId)],
);
