"use client";

import { useState, useTransition } from "react";
import { setRoleAction } from "@/lib/accounts/actions";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/roles";

export function RoleForm({ userId, role, name, isSelf }: { userId: string; role: Role; name: string; isSelf: boolean }) {
  const [value, setValue] = useState<Role>(role);
  const [pending, startTransition] = useTransition();
  const toast = useToast();
  return (
    <form
      className="flex flex-wrap items-center gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        startTransition(async () => {
          const result = await setRoleAction({ userId, role: value });
          if (result.ok) toast.notify({ tone: "good", title: `${name} is now: ${ROLE_LABELS[value]}.` });
          else toast.notify({ tone: "poor", title: result.error.message });
        });
      }}
    >
      <label className="sr-only" htmlFor={`role-${userId}`}>
        Role for {name}
      </label>
      <Select id={`role-${userId}`} value={value} onChange={(e) => setValue(e.target.value as Role)} disabled={isSelf}>
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </Select>
      <Button type="submit" size="sm" variant="secondary" loading={pending} disabled={isSelf || value === role}>
        Save role
      </Button>
      {isSelf ? <span className="text-sm text-ink-soft">(your own account)</span> : null}
    </form>
  );
}
