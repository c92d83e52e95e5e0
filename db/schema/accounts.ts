import { boolean, index, integer, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { createdAt, id } from "./columns";

export const users = pgTable("users", {
  id: id(),
  // Stored lower-cased so look-ups and the unique index agree.
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  passwordHash: text("password_hash").notNull(),
  // Bumped by "sign out everywhere" and password changes; tokens carrying an
  // older number stop working.
  sessionVersion: integer("session_version").notNull().default(0),
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

export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: id(),
    // "email:<address>" or "ip:<address>": throttling counts both kinds.
    throttleKey: text("throttle_key").notNull(),
    succeeded: boolean("succeeded").notNull(),
    attemptedAt: timestamp("attempted_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_key_time_idx").on(t.throttleKey, t.attemptedAt)],
);

// Sessions ended by "sign out" on one device. The cookie is a self-contained
// token, so the server keeps its id here until it would have expired anyway.
export const endedSessions = pgTable(
  "ended_sessions",
  {
    tokenId: text("token_id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    endedAt: timestamp("ended_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("ended_sessions_expiry_idx").on(t.expiresAt)],
);
