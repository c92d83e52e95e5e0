import { getTableName, is, sql } from "drizzle-orm";
import { PgTable } from "drizzle-orm/pg-core";
import { getDb, schema } from "@/db";
import { getLocalOutbox, type ReceivedMail } from "@/services/mail";

// Looking at what a request left behind: caught mail and database rows.

export async function outbox(): Promise<ReceivedMail[]> {
  const messages = await getLocalOutbox();
  if (!messages) throw new Error("the local mail catcher is not running");
  return messages;
}

/** The newest message to `to`, or undefined. */
export async function latestMailTo(to: string): Promise<ReceivedMail | undefined> {
  return (await outbox()).find((m) => m.to.includes(to.toLowerCase()));
}

/**
 * Waits (up to 5 s) for a message to `to` whose subject matches: some mail is sent after the
 * response, so a test may not find it in the outbox the moment the handler returns.
 */
export async function waitForMailTo(to: string, subject: RegExp = /./): Promise<ReceivedMail> {
  const deadline = Date.now() + 5_000;
  for (;;) {
    const found = (await getLocalOutbox())?.find(
      (m) => m.to.includes(to.toLowerCase()) && subject.test(m.subject),
    );
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${String(subject)}`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

export function invitationTokenFrom(mail: ReceivedMail): string {
  const match = /\/invitations\/([A-Za-z0-9_-]{20,})/.exec(mail.text);
  if (!match) throw new Error(`no invitation link in: ${mail.text}`);
  return match[1]!;
}

export function resetTokenFrom(mail: ReceivedMail): string {
  const match = /\/reset-password\?token=([A-Za-z0-9_-]{20,})/.exec(mail.text);
  if (!match) throw new Error(`no reset link in: ${mail.text}`);
  return match[1]!;
}

/** Rows of one table in a stable order, for before/after comparisons. */
export async function tableRows(table: string, orderBy = "1"): Promise<unknown[]> {
  const db = await getDb();
  const result = (await db.execute(
    sql.raw(`select * from "${table}" order by ${orderBy}`),
  )) as unknown as {
    rows: unknown[];
  };
  return JSON.parse(JSON.stringify(result.rows)) as unknown[];
}

/** Table names the Drizzle schema declares (enums and relations are left out). */
export function schemaTableNames(): string[] {
  return Object.values(schema as Record<string, unknown>)
    .filter((v): v is PgTable => is(v, PgTable))
    .map((t) => getTableName(t))
    .sort();
}

export async function countRows(table: string): Promise<number> {
  const db = await getDb();
  const result = (await db.execute(
    sql.raw(`select count(*)::int as n from "${table}"`),
  )) as unknown as {
    rows: { n: number }[];
  };
  return result.rows[0]!.n;
}

// throttle_counters is left out on purpose: a refused request is meant to be counted.
const SNAPSHOT_TABLES = [
  "users",
  "gardens",
  "memberships",
  "invitations",
  "password_reset_tokens",
  "sessions",
  "beds",
  "crops",
  "plantings",
  "feeding_rules",
  "bins",
  "bin_events",
  "worm_moves",
  "stock_lots",
  "stock_adjustments",
  "uploads",
];

/** Everything a role-gated mutation could touch, as one comparable value. */
export async function snapshotDb(): Promise<string> {
  const parts: Record<string, unknown[]> = {};
  for (const table of SNAPSHOT_TABLES) parts[table] = await tableRows(table, "1, 2");
  return JSON.stringify(parts);
}

/** The user's role in the garden straight from the memberships table, or undefined. */
export async function membershipRole(
  gardenId: string,
  userId: string,
): Promise<string | undefined> {
  const rows = (await tableRows("memberships")) as {
    garden_id: string;
    user_id: string;
    role: string;
  }[];
  return rows.find((r) => r.garden_id === gardenId && r.user_id === userId)?.role;
}
