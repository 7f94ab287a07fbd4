import { cn } from "@/components/ui/cn";

import { LogoMark } from "./logo-mark";

type WordmarkProps = {
  className?: string;
  tone?: "dark" | "light";
  /** The center's name (from its settings) set under the store's, for the footer. */
  centerName?: string;
};

/** The mark and the name "Roostwright" set in the display face. */
export function Wordmark({ className, tone = "dark", centerName }: WordmarkProps) {
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
        {centerName ? (
          <span className={cn("mt-1 text-xs", tone === "dark" ? "text-ink-soft" : "text-moss-200")}>{centerName}</span>
        ) : null}
      </span>
    </span>
  );
}
