"use server";

import { action } from "@/lib/http/action";
import { unsubscribeSchema } from "@/lib/mail/account-schemas";
import { unsubscribeByToken } from "@/lib/mail/commands/preferences";

// No sign-in: the token in the link is the permission (RFC 8058 one-click semantics).
export const unsubscribeAction = action({ public: true }, unsubscribeSchema, async ({ token }) => ({
  result: await unsubscribeByToken({ token }),
}));
