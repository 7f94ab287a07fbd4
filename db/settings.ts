import { z } from "zod";

/**
 * The two settings the database layer reads itself, so `db/` depends on nothing of the store's.
 * `lib/config/env.ts` folds this shape into the full settings schema, so both read one definition
 * (and a bad value fails there with every other setting's message).
 */
export const databaseSettingsShape = {
  DATA_DIR: z.string().min(1).default("var/data"),
  DATABASE_URL: z
    .string()
    .regex(/^(postgres(ql)?:\/\/|memory:\/\/)/, "DATABASE_URL must be a postgres:// URL (or memory:// for tests)")
    .optional(),
};

const databaseSettingsSchema = z.object(databaseSettingsShape);
export type DatabaseSettings = z.infer<typeof databaseSettingsSchema>;

const globalForSettings = globalThis as unknown as { __roostwrightDbSettings?: DatabaseSettings };

/** Read once per process, like the rest of the settings. */
export function databaseSettings(): DatabaseSettings {
  if (!globalForSettings.__roostwrightDbSettings) {
    const parsed = databaseSettingsSchema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
      throw new Error(`Roostwright cannot open its database; fix these settings:\n${lines.join("\n")}`);
    }
    globalForSettings.__roostwrightDbSettings = parsed.data;
  }
  return globalForSettings.__roostwrightDbSettings;
}
