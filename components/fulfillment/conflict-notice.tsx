"use client";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

/** What the second of two volunteers sees: what happened, and one button to catch up. */
export function ConflictNotice({ message, onReload }: { message: string | null; onReload: () => void }) {
  if (!message) return null;
  return (
    <Alert tone="warn" title="This order changed" live>
      <p>{message}</p>
      <Button variant="secondary" size="sm" className="mt-2" onClick={onReload}>
        Reload the order
      </Button>
    </Alert>
  );
}
