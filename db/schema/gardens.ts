import { index, pgTable, primaryKey, smallint, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { users } from "./accounts";
import { createdAt, id, quantity } from "./columns";
import { mailStatusEnum, roleEnum, unitSystemEnum } from "./enums";

export const gardens = pgTable("gardens", {
  id: id(),
  name: text("name").notNull(),
  timeZone: text("time_zone").notNull(),
  unitSystem: unitSystemEnum("unit_system").notNull().default("us"),
  // The usual frost days, month and day "MM-DD" with no year: the plan applies them every year.
  lastSpringFrost: text("last_spring_frost_md").notNull(),
  firstFallFrost: text("first_fall_frost_md").notNull(),
  location: text("location"),
  // Engine parameters of the whole garden; null = the engine's default.
  // Purchase price of bought castings, used to value surplus (per kg in SI).
  castingsPricePerKg: quantity("castings_price_per_kg"),
  shelfLifeDays: smallint("shelf_life_days"),
  // Days collected or drained leachate stays usable before it is discarded.
  liquidMaxAgeDays: smallint("liquid_max_age_days"),
  // Tea recipe: volume of castings per volume of water.
  teaCastingsPerWater: quantity("tea_castings_per_water"),
  currency: text("currency").notNull().default("USD"),
  createdAt: createdAt(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const memberships = pgTable(
  "memberships",
  {
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    primaryKey({ columns: [t.gardenId, t.userId] }),
    index("memberships_user_idx").on(t.userId),
  ],
);

export const invitations = pgTable(
  "invitations",
  {
    id: id(),
    gardenId: uuid("garden_id")
      .notNull()
      .references(() => gardens.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: roleEnum("role").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    acceptedBy: uuid("accepted_by").references(() => users.id, { onDelete: "set null" }),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    mailStatus: mailStatusEnum("mail_status").notNull().default("pending"),
    createdAt: createdAt(),
  },
  (t) => [index("invitations_garden_idx").on(t.gardenId)],
);
