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
import { users } from "./accounts";
import { createdAt, id, quantity } from "./columns";
import {
  binEventKindEnum,
  binKindEnum,
  stockAdjustmentReasonEnum,
  stockMaterialEnum,
} from "./enums";
import { gardens } from "./gardens";

// See beds.ts for the garden-scoping rule (composite keys) and why the engine
// parameters below are nullable without defaults.

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
    // Engine parameters: null = the engine's default.
    rotationDays: smallint("rotation_days"),
    processingDays: smallint("processing_days"),
    fillFraction: quantity("fill_fraction"),
    bulkDensityKgPerL: quantity("bulk_density_kg_per_l"),
    leachateEstimateLPerWeek: quantity("leachate_estimate_l_per_week"),
    // Food eaten per day as a fraction of worm mass.
    intakeFractionPerDay: quantity("intake_fraction_per_day"),
    densityCeilingKgPerM2: quantity("density_ceiling_kg_per_m2"),
    // Months (1–12) the bin sits idle, e.g. an outdoor bin in winter.
    dormantMonths: smallint("dormant_months").array().notNull().default([]),
    indoors: boolean("indoors").notNull().default(true),
    manureFeedstock: boolean("manure_feedstock").notNull().default(false),
    // Worms put in on started_on; later changes are worm_moves.
    startingWormCount: integer("starting_worm_count").notNull(),
    // Days between drains of the base; null = the engine's default.
    drainIntervalDays: smallint("drain_interval_days"),
    parentBinId: uuid("parent_bin_id"),
    retiredOn: date("retired_on"),
    createdAt: createdAt(),
  },
  (t) => [
    index("bins_garden_idx").on(t.gardenId),
    unique("bins_garden_id_id").on(t.gardenId, t.id),
    check("bins_tray_count_positive", sql`${t.trayCount} > 0`),
    foreignKey({
      name: "bins_parent_same_garden_fk",
      columns: [t.gardenId, t.parentBinId],
      foreignColumns: [t.gardenId, t.id],
    }),
  ],
);

export const binEvents = pgTable(
  "bin_events",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    binId: uuid("bin_id").notNull(),
    kind: binEventKindEnum("kind").notNull(),
    occurredOn: date("occurred_on").notNull(),
    foodKg: quantity("food_kg"),
    castingsKg: quantity("castings_kg"),
    // What the forecast said for this harvest when it was logged (calibration).
    predictedCastingsKg: quantity("predicted_castings_kg"),
    liquidL: quantity("liquid_l"),
    // A harvest measured by volume (L) as well as, or instead of, by weight.
    castingsL: quantity("castings_l"),
    // What went in on a feeding, from the food list (vegetable, citrus, …).
    foodKinds: text("food_kinds").array().notNull().default([]),
    wormCount: integer("worm_count"),
    targetBinId: uuid("target_bin_id"),
    temperatureC: quantity("temperature_c"),
    moisturePercent: quantity("moisture_percent"),
    note: text("note"),
    loggedBy: uuid("logged_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("bin_events_garden_idx").on(t.gardenId),
    index("bin_events_bin_day_idx").on(t.binId, t.occurredOn),
    unique("bin_events_garden_id_id").on(t.gardenId, t.id),
    foreignKey({
      name: "bin_events_bin_same_garden_fk",
      columns: [t.gardenId, t.binId],
      foreignColumns: [bins.gardenId, bins.id],
    }).onDelete("cascade"),
    foreignKey({
      name: "bin_events_target_same_garden_fk",
      columns: [t.gardenId, t.targetBinId],
      foreignColumns: [bins.gardenId, bins.id],
    }),
  ],
);

// Worms bought (no from_bin), split to another bin, or removed/lost (no to_bin).
// (Older rows of bin_events with kind "worms-moved" were moved here.)
export const wormMoves = pgTable(
  "worm_moves",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    movedOn: date("moved_on").notNull(),
    fromBinId: uuid("from_bin_id"),
    toBinId: uuid("to_bin_id"),
    wormCount: integer("worm_count").notNull(),
    note: text("note"),
    loggedBy: uuid("logged_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("worm_moves_garden_idx").on(t.gardenId),
    check("worm_moves_count_positive", sql`${t.wormCount} > 0`),
    check("worm_moves_somewhere", sql`${t.fromBinId} is not null or ${t.toBinId} is not null`),
    foreignKey({
      name: "worm_moves_from_same_garden_fk",
      columns: [t.gardenId, t.fromBinId],
      foreignColumns: [bins.gardenId, bins.id],
    }).onDelete("cascade"),
    foreignKey({
      name: "worm_moves_to_same_garden_fk",
      columns: [t.gardenId, t.toBinId],
      foreignColumns: [bins.gardenId, bins.id],
    }).onDelete("cascade"),
  ],
);

// A quantity of castings or leachate on hand. What remains is never stored: it
// is the initial amount less the application_draws against it, and
// db/queries/lots.ts is the one place that writes draws (checking, in the same
// transaction, that no lot goes below zero).
export const stockLots = pgTable(
  "stock_lots",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    binId: uuid("bin_id"),
    // The harvest or drain that made it; null for stock entered as it stood.
    sourceEventId: uuid("source_event_id"),
    material: stockMaterialEnum("material").notNull(),
    producedOn: date("produced_on").notNull(),
    // As made: kg of castings, L of leachate.
    initialAmountSi: quantity("initial_amount_si").notNull(),
    // null = the bin's flag (false for bought stock).
    manureFeedstock: boolean("manure_feedstock"),
    // Bought castings: what was paid per kg; null for home-made stock.
    pricePerKg: quantity("price_per_kg"),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [
    index("stock_lots_garden_idx").on(t.gardenId),
    unique("stock_lots_garden_id_id").on(t.gardenId, t.id),
    // One lot per logged harvest or drain.
    unique("stock_lots_source_event").on(t.gardenId, t.sourceEventId),
    check("stock_lots_amount_non_negative", sql`${t.initialAmountSi} >= 0`),
    foreignKey({
      name: "stock_lots_bin_same_garden_fk",
      columns: [t.gardenId, t.binId],
      foreignColumns: [bins.gardenId, bins.id],
    }),
    foreignKey({
      name: "stock_lots_event_same_garden_fk",
      columns: [t.gardenId, t.sourceEventId],
      foreignColumns: [binEvents.gardenId, binEvents.id],
    }),
  ],
);

// A lot changed by hand: spilled, given away, spoiled, or a count corrected.
// Like application_draws, an adjustment lowers what remains of the lot (a
// positive correction raises it); db/queries/lots.ts writes both and checks,
// in the same transaction, that no lot goes below zero.
export const stockAdjustments = pgTable(
  "stock_adjustments",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    lotId: uuid("lot_id").notNull(),
    adjustedOn: date("adjusted_on").notNull(),
    // In the lot's unit (kg castings, L leachate); negative takes away.
    amountSi: quantity("amount_si").notNull(),
    reason: stockAdjustmentReasonEnum("reason").notNull(),
    note: text("note"),
    loggedBy: uuid("logged_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("stock_adjustments_garden_idx").on(t.gardenId),
    index("stock_adjustments_lot_idx").on(t.lotId),
    check("stock_adjustments_amount_non_zero", sql`${t.amountSi} <> 0`),
    foreignKey({
      name: "stock_adjustments_lot_same_garden_fk",
      columns: [t.gardenId, t.lotId],
      foreignColumns: [stockLots.gardenId, stockLots.id],
    }).onDelete("cascade"),
  ],
);
