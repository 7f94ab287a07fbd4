import type { BadgeTone } from "@/components/ui/badge";

// The outbox states in the admin's words.
export const MAIL_STATUS_WORDS = { pending: "Waiting", sent: "Sent", failed: "Failed" } as const;
export const MAIL_STATUS_TONES: Record<keyof typeof MAIL_STATUS_WORDS, BadgeTone> = {
  pending: "info",
  sent: "good",
  failed: "poor",
};
