import Link from "next/link";

import { Wordmark } from "@/components/brand/wordmark";
import type { CenterProfile } from "@/lib/admin/center-profile";

type FooterLink = { href: string; label: string };

const defaultLinks: FooterLink[] = [
  { href: "/houses", label: "Houses" },
  { href: "/climate", label: "Your climate" },
  { href: "/placement", label: "Plan a site" },
  { href: "/give", label: "Give" },
];

/** The foot of every page: who runs the store, how to reach them, and that it is a nonprofit. */
export function SiteFooter({ center: c, links = defaultLinks }: { center: CenterProfile; links?: FooterLink[] }) {
  return (
    <footer className="mt-16 bg-moss-900 text-paper-200 [&_a]:text-paper-50 [&_a]:decoration-moss-300 [&_a:hover]:decoration-ember-300 [&_:focus-visible]:outline-ember-300">
      <div className="mx-auto grid max-w-page gap-10 px-4 py-12 sm:px-6 sm:grid-cols-2 md:grid-cols-[1.4fr_1fr_1fr]">
        <div className="flex flex-col gap-4 sm:col-span-2 md:col-span-1">
          <Wordmark tone="light" centerName={c.configured ? c.name : undefined} />
          <p className="max-w-sm text-sm leading-relaxed text-moss-200">
            {c.configured ? `Roostwright is the nonprofit store of ${c.name}.` : "Roostwright is a nonprofit store."} Volunteers build and inspect every
            house, and every sale and gift pays for the care of injured and orphaned bats.
          </p>
        </div>

        <div className="text-sm">
          <h2 className="mb-3 font-body text-sm font-bold tracking-wide text-paper-50 uppercase">
            Visit or write
          </h2>
          <address className="flex flex-col gap-1 not-italic">
            <span>{c.name}</span>
            {c.street ? <span>{c.street}</span> : null}
            {c.city ? (
              <span>
                {c.city}, {c.state} {c.zip}
              </span>
            ) : null}
            {c.phone ? (
              <a href={`tel:${c.phone.replace(/[^\d]/g, "")}`} className="mt-2">
                {c.phone}
              </a>
            ) : null}
            {c.email ? <a href={`mailto:${c.email}`}>{c.email}</a> : null}
          </address>
        </div>

        <nav aria-label="Footer" className="text-sm">
          <h2 className="mb-3 font-body text-sm font-bold tracking-wide text-paper-50 uppercase">
            The store
          </h2>
          <ul className="flex flex-col gap-2">
            {links.map((link) => (
              <li key={link.href}>
                <Link href={link.href}>{link.label}</Link>
              </li>
            ))}
          </ul>
        </nav>
      </div>
      <div className="border-t border-moss-800">
        <p className="mx-auto max-w-page px-4 py-5 text-xs text-moss-200 sm:px-6">
          © {c.name}, a nonprofit wildlife rehabilitation center. Receipts state what part of a
          payment is a tax-deductible gift.
        </p>
      </div>
    </footer>
  );
}
