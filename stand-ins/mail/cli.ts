import path from "node:path";
import { z } from "zod";
import { startMailStandIn } from "./server";

/** `tsx stand-ins/mail/cli.ts` — starts the mail stand-in from environment variables. */

const envSchema = z.object({
  MAIL_PORT: z.coerce.number().int().min(1).max(65_535).default(12_112),
  /** Where messages are kept across restarts; an empty value keeps them in memory only. */
  MAIL_DATA_FILE: z.string().default(path.join("var", "mail-stand-in.json")),
  RESEND_API_KEY: z
    .string()
    .startsWith("re_", { message: "RESEND_API_KEY must start with re_" })
    .optional(),
});

const parsed = envSchema.safeParse(process.env);
if (!parsed.success) {
  console.error(`mail stand-in: ${parsed.error.issues.map((issue) => issue.message).join("; ")}`);
  process.exit(1);
}
const env = parsed.data;

const standIn = await startMailStandIn({
  port: env.MAIL_PORT,
  dataFile: env.MAIL_DATA_FILE || undefined,
  apiKey: env.RESEND_API_KEY,
});
console.log(
  `mail stand-in listening on ${standIn.url} (inbox at ${standIn.url}/; set RESEND_BASE_URL=${standIn.url})`,
);

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, () => {
    void standIn.close().then(() => process.exit(0));
  });
}
