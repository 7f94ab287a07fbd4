import { cn } from "@/components/ui/cn";

import { LogoMark } from "./logo-mark";

type WordmarkProps = {
  className?: string;
  tone?: "dark" | "light";
  /** Adds the center's name under the store's, for the footer and e-mails. */
  withCenter?: boolean;
};

/** The mark and the name "Roostwright" set in the display face. */
export function Wordmark({ className, tone = "dark", withCenter = false }: WordmarkProps) {
  return (
    <span className={cn("inline-flex items-center gap-2.5", className)}>
      <LogoMark tone={tone} className="size-10 shrink-0" />
      <span className="flex flex-col leading-none">
        <span
          className={cn(
            "font-display text-[1.4rem] font-semibold tracking-tight",
            tone === "dark" ? "text-moss-800" : "text-paper-50",
          )}
        >
          Roostwright
        </span>
        {withCenter ? (
          <span className={cn("mt-1 text-xs", tone === "dark" ? "text-ink-soft" : "text-moss-200")}>
            Cedar Hollow Wildlife Rescue
          </span>
        ) : null}
      </span>
    </span>
  );
}
