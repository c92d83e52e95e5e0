import "server-only";
import { eq, lt } from "drizzle-orm";
import { getDb } from "@/db";
import { endedSessions } from "@/db/schema";

export async function endSession(input: {
  tokenId: string;
  userId: string;
  expiresAt: Date;
}): Promise<void> {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.insert(endedSessions).values(input).onConflictDoNothing();
    // Rows past their token's expiry can never match again.
    await tx.delete(endedSessions).where(lt(endedSessions.expiresAt, new Date()));
  });
}

export async function isSessionEnded({ tokenId }: { tokenId: string }): Promise<boolean> {
  const db = await getDb();
  const rows = await db
    .select({ id: endedSessions.tokenId })
    .from(endedSessions)
    .where(eq(endedSessions.tokenId, tokenId))
    .limit(1);
  return rows.length > 0;
}
