"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { signOutInBrowser } from "@/lib/auth/sign-out-browser";

/** Ends the session through the auth routes (lib/auth/sign-out-browser.ts) and goes home. */
export function SignOutButton({ size }: { size?: "sm" } = {}) {
  const [busy, setBusy] = useState(false);
  return (
    <Button
      variant="secondary"
      size={size}
      loading={busy}
      onClick={() => {
        setBusy(true);
        void signOutInBrowser("/").then((left) => {
          if (!left) setBusy(false);
        });
      }}
    >
      Sign out
    </Button>
  );
}
