import {
  boolean,
  date,
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
import { beds, plantings } from "./beds";
import { stockLots } from "./bins";
import { createdAt, id, quantity } from "./columns";
import { materialEnum, methodEnum, siUnitEnum } from "./enums";
import { gardens } from "./gardens";

// One top-dressing, drench or mix actually done in the garden.
export const applications = pgTable(
  "applications",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    plantingId: uuid("planting_id")
      .notNull()
      .references(() => plantings.id, { onDelete: "cascade" }),
    bedId: uuid("bed_id")
      .notNull()
      .references(() => beds.id, { onDelete: "cascade" }),
    lotId: uuid("lot_id").references(() => stockLots.id, { onDelete: "set null" }),
    material: materialEnum("material").notNull(),
    method: methodEnum("method").notNull(),
    amountSi: quantity("amount_si").notNull(),
    siUnit: siUnitEnum("si_unit").notNull(),
    appliedOn: date("applied_on").notNull(),
    // The plan date this application fulfils, if it came from the plan.
    plannedFor: date("planned_for"),
    loggedBy: uuid("logged_by").references(() => users.id, { onDelete: "set null" }),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [
    index("applications_garden_idx").on(t.gardenId),
    index("applications_planting_idx").on(t.plantingId),
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
