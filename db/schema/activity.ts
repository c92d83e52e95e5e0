import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  date,
  foreignKey,
  index,
  integer,
  pgTable,
  primaryKey,
  smallint,
  text,
  timestamp,
  unique,
  uuid,
} from "drizzle-orm/pg-core";
import { users } from "./accounts";
import { plantings } from "./beds";
import { stockLots } from "./bins";
import { createdAt, id, quantity } from "./columns";
import { materialEnum, methodEnum } from "./enums";
import { gardens } from "./gardens";

// One top-dressing, drench or mix actually done in the garden. The stock it
// used is in application_draws (one row per lot), written with it by
// db/queries/lots.ts.
export const applications = pgTable(
  "applications",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    // The bed is the planting's; it is not repeated here.
    plantingId: uuid("planting_id").notNull(),
    material: materialEnum("material").notNull(),
    method: methodEnum("method").notNull(),
    // As applied: kg of castings, or L of diluted leachate or tea.
    amountSi: quantity("amount_si").notNull(),
    appliedOn: date("applied_on").notNull(),
    // The plan date this application fulfils, if it came from the plan.
    plannedFor: date("planned_for"),
    // The engine's stable id of the planned feeding it fulfils; null for an
    // unplanned feeding. Unique per garden, so one planned feeding is logged once.
    plannedKey: text("planned_key"),
    loggedBy: uuid("logged_by").references(() => users.id, { onDelete: "set null" }),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [
    index("applications_garden_idx").on(t.gardenId),
    index("applications_planting_idx").on(t.plantingId),
    unique("applications_garden_id_id").on(t.gardenId, t.id),
    unique("applications_planned_once").on(t.gardenId, t.plannedKey),
    check("applications_amount_positive", sql`${t.amountSi} > 0`),
    foreignKey({
      name: "applications_planting_same_garden_fk",
      columns: [t.gardenId, t.plantingId],
      foreignColumns: [plantings.gardenId, plantings.id],
    }).onDelete("cascade"),
  ],
);

// What an application took from each lot: castings for a top-dressing or for
// brewing tea, leachate for a drench. A lot's remaining amount is its initial
// amount less the sum of these.
export const applicationDraws = pgTable(
  "application_draws",
  {
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    applicationId: uuid("application_id").notNull(),
    lotId: uuid("lot_id").notNull(),
    // In the lot's unit: kg of castings (for tea, the castings steeped), L of undiluted leachate.
    amountSi: quantity("amount_si").notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.applicationId, t.lotId] }),
    index("application_draws_lot_idx").on(t.lotId),
    check("application_draws_amount_positive", sql`${t.amountSi} > 0`),
    foreignKey({
      name: "application_draws_application_same_garden_fk",
      columns: [t.gardenId, t.applicationId],
      foreignColumns: [applications.gardenId, applications.id],
    }).onDelete("cascade"),
    foreignKey({
      name: "application_draws_lot_same_garden_fk",
      columns: [t.gardenId, t.lotId],
      foreignColumns: [stockLots.gardenId, stockLots.id],
    }),
  ],
);

// A calendar subscription URL: one per person per garden, revocable.
export const feedTokens = pgTable(
  "feed_tokens",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index("feed_tokens_garden_idx").on(t.gardenId)],
);

export const reminderPreferences = pgTable(
  "reminder_preferences",
  {
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    enabled: boolean("enabled").notNull().default(false),
    // Local hour (garden time zone) the daily reminder goes out.
    sendHour: smallint("send_hour").notNull().default(7),
    daysAhead: smallint("days_ahead").notNull().default(1),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.gardenId, t.userId] })],
);

export const sentReminders = pgTable(
  "sent_reminders",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    forDate: date("for_date").notNull(),
    kind: text("kind").notNull(),
    messageId: text("message_id"),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
  },
  // Makes a re-run of the reminder job unable to send the same reminder twice.
  (t) => [unique("sent_reminders_once").on(t.gardenId, t.userId, t.forDate, t.kind)],
);

export const uploads = pgTable(
  "uploads",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    storageKey: text("storage_key").notNull().unique(),
    contentType: text("content_type").notNull(),
    byteSize: integer("byte_size").notNull(),
    originalName: text("original_name").notNull(),
    attachedToType: text("attached_to_type"),
    attachedToId: uuid("attached_to_id"),
    createdAt: createdAt(),
  },
  (t) => [index("uploads_garden_idx").on(t.gardenId)],
);
