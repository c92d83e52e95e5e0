import { sql } from "drizzle-orm";
import { getDb, getDbKind } from "@/db";
import { refuseOtherMethods } from "@/lib/http";
import { logError } from "@/lib/log";
import packageJson from "@/package.json";

export const dynamic = "force-dynamic";

// Liveness plus a real round trip to the database, for monitors and CI.
export async function GET(): Promise<Response> {
  try {
    const db = await getDb();
    await db.execute(sql`select 1`);
    return Response.json({ status: "ok", version: packageJson.version, db: await getDbKind() });
  } catch (error) {
    logError("health check failed", error);
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

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods({ GET });
