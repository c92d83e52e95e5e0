import {
  boolean,
  date,
  index,
  integer,
  pgTable,
  smallint,
  text,
  uuid,
  type AnyPgColumn,
} from "drizzle-orm/pg-core";
import { users } from "./accounts";
import { createdAt, id, quantity } from "./columns";
import { binEventKindEnum, binKindEnum, siUnitEnum, stockMaterialEnum } from "./enums";
import { gardens } from "./gardens";

export const bins = pgTable(
  "bins",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    kind: binKindEnum("kind").notNull().default("stacked-tray"),
    trayLengthM: quantity("tray_length_m").notNull(),
    trayWidthM: quantity("tray_width_m").notNull(),
    trayDepthM: quantity("tray_depth_m").notNull(),
    trayCount: smallint("tray_count").notNull(),
    startedOn: date("started_on").notNull(),
    rotationDays: smallint("rotation_days").notNull().default(30),
    processingDays: smallint("processing_days").notNull().default(90),
    fillFraction: quantity("fill_fraction").notNull().default(0.9),
    bulkDensityKgPerL: quantity("bulk_density_kg_per_l").notNull().default(0.7),
    // Months (1–12) the bin sits idle, e.g. an outdoor bin in winter.
    dormantMonths: smallint("dormant_months").array().notNull().default([]),
    indoors: boolean("indoors").notNull().default(true),
    manureFeedstock: boolean("manure_feedstock").notNull().default(false),
    startingWormCount: integer("starting_worm_count").notNull(),
    leachateEstimateLPerWeek: quantity("leachate_estimate_l_per_week").notNull().default(0.5),
    parentBinId: uuid("parent_bin_id").references((): AnyPgColumn => bins.id, {
      onDelete: "set null",
    }),
    retiredOn: date("retired_on"),
    createdAt: createdAt(),
  },
  (t) => [index("bins_garden_idx").on(t.gardenId)],
);

export const binEvents = pgTable(
  "bin_events",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    binId: uuid("bin_id")
      .notNull()
      .references(() => bins.id, { onDelete: "cascade" }),
    kind: binEventKindEnum("kind").notNull(),
    occurredOn: date("occurred_on").notNull(),
    foodKg: quantity("food_kg"),
    castingsKg: quantity("castings_kg"),
    liquidL: quantity("liquid_l"),
    wormCount: integer("worm_count"),
    targetBinId: uuid("target_bin_id").references(() => bins.id, { onDelete: "set null" }),
    temperatureC: quantity("temperature_c"),
    moisturePercent: quantity("moisture_percent"),
    note: text("note"),
    loggedBy: uuid("logged_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("bin_events_garden_idx").on(t.gardenId),
    index("bin_events_bin_day_idx").on(t.binId, t.occurredOn),
  ],
);

export const stockLots = pgTable(
  "stock_lots",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    binId: uuid("bin_id").references(() => bins.id, { onDelete: "set null" }),
    sourceEventId: uuid("source_event_id").references(() => binEvents.id, {
      onDelete: "set null",
    }),
    material: stockMaterialEnum("material").notNull(),
    producedOn: date("produced_on").notNull(),
    initialAmountSi: quantity("initial_amount_si").notNull(),
    remainingAmountSi: quantity("remaining_amount_si").notNull(),
    siUnit: siUnitEnum("si_unit").notNull(),
    manureFeedstock: boolean("manure_feedstock").notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [index("stock_lots_garden_idx").on(t.gardenId)],
);
