import { index, integer, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { createdAt, id } from "./columns";

export const users = pgTable("users", {
  id: id(),
  // Stored lower-cased so look-ups and the unique index agree.
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  passwordHash: text("password_hash").notNull(),
  createdAt: createdAt(),
});

export const passwordResetTokens = pgTable(
  "password_reset_tokens",
  {
    id: id(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    // SHA-256 of the token; the token itself only ever exists in the e-mail.
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index("password_reset_tokens_user_idx").on(t.userId)],
);

// Counters for every rate limit (sign-in failures, sign-up, reset and invitation mail),
// one row per key and fixed window. One INSERT … ON CONFLICT … RETURNING bumps and reads
// a counter, so parallel requests can never both see "one left" (lib/auth/throttle.ts).
export const throttleCounters = pgTable("throttle_counters", {
  // e.g. "signin-account:<e-mail>", "signin-address:<address>", "reset-email:<e-mail>".
  key: text("key").primaryKey(),
  windowStartedAt: timestamp("window_started_at", { withTimezone: true }).notNull(),
  hits: integer("hits").notNull(),
});

// The server-side allow-list of sessions. The cookie names a session id; the session is
// valid only while this row exists, so deleting it ends the session for good (sign-out,
// password change, "sign out everywhere").
export const sessions = pgTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  },
  (t) => [index("sessions_user_idx").on(t.userId), index("sessions_expiry_idx").on(t.expiresAt)],
);
