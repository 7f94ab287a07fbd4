import { env } from "@/lib/config/env";
import { resolveClientAddress } from "@/lib/http/client-address";
import { recordSignInAttempt } from "./commands";
import { signInSchema } from "./password-policy";
import { verifyPassword } from "./passwords";
import { countRecentSignInFailures, findUserForSignIn } from "./queries";
import type { Role } from "./roles";
import { throttleVerdict } from "./throttle";

export class SignInRefused extends Error {
  override name = "SignInRefused";
}

/** Checks an e-mail and password; throws SignInRefused with a message a person can act on. */
export async function authenticate(
  input: unknown,
  ip: string,
): Promise<{ id: string; name: string; email: string; role: Role; sessionVersion: number }> {
  const parsed = signInSchema.safeParse(input);
  if (!parsed.success) throw new SignInRefused("Enter your e-mail address and password.");
  const { email, password } = parsed.data;
  const verdict = throttleVerdict(await countRecentSignInFailures({ email, ip }));
  if (verdict.throttled) throw new SignInRefused(verdict.message);
  const user = await findUserForSignIn({ email });
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  await recordSignInAttempt({ email, ip, succeeded: ok });
  if (!ok || !user) throw new SignInRefused("That e-mail and password don't match an account here.");
  return { id: user.id, name: user.name, email: user.email, role: user.role, sessionVersion: user.sessionVersion };
}

/** The address sign-in throttling counts by: forwarded headers only through our own proxies. */
export function clientAddress(headers: Record<string, unknown> | Headers | undefined): string {
  const forwarded = headers instanceof Headers ? headers.get("x-forwarded-for") : headers?.["x-forwarded-for"];
  return resolveClientAddress({
    forwardedFor: typeof forwarded === "string" ? forwarded : Array.isArray(forwarded) ? forwarded.join(",") : null,
    trustedProxies: env().TRUSTED_PROXY_COUNT,
  });
}
