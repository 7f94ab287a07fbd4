import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { z } from "zod";
import { databaseSettingsShape } from "@/db/settings";

/**
 * Every setting the store reads, validated once. Local mode (the default) fills in safe
 * defaults: an embedded database under var/, the local stand-ins for payments, mail and
 * uploads, and development secrets generated once and kept in var/dev-secrets.json so every
 * process of one checkout agrees on them. Production mode refuses to start without real secrets.
 */
const envSchema = z.object({
  ROOSTWRIGHT_MODE: z.enum(["local", "production"]).default("local"),
  APP_URL: z.string().url().default("http://localhost:3000"),
  ...databaseSettingsShape,
  NEXTAUTH_SECRET: z.string().min(32, "NEXTAUTH_SECRET must be at least 32 characters").optional(),
  STRIPE_SECRET_KEY: z.string().startsWith("sk_", "STRIPE_SECRET_KEY must start with sk_").optional(),
  STRIPE_PUBLISHABLE_KEY: z.string().startsWith("pk_", "STRIPE_PUBLISHABLE_KEY must start with pk_").optional(),
  STRIPE_WEBHOOK_SECRET: z.string().startsWith("whsec_", "STRIPE_WEBHOOK_SECRET must start with whsec_").optional(),
  STRIPE_API_BASE: z.string().url().optional(),
  PAYMENTS_PORT: z.coerce.number().int().default(12111),
  RESEND_API_KEY: z.string().min(1).optional(),
  RESEND_BASE_URL: z.string().url().optional(),
  MAIL_PORT: z.coerce.number().int().default(12112),
  // The address mail is sent from; the display name is the center's, read from its settings at send time.
  MAIL_FROM: z.string().default("Roostwright store <store@roostwright.example>"),
  S3_ENDPOINT: z.string().url().optional(),
  S3_BUCKET: z.string().default("roostwright-photos"),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_REGION: z.string().default("us-east-1"),
  UPLOADS_PORT: z.coerce.number().int().default(12113),
  LOG_LEVEL: z.enum(["debug", "info", "warn", "error"]).default("info"),
  // How many proxies of ours stand in front of the app and append to X-Forwarded-For. 0 (the
  // default) ignores forwarded headers: every address-based limit then reads the connection.
  TRUSTED_PROXY_COUNT: z
    .string()
    .regex(/^\d{1,2}$/, "TRUSTED_PROXY_COUNT must be a whole number of proxies (0 when none)")
    .default("0")
    .transform(Number),
});

type RawEnv = z.infer<typeof envSchema>;

export type Env = RawEnv & {
  NEXTAUTH_SECRET: string;
  STRIPE_SECRET_KEY: string;
  STRIPE_PUBLISHABLE_KEY: string;
  STRIPE_WEBHOOK_SECRET: string;
  RESEND_API_KEY: string;
  RESEND_BASE_URL: string | undefined;
  S3_ENDPOINT: string | undefined;
  S3_ACCESS_KEY_ID: string;
  S3_SECRET_ACCESS_KEY: string;
  /** True when payments, mail and uploads go to the local stand-ins. */
  useStandIns: boolean;
};

const PRODUCTION_REQUIRED = [
  "NEXTAUTH_SECRET",
  "STRIPE_SECRET_KEY",
  "STRIPE_PUBLISHABLE_KEY",
  "STRIPE_WEBHOOK_SECRET",
  "RESEND_API_KEY",
  "DATABASE_URL",
] as const;

export class ConfigError extends Error {
  override name = "ConfigError";
}

function localSecrets(): Record<string, string> {
  const file = path.join(process.cwd(), "var", "dev-secrets.json");
  if (existsSync(file)) return JSON.parse(readFileSync(file, "utf8")) as Record<string, string>;
  const secrets = {
    NEXTAUTH_SECRET: randomBytes(32).toString("hex"),
    STRIPE_SECRET_KEY: `sk_test_local_${randomBytes(12).toString("hex")}`,
    STRIPE_PUBLISHABLE_KEY: `pk_test_local_${randomBytes(12).toString("hex")}`,
    STRIPE_WEBHOOK_SECRET: `whsec_${randomBytes(24).toString("base64url")}`,
    RESEND_API_KEY: `re_local_${randomBytes(12).toString("hex")}`,
  };
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}

export function parseEnv(source: NodeJS.ProcessEnv): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new ConfigError(`Roostwright cannot start; fix these settings:\n${lines.join("\n")}`);
  }
  const raw = parsed.data;
  if (raw.ROOSTWRIGHT_MODE === "production") {
    const missing = PRODUCTION_REQUIRED.filter((k) => !raw[k]);
    if (missing.length > 0) {
      throw new ConfigError(
        `Roostwright cannot start in production mode: set ${missing.join(", ")} (see README, "Configuration").`,
      );
    }
  }
  const local = raw.ROOSTWRIGHT_MODE === "local" ? localSecrets() : {};
  const pick = (k: string) => (raw as Record<string, unknown>)[k] as string | undefined ?? local[k] ?? "";
  const useStandIns = raw.ROOSTWRIGHT_MODE === "local" && !raw.STRIPE_API_BASE?.includes("stripe.com");
  return {
    ...raw,
    NEXTAUTH_SECRET: pick("NEXTAUTH_SECRET"),
    STRIPE_SECRET_KEY: pick("STRIPE_SECRET_KEY"),
    STRIPE_PUBLISHABLE_KEY: pick("STRIPE_PUBLISHABLE_KEY"),
    STRIPE_WEBHOOK_SECRET: pick("STRIPE_WEBHOOK_SECRET"),
    RESEND_API_KEY: pick("RESEND_API_KEY"),
    RESEND_BASE_URL:
      raw.RESEND_BASE_URL ?? (raw.ROOSTWRIGHT_MODE === "local" ? `http://127.0.0.1:${raw.MAIL_PORT}` : undefined),
    STRIPE_API_BASE:
      raw.STRIPE_API_BASE ?? (raw.ROOSTWRIGHT_MODE === "local" ? `http://127.0.0.1:${raw.PAYMENTS_PORT}` : undefined),
    S3_ENDPOINT:
      raw.S3_ENDPOINT ?? (raw.ROOSTWRIGHT_MODE === "local" ? `http://127.0.0.1:${raw.UPLOADS_PORT}` : undefined),
    S3_ACCESS_KEY_ID: raw.S3_ACCESS_KEY_ID ?? "S3RVER",
    S3_SECRET_ACCESS_KEY: raw.S3_SECRET_ACCESS_KEY ?? "S3RVER",
    useStandIns,
  };
}

const globalForEnv = globalThis as unknown as { __roostwrightEnv?: Env };

/** The validated settings, read once per process. */
export function env(): Env {
  globalForEnv.__roostwrightEnv ??= parseEnv(process.env);
  return globalForEnv.__roostwrightEnv;
}
