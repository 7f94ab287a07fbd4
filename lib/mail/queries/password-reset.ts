import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { passwordResetTokens } from "@/db/schema";
import { getTokenState, hashToken, type TokenState } from "../tokens";

/** Whether a link still works, so the page can say so before anyone types a new password. */
export async function checkResetToken({
  token,
  now = new Date(),
}: {
  token: string;
  now?: Date;
}): Promise<TokenState | "unknown"> {
  const db = await getDb();
  const [row] = await db
    .select()
    .from(passwordResetTokens)
    .where(eq(passwordResetTokens.tokenHash, hashToken(token)));
  return row ? getTokenState({ expiresAt: row.expiresAt, usedAt: row.usedAt, now }) : "unknown";
}
