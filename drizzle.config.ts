import { defineConfig } from "drizzle-kit";

// Generates SQL only; the server applies db/migrations itself at start-up, so
// drizzle-kit never opens the live PGlite directory (one owner per data dir).
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema/index.ts",
  out: "./db/migrations",
});
