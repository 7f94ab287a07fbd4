"use server";

import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";
import { signUpAction } from "@/lib/accounts/actions";
import { action, formFields, type ActionResult } from "@/lib/http/action";
import { AppError } from "@/lib/http/errors";
import { authenticate, clientAddress, SignInRefused } from "./credentials";
import { signInNoticeFor } from "./form-notices";
import { safeNext } from "./safe-next";
import { startSession } from "./session-cookie";

// The sign-in and sign-up forms posted without script (a slow phone, a blocked script): the
// browser sends the fields in the body of a POST, never in the URL, and gets a redirect when
// they are right. With script the forms keep their client-side path (next-auth's signIn).

const nextSchema = z.object({ next: z.string().max(2000).optional() });

async function signInOrRefuse(email: string, password: string): Promise<void> {
  try {
    const user = await authenticate({ email, password }, clientAddress(await headers()));
    await startSession(user);
  } catch (error) {
    if (error instanceof SignInRefused) throw new AppError("unauthenticated", error.message);
    throw error;
  }
}

const signInForm = action(
  { public: true },
  z.object({ email: z.string().max(320), password: z.string().max(1000) }).extend(nextSchema.shape),
  async ({ email, password, next }) => {
    await signInOrRefuse(email, password);
    return { next: safeNext(next, "/welcome") };
  },
);

// A refusal answers with a redirect to the page and a notice code (lib/auth/form-notices.ts): a
// prerendered page cannot show an action's state to a browser without script.
export async function signInFormAction(_previous: ActionResult<{ next: string }> | null, form: FormData): Promise<ActionResult<{ next: string }>> {
  const fields = formFields(form);
  const result = await signInForm(fields);
  if (result.ok) redirect(result.data.next);
  const next = safeNext(typeof fields.next === "string" ? fields.next : undefined, "/welcome");
  redirect(`/sign-in?notice=${signInNoticeFor(result.error.message)}&next=${encodeURIComponent(next)}`);
}

export async function signUpFormAction(_previous: ActionResult<{ next: string }> | null, form: FormData): Promise<ActionResult<{ next: string }>> {
  const fields = formFields(form);
  const created = await signUpAction({ name: fields.name, email: fields.email, password: fields.password });
  if (!created.ok) redirect(`/sign-up?notice=sign-up-refused&next=${encodeURIComponent(safeNext(typeof fields.next === "string" ? fields.next : undefined, "/account"))}`);
  const signedIn = await signInForm({ email: fields.email, password: fields.password, next: fields.next });
  redirect(signedIn.ok ? safeNext(fields.next, "/account") : "/sign-in");
}
