import type { ReactNode } from "react";

/** The title block at the top of a page. */
export function PageHeader({ title, lead, children }: { title: string; lead?: ReactNode; children?: ReactNode }) {
  return (
    <header className="mb-8 flex flex-col gap-3">
      <h1 className="font-display text-3xl font-semibold text-moss-900 sm:text-4xl">{title}</h1>
      {lead ? <p className="max-w-prose text-lg text-ink-soft">{lead}</p> : null}
      {children}
    </header>
  );
}

/** The centred column pages sit in. */
export function PageShell({ children, narrow = false }: { children: ReactNode; narrow?: boolean }) {
  return <div className={`mx-auto w-full px-4 py-10 sm:px-6 ${narrow ? "max-w-md" : "max-w-6xl"}`}>{children}</div>;
}
