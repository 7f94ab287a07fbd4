"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { Suspense, useEffect, useRef, type KeyboardEvent, type RefObject } from "react";

import { SignOutButton } from "@/components/auth/sign-out-button";
import { Wordmark } from "@/components/brand/wordmark";
import { ButtonLink } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import { isRole, ROLE_LABELS } from "@/lib/auth/roles";

type HeaderUser = { name: string; role: string };
type NavLink = { href: string; label: string };

type SiteHeaderProps = {
  /** Who is signed in; `undefined` while the session streams in (the prerendered header). */
  user: HeaderUser | null | undefined;
  nav: NavLink[];
  /** Where the skip link jumps; the layout's <main> carries this id. */
  mainId?: string;
};

function isCurrent(pathname: string, href: string): boolean {
  if (href === "/") return pathname === "/";
  return pathname === href || pathname.startsWith(`${href}/`);
}

/**
 * The top of every page: skip link, wordmark, navigation and who is signed in. Wide screens show
 * the links in a row; phones get a <details> menu, which opens and closes with the keyboard and
 * works before scripts load.
 */
export function SiteHeader({ user, nav, mainId = "main" }: SiteHeaderProps) {
  const menuRef = useRef<HTMLDetailsElement>(null);

  function closeOnEscape(event: KeyboardEvent<HTMLDetailsElement>) {
    const menu = menuRef.current;
    if (event.key !== "Escape" || !menu?.open) return;
    menu.open = false;
    menu.querySelector("summary")?.focus();
  }

  return (
    <header className="relative z-40 border-b border-paper-300 bg-paper-50/95 backdrop-blur-sm">
      <a
        href={`#${mainId}`}
        className="sr-only rounded-lg bg-moss-800 px-4 py-2 font-bold text-paper-50 focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50"
      >
        Skip to main content
      </a>
      <div className="mx-auto flex min-h-16 max-w-page items-center gap-4 px-4 sm:px-6">
        <Link href="/" className="shrink-0 rounded-lg no-underline" aria-label="Roostwright home">
          <Wordmark />
        </Link>

        <nav aria-label="Main" className="hidden min-w-0 flex-1 xl:block">
          {/* The page's own address is known only at request time on pages with a parameter: the
              links render without "current" in the prerendered shell, and mark it once it streams. */}
          <Suspense fallback={<RowLinks nav={nav} pathname={null} />}>
            <CurrentRowLinks nav={nav} />
          </Suspense>
        </nav>

        <div className="ml-auto hidden shrink-0 items-center gap-3 xl:flex">
          <UserArea user={user} />
        </div>

        <details ref={menuRef} onKeyDown={closeOnEscape} className="group ml-auto xl:hidden">
          <summary
            className={cn(
              "flex min-h-11 cursor-pointer list-none items-center gap-2 rounded-lg border border-moss-600 px-3.5 font-bold text-moss-800",
              "hover:bg-moss-50 [&::-webkit-details-marker]:hidden",
            )}
          >
            <svg viewBox="0 0 20 20" aria-hidden="true" className="size-5 fill-current">
              <path className="group-open:hidden" d="M3 5h14v2H3zm0 4h14v2H3zm0 4h14v2H3z" />
              <path
                className="hidden group-open:block"
                d="M5.7 4.3 10 8.6l4.3-4.3 1.4 1.4L11.4 10l4.3 4.3-1.4 1.4L10 11.4l-4.3 4.3-1.4-1.4L8.6 10 4.3 5.7z"
              />
            </svg>
            Menu
          </summary>
          <div className="absolute inset-x-0 top-full border-b border-paper-300 bg-paper-50 px-4 pt-2 pb-5 shadow-lift sm:px-6">
            <nav aria-label="Main">
              <Suspense fallback={<MenuLinks nav={nav} pathname={null} />}>
                <CurrentMenuLinks nav={nav} menuRef={menuRef} />
              </Suspense>
            </nav>
            <div className="mt-4 flex flex-wrap items-center gap-3 border-t border-paper-300 pt-4">
              <UserArea user={user} />
            </div>
          </div>
        </details>
      </div>
    </header>
  );
}

function UserArea({ user }: { user: HeaderUser | null | undefined }) {
  // Not known yet: hold the space the buttons take, so nothing moves when they arrive.
  if (user === undefined) return <span aria-hidden className="block h-9 w-56" />;
  if (!user) {
    return (
      <>
        <ButtonLink href="/sign-in" variant="ghost" size="sm">
          Sign in
        </ButtonLink>
        <ButtonLink href="/sign-up" variant="secondary" size="sm">
          Create account
        </ButtonLink>
      </>
    );
  }
  return (
    <>
      <p className="flex max-w-48 flex-col text-sm leading-tight">
        <span className="truncate font-bold text-ink">{user.name}</span>
        <span className="truncate text-ink-soft">
          {isRole(user.role) ? ROLE_LABELS[user.role] : user.role}
        </span>
      </p>
      <SignOutButton size="sm" />
    </>
  );
}

function marked(nav: NavLink[], pathname: string | null) {
  return nav.map((item) => ({ ...item, current: pathname !== null && isCurrent(pathname, item.href) }));
}

function CurrentRowLinks({ nav }: { nav: NavLink[] }) {
  return <RowLinks nav={nav} pathname={usePathname() ?? "/"} />;
}

function RowLinks({ nav, pathname }: { nav: NavLink[]; pathname: string | null }) {
  return (
    <ul className="flex items-center gap-0.5">
      {marked(nav, pathname).map((item) => (
        <li key={item.href}>
          <Link
            href={item.href}
            aria-current={item.current ? "page" : undefined}
            className={cn(
              "block rounded-lg px-2.5 py-2 font-bold whitespace-nowrap text-ink no-underline hover:bg-moss-50 hover:text-moss-800",
              item.current && "bg-moss-50 text-moss-800 shadow-[inset_0_-3px_0] shadow-ember-400",
            )}
          >
            {item.label}
          </Link>
        </li>
      ))}
    </ul>
  );
}

function CurrentMenuLinks({ nav, menuRef }: { nav: NavLink[]; menuRef: RefObject<HTMLDetailsElement | null> }) {
  const pathname = usePathname() ?? "/";
  // The header outlives client-side navigation, so close the phone menu once a link is followed.
  useEffect(() => {
    if (menuRef.current) menuRef.current.open = false;
  }, [pathname, menuRef]);
  return <MenuLinks nav={nav} pathname={pathname} />;
}

function MenuLinks({ nav, pathname }: { nav: NavLink[]; pathname: string | null }) {
  return (
    <ul className="flex flex-col">
      {marked(nav, pathname).map((item) => (
        <li key={item.href} className="border-b border-paper-200 last:border-b-0">
          <Link
            href={item.href}
            aria-current={item.current ? "page" : undefined}
            className={cn(
              "flex min-h-12 items-center rounded-lg px-2 text-lg font-bold text-ink no-underline hover:bg-moss-50",
              item.current && "border-l-4 border-ember-400 pl-3 text-moss-800",
            )}
          >
            {item.label}
          </Link>
        </li>
      ))}
    </ul>
  );
}
