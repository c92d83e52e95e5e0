import { sql } from "drizzle-orm";
import { getDb, getDbKind } from "@/db";
import packageJson from "@/package.json";

export const dynamic = "force-dynamic";

// Liveness plus a real round trip to the database, for monitors and CI.
export async function GET(): Promise<Response> {
  try {
    const db = await getDb();
    await db.execute(sql`select 1`);
    return Response.json({ status: "ok", version: packageJson.version, db: await getDbKind() });
  } catch (error) {
    console.error("[castline] health check failed", error);
    return Response.json(
      {
        status: "error",
        version: packageJson.version,
        error: { code: "unavailable", message: "Database unreachable." },
      },
      { status: 503 },
    );
  }
}
