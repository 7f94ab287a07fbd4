import { z } from "zod";

/**
 * The body of `POST /emails` as the `resend` SDK v6 sends it (snake_case: reply_to,
 * scheduled_at), with the mail API's own wording for what is missing or malformed.
 * Source: "Send Email" API reference, Resend documentation (2025); `parseEmailToApiOptions`
 * in the `resend` SDK 6.38 (2026). Limits: 50 recipients per field, tag names and values
 * of ASCII letters, digits, underscores and dashes up to 256 characters (same reference).
 */

const FORMAT_HINT =
  "The email address needs to follow the `email@example.com` or `Name <email@example.com>` format.";
const ADDR_SPEC = /^[^\s@<>",;:()[\]\\]+@[^\s@<>",;:()[\]\\]+\.[^\s@<>",;:()[\]\\]+$/;

/** `ada@example.test` or `Ada Birch <ada@example.test>` → its parts; anything else → null. Common practice (RFC 5322 name-addr, simplified). */
export function parseMailbox(value: string): { name: string | null; email: string } | null {
  const trimmed = value.trim();
  const named = /^(.*?)\s*<([^<>]+)>$/.exec(trimmed);
  const email = (named ? named[2] : trimmed)?.trim() ?? "";
  if (!ADDR_SPEC.test(email)) return null;
  const name = named?.[1]?.trim().replace(/^"(.*)"$/, "$1") ?? "";
  return { name: name === "" ? null : name, email };
}

const invalid = (field: string) => `Invalid \`${field}\` field. ${FORMAT_HINT}`;
const missing = (field: string) => `Missing \`${field}\` field.`;

/** Absent is "missing", present but wrong is "invalid": the two answers the mail API gives. */
const missingOrInvalid = (field: string) => (issue: { input?: unknown }) =>
  issue.input === undefined || issue.input === null ? missing(field) : invalid(field);

function mailbox(field: string) {
  return z
    .string({ error: missingOrInvalid(field) })
    .refine((value) => parseMailbox(value) !== null, { message: invalid(field) });
}

/** A string or an array of strings, always stored as an array. */
function recipients(field: string) {
  return z.preprocess(
    (value) => (typeof value === "string" ? [value] : value),
    z
      .array(mailbox(field), { error: missingOrInvalid(field) })
      .max(50, { message: `Too many recipients in the \`${field}\` field: 50 at most.` }),
  );
}

const tagPart = z
  .string({ error: "Tags need a `name` and a `value`." })
  .min(1, { message: "Tags need a `name` and a `value`." })
  .max(256, { message: "Tag names and values can be at most 256 characters long." })
  .regex(/^[A-Za-z0-9_-]+$/, {
    message: "Tags should only contain ASCII letters, numbers, underscores, or dashes.",
  });

export const emailSchema = z
  .object(
    {
      from: mailbox("from"),
      to: recipients("to").refine((list) => list.length > 0, { message: missing("to") }),
      cc: recipients("cc").optional(),
      bcc: recipients("bcc").optional(),
      reply_to: recipients("reply_to").optional(),
      subject: z.string({ error: missing("subject") }).min(1, { message: missing("subject") }),
      html: z.string({ error: "Invalid `html` field: it must be a string." }).optional(),
      text: z.string({ error: "Invalid `text` field: it must be a string." }).optional(),
      headers: z
        .record(z.string(), z.string(), {
          error: "Invalid `headers` field: it must map header names to strings.",
        })
        .optional(),
      tags: z
        .array(z.object({ name: tagPart, value: tagPart }), { error: "Invalid `tags` field." })
        .optional(),
      attachments: z
        .array(
          z.object({
            filename: z.string().optional(),
            content: z.string().optional(),
            path: z.string().optional(),
            content_type: z.string().optional(),
          }),
          { error: "Invalid `attachments` field." },
        )
        .optional(),
      // Accepted and ignored: the stand-in delivers at once.
      scheduled_at: z.string().optional(),
    },
    { error: "The request body must be a JSON object." },
  )
  .refine((email) => email.html !== undefined || email.text !== undefined, {
    message: "Missing `html` or `text` field.",
    path: ["html"],
  });

export type EmailInput = z.infer<typeof emailSchema>;

export interface EmailProblem {
  name: "missing_required_field" | "validation_error";
  message: string;
}

export function checkEmail(body: unknown): { email: EmailInput } | { problem: EmailProblem } {
  const parsed = emailSchema.safeParse(body);
  if (parsed.success) return { email: parsed.data };
  const message = parsed.error.issues[0]?.message ?? "Invalid request body.";
  return {
    problem: {
      name: message.startsWith("Missing") ? "missing_required_field" : "validation_error",
      message,
    },
  };
}
