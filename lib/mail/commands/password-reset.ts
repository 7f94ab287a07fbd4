import "server-only";
import { and, count, eq, gt, isNull, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { passwordResetTokens, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/passwords";
import { env } from "@/lib/config/env";
import { AppError } from "@/lib/http/errors";
import { sealText } from "../sealed";
import { createToken, hashToken, RESET_TOKEN_TTL_MS } from "../tokens";
import { enqueueEmail, withOutbox } from "./outbox";

// The password reset flow: a random single-use token, stored only as its SHA-256, valid for
// 30 minutes, e-mailed through the outbox. Asking always gets the same answer, so the form
// cannot be used to find out who has an account (OWASP Forgot Password Cheat Sheet; from memory).

/** At most this many reset e-mails per account per hour, so the form cannot flood someone's inbox: common practice, no source. */
export const RESET_REQUESTS_PER_HOUR = 3;

export async function requestPasswordReset({
  email,
  now = new Date(),
}: {
  email: string;
  now?: Date;
}): Promise<void> {
  await withOutbox(async (tx) => {
    const [user] = await tx
      .select({ id: users.id, email: users.email })
      .from(users)
      .where(eq(users.email, email.trim().toLowerCase()));
    if (!user) return;
    const hourAgo = new Date(now.getTime() - 60 * 60_000);
    const [recent] = await tx
      .select({ n: count() })
      .from(passwordResetTokens)
      .where(
        and(eq(passwordResetTokens.userId, user.id), gt(passwordResetTokens.createdAt, hourAgo)),
      );
    if ((recent?.n ?? 0) >= RESET_REQUESTS_PER_HOUR) return;
    const { token, tokenHash } = createToken();
    const [row] = await tx
      .insert(passwordResetTokens)
      .values({
        userId: user.id,
        tokenHash,
        expiresAt: new Date(now.getTime() + RESET_TOKEN_TTL_MS),
        createdAt: now,
      })
      .returning({ id: passwordResetTokens.id });
    if (!row) throw new Error("reset token insert returned nothing");
    await enqueueEmail(tx, {
      dedupeKey: `password-reset:${row.id}`,
      kind: "password-reset",
      to: user.email,
      subject: "Choose a new password",
      payload: {
        userId: user.id,
        sealedToken: sealText({ text: token, secret: env().NEXTAUTH_SECRET }),
      },
    });
  });
}

const REFUSED =
  "This reset link has expired or was already used. Ask for a new one; it works for 30 minutes.";

/**
 * Sets a new password with a reset token. The token is spent by one conditional UPDATE (unused
 * and unexpired), so two tabs submitting the same link cannot both succeed; every other open
 * link of that account is spent with it.
 */
export async function resetPassword({
  token,
  password,
  now = new Date(),
}: {
  token: string;
  password: string;
  now?: Date;
}): Promise<{ userId: string }> {
  const passwordHash = await hashPassword(password);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [spent] = await tx
      .update(passwordResetTokens)
      .set({ usedAt: now })
      .where(
        and(
          eq(passwordResetTokens.tokenHash, hashToken(token)),
          isNull(passwordResetTokens.usedAt),
          gt(passwordResetTokens.expiresAt, now),
        ),
      )
      .returning({ userId: passwordResetTokens.userId });
    if (!spent) throw new AppError("bad_request", REFUSED, { token: REFUSED });
    // A reset ends every session signed in with the old password (users.session_version).
    await tx
      .update(users)
      .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
      .where(eq(users.id, spent.userId));
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: now })
      .where(and(eq(passwordResetTokens.userId, spent.userId), isNull(passwordResetTokens.usedAt)));
    return { userId: spent.userId };
  });
}
