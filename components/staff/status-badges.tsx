import { Badge } from "@/components/ui/badge";
import type { CertificationStateId } from "@/lib/catalog/certification";
import { MODEL_STATUS_TONES, MODEL_STATUS_WORDS, type ModelStatus } from "@/lib/staff/status-words";

export function ModelStatusBadge({ status }: { status: ModelStatus }) {
  return <Badge tone={MODEL_STATUS_TONES[status]}>{MODEL_STATUS_WORDS[status]}</Badge>;
}

const CERT_TONES: Record<CertificationStateId, "good" | "warn" | "poor" | "neutral"> = {
  certified: "good",
  expired: "warn",
  failed: "poor",
  "not-inspected": "neutral",
  "design-fails": "poor",
};

export function CertificationBadge({
  state,
  words,
  expiringSoon = false,
}: {
  state: CertificationStateId;
  words: string;
  expiringSoon?: boolean;
}) {
  return (
    <Badge tone={state === "certified" && expiringSoon ? "warn" : CERT_TONES[state]}>{words}</Badge>
  );
}

const dateFormat = new Intl.DateTimeFormat("en-US", {
  year: "numeric",
  month: "short",
  day: "numeric",
  timeZone: "UTC",
});

/** "Mar 8, 2026": inspection days are stored at noon UTC, so UTC shows the day that was typed. */
export function formatDay(date: Date | string): string {
  return dateFormat.format(typeof date === "string" ? new Date(date) : date);
}
