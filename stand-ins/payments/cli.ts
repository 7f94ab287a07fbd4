import { z } from "zod";
import { startPaymentsStandIn } from "./server";

/**
 * `tsx stand-ins/payments/cli.ts` — starts the payments stand-in from environment variables.
 * The webhook secret must be the one the app verifies with; the local default is only for a
 * first run on a developer's machine.
 */

const LOCAL_WEBHOOK_SECRET = "whsec_local_roostwright_stand_in";

const envSchema = z.object({
  PAYMENTS_PORT: z.coerce.number().int().min(1).max(65_535).default(12_111),
  PAYMENTS_WEBHOOK_URL: z
    .url({ message: "PAYMENTS_WEBHOOK_URL must be a full URL" })
    .default("http://localhost:3000/api/webhooks/stripe"),
  STRIPE_WEBHOOK_SECRET: z
    .string()
    .startsWith("whsec_", { message: "STRIPE_WEBHOOK_SECRET must start with whsec_" })
    .default(LOCAL_WEBHOOK_SECRET),
  STRIPE_SECRET_KEY: z
    .string()
    .startsWith("sk_test_", { message: "STRIPE_SECRET_KEY must be a test key (sk_test_…)" })
    .optional(),
  STRIPE_PUBLISHABLE_KEY: z
    .string()
    .startsWith("pk_test_", { message: "STRIPE_PUBLISHABLE_KEY must be a test key (pk_test_…)" })
    .optional(),
  /** Comma-separated milliseconds, e.g. "1000,2000,4000". */
  PAYMENTS_WEBHOOK_RETRY_DELAYS_MS: z
    .string()
    .regex(/^\d+(,\d+)*$/, {
      message: "PAYMENTS_WEBHOOK_RETRY_DELAYS_MS must be comma-separated milliseconds",
    })
    .optional(),
});

const parsed = envSchema.safeParse(process.env);
if (!parsed.success) {
  console.error(
    `payments stand-in: ${parsed.error.issues.map((issue) => issue.message).join("; ")}`,
  );
  process.exit(1);
}
const env = parsed.data;

const standIn = await startPaymentsStandIn({
  port: env.PAYMENTS_PORT,
  webhookUrl: env.PAYMENTS_WEBHOOK_URL,
  webhookSecret: env.STRIPE_WEBHOOK_SECRET,
  secretKey: env.STRIPE_SECRET_KEY,
  publishableKey: env.STRIPE_PUBLISHABLE_KEY,
  webhookRetryDelaysMs: env.PAYMENTS_WEBHOOK_RETRY_DELAYS_MS?.split(",").map(Number),
});
console.log(
  `payments stand-in listening on ${standIn.url} (webhooks → ${env.PAYMENTS_WEBHOOK_URL})`,
);
if (env.STRIPE_WEBHOOK_SECRET === LOCAL_WEBHOOK_SECRET) {
  console.log(
    `payments stand-in: signing webhooks with the local default secret ${LOCAL_WEBHOOK_SECRET}`,
  );
}

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, () => {
    void standIn.close().then(() => process.exit(0));
  });
}
