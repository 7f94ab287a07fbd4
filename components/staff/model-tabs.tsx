"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/components/ui/cn";

/** The sections of one model: each is its own page, so each has its own address. */
export function ModelTabs({
  slug,
  counts,
}: {
  slug: string;
  counts: { photos: number; inspections: number; stock: number };
}) {
  const pathname = usePathname();
  const base = `/staff/models/${slug}`;
  const tabs = [
    { href: base, label: "Listing and design" },
    { href: `${base}/photos`, label: `Photos (${counts.photos})` },
    { href: `${base}/inspections`, label: `Inspections (${counts.inspections})` },
    { href: `${base}/stock`, label: `Stock (${counts.stock})` },
  ];
  return (
    <nav aria-label="Model sections" className="-mx-4 mb-6 overflow-x-auto px-4 sm:mx-0 sm:px-0">
      <ul className="flex min-w-max gap-1 border-b border-paper-300">
        {tabs.map((t) => {
          const current = pathname === t.href;
          return (
            <li key={t.href}>
              <Link
                href={t.href}
                aria-current={current ? "page" : undefined}
                className={cn(
                  "-mb-px inline-flex min-h-11 items-center rounded-t-lg border-b-3 px-3 font-bold no-underline",
                  "focus-visible:outline-3 focus-visible:outline-offset-1 focus-visible:outline-dusk-500",
                  current
                    ? "border-ember-500 text-moss-900"
                    : "border-transparent text-ink-soft hover:border-paper-400 hover:text-moss-800",
                )}
              >
                {t.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
