import { cn } from "./cn";
import type { Rating } from "@/lib/shared/rating";

export type Tone = "neutral" | Rating | "info" | "warn";

// Each tone has its own shape as well as its colour, so a status never rests on colour alone
// (WCAG 1.4.1). Drawn with even-odd fills: the marks are holes that show the ground beneath.
const paths: Record<Tone, string> = {
  neutral: "M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm0 5.5a2.5 2.5 0 1 0 0 5 2.5 2.5 0 0 0 0-5Z",
  info: "M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16ZM9.1 9h1.8v5H9.1V9Zm0-3h1.8v1.8H9.1V6Z",
  good: "M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm-1.4 11.4L5 9.8l1.4-1.4 2.2 2.2 5-5 1.4 1.4-6.4 6.4Z",
  fair: "M10 2.5 18.5 17h-17L10 2.5ZM9.1 7.5h1.8v4.8H9.1V7.5Zm0 5.9h1.8v1.8H9.1v-1.8Z",
  warn: "M10 2.5 18.5 17h-17L10 2.5ZM9.1 7.5h1.8v4.8H9.1V7.5Zm0 5.9h1.8v1.8H9.1v-1.8Z",
  poor: "M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16ZM7.2 5.8 10 8.6l2.8-2.8 1.4 1.4-2.8 2.8 2.8 2.8-1.4 1.4-2.8-2.8-2.8 2.8-1.4-1.4L8.6 10 5.8 7.2l1.4-1.4Z",
};

/** A status glyph in the current text colour (give it a size class); decorative, the words carry the meaning. */
export function ToneIcon({ tone, className }: { tone: Tone; className?: string }) {
  return (
    <svg viewBox="0 0 20 20" aria-hidden="true" className={cn("shrink-0 fill-current", className)}>
      <path fillRule="evenodd" d={paths[tone]} />
    </svg>
  );
}
