import { doublePrecision, timestamp, uuid } from "drizzle-orm/pg-core";

// Quantities are stored in SI (kg, L, m, m²) as double precision: exactly the
// numbers the engine computes with, so a garden read back from the database
// plans to the last bit as the file or form it came from (a decimal column
// rounded 1 cup = 0.2365882365 L to 0.236588). PostgreSQL prints float8 in its
// shortest exact form, so no value changes on the way in or out. The column name
// always carries its unit so nobody has to guess.
export const quantity = (name: string) => doublePrecision(name);

export const id = () => uuid("id").primaryKey().defaultRandom();

export const createdAt = () =>
  timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
