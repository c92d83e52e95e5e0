import { z } from "zod";

// Every setting the server reads, validated once. A bad value stops start-up
// with the variable's name instead of failing later in a request.
const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.url().optional(),
  PGLITE_DIR: z.string().min(1).default(".data/pglite"),
  CASTLINE_DEMO: z
    .enum(["0", "1", "true", "false"])
    .default("0")
    .transform((v) => v === "1" || v === "true"),
  AUTH_SECRET: z.string().min(16).optional(),
  AUTH_URL: z.url().optional(),
  // Origin of links in e-mails (e.g. https://garden.example.org). Wins over AUTH_URL.
  // Unset in development and demo: http://localhost:${PORT:-3000}. The Host header never decides.
  APP_ORIGIN: z.url().optional(),
  PORT: z.coerce.number().int().min(1).max(65535).optional(),
  // How many reverse proxies we run in front of the server. Each appends to
  // X-Forwarded-For; only those entries are believed (lib/auth/throttle.ts clientAddress).
  TRUSTED_PROXY_COUNT: z.coerce.number().int().min(0).max(10).default(0),
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: z
    .enum(["0", "1", "true", "false"])
    .default("0")
    .transform((v) => v === "1" || v === "true"),
  MAIL_FROM: z.string().min(3).default("Castline <no-reply@castline.example.com>"),
  // Port of the built-in local SMTP catcher used when SMTP_HOST is unset. It
  // runs inside the server process, so by default any free port will do (0).
  LOCAL_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  CASTLINE_OUTBOX: z
    .enum(["0", "1", "true", "false"])
    .optional()
    .transform((v) => (v === undefined ? undefined : v === "1" || v === "true")),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function getEnv(): Env {
  if (cached) return cached;
  // An empty variable (SMTP_HOST= in a .env file or a shell) means "not set".
  const present = Object.fromEntries(Object.entries(process.env).filter(([, v]) => v !== ""));
  const parsed = envSchema.safeParse(present);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment configuration:\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}

/** For tests and scripts that change process.env after first use. */
export function resetEnvCache(): void {
  cached = undefined;
}
