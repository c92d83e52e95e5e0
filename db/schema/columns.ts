import { numeric, timestamp, uuid } from "drizzle-orm/pg-core";

// Quantities are stored in SI (kg, L, m, m²) as exact decimals and read back as
// JS numbers; the column name always carries its unit so nobody has to guess.
export const quantity = (name: string) =>
  numeric(name, { precision: 14, scale: 6, mode: "number" });

export const id = () => uuid("id").primaryKey().defaultRandom();

export const createdAt = () =>
  timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
