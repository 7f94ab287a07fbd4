import { cn } from "./cn";

// Shared look of text-like controls. bark-400 edges reach 3.8:1 on paper-50 (WCAG 1.4.11);
// an invalid control turns berry so the error shows in more than the message text.
export function getControlClasses(className?: string): string {
  return cn(
    "block w-full rounded-lg border border-bark-400 bg-paper-50 px-3 text-base text-ink shadow-inner shadow-bark-900/5",
    "placeholder:text-bark-500",
    "focus-visible:border-dusk-600 focus-visible:outline-3 focus-visible:outline-offset-1 focus-visible:outline-dusk-500",
    "aria-invalid:border-berry-600 aria-invalid:bg-berry-50",
    "disabled:cursor-not-allowed disabled:bg-paper-200 disabled:text-ink-soft",
    className,
  );
}
