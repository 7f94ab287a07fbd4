"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { signOutInBrowser } from "@/lib/auth/sign-out-browser";

export function SignOutButton() {
  const [busy, setBusy] = useState(false);
  return (
    <Button
      variant="secondary"
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
