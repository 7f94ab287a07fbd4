import "server-only";
import type { z } from "zod";
import { requireUser } from "@/lib/auth/guard";
import type { Permission } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session";
import { badInput, toErrorBody, type ErrorBody } from "./errors";
import { gateValue } from "./input-gate";

export type ActionResult<T> = { ok: true; data: T } | ({ ok: false } & ErrorBody);

type Access = { permission: Permission } | { signedIn: true } | { public: true };

/**
 * The one wrapper for server actions: validates the input with zod, loads the session and
 * checks the role on the server, and returns one result shape (never throws to the client).
 */
export function action<S extends z.ZodType, T>(
  access: Access,
  schema: S,
  fn: (input: z.infer<S>, user: SessionUser | null) => Promise<T>,
): (input: unknown) => Promise<ActionResult<T>> {
  return async (input: unknown) => {
    try {
      gateValue(input);
      let user: SessionUser | null = null;
      if ("permission" in access) user = await requireUser(access.permission);
      else if ("signedIn" in access) user = await requireUser();
      const parsed = schema.safeParse(input);
      if (!parsed.success) throw badInput(parsed.error);
      return { ok: true, data: await fn(parsed.data, user) };
    } catch (error) {
      if (isNextControlFlow(error)) throw error;
      return { ok: false, ...toErrorBody(error).body };
    }
  };
}

/**
 * The same action answering a plain form post (`<form action={…}>` through useActionState), so
 * the form works before or without the page's script: the fields arrive as FormData, and the
 * framework's own `$ACTION_…` fields are left out.
 */
export function formAction<T>(run: (input: unknown) => Promise<ActionResult<T>>) {
  return async (_previous: ActionResult<T> | null, form: FormData): Promise<ActionResult<T>> => run(formFields(form));
}

export function formFields(form: FormData): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (key.startsWith("$ACTION_") || typeof value !== "string") continue;
    fields[key] = value;
  }
  return fields;
}

// redirect() and notFound() work by throwing; they must pass through.
function isNextControlFlow(error: unknown): boolean {
  const digest = (error as { digest?: unknown } | null)?.digest;
  return typeof digest === "string" && (digest.startsWith("NEXT_REDIRECT") || digest.startsWith("NEXT_HTTP_ERROR_FALLBACK"));
}
