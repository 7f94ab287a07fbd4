import { cn } from "./cn";

/** A calm placeholder block while a part of the page streams in; screen readers hear the label once. */
export function Skeleton({ className }: { className?: string }) {
  return <div aria-hidden className={cn("animate-pulse rounded-xl bg-paper-200/70 motion-reduce:animate-none", className)} />;
}

/** A labelled region of placeholders, announced as loading. */
export function LoadingRegion({ label, children, className }: { label: string; children: React.ReactNode; className?: string }) {
  return (
    <div role="status" aria-live="polite" className={className}>
      <span className="sr-only">{label}</span>
      {children}
    </div>
  );
}
