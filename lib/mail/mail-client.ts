import "server-only";
import { Resend } from "resend";
import { env } from "@/lib/config/env";

const globalForMail = globalThis as unknown as {
  __roostwrightMail?: { key: string; client: Resend };
};

/**
 * The mail SDK, aimed at RESEND_BASE_URL (the local stand-in by default, the real service in
 * production). The base URL is passed as an option rather than left to the SDK's own
 * process.env lookup, so it is the value the validated settings hold.
 */
export function getMailClient(): Resend {
  const settings = env();
  const key = `${settings.RESEND_API_KEY} ${settings.RESEND_BASE_URL ?? ""}`;
  if (globalForMail.__roostwrightMail?.key !== key) {
    const client = new Resend(
      settings.RESEND_API_KEY,
      settings.RESEND_BASE_URL
        ? { baseUrl: settings.RESEND_BASE_URL.replace(/\/+$/, "") }
        : undefined,
    );
    globalForMail.__roostwrightMail = { key, client };
  }
  return globalForMail.__roostwrightMail.client;
}
