"use client";

import { useId, type ReactNode } from "react";

import { cn } from "./cn";
import { FieldContext } from "./field-context";
import { ToneIcon } from "./tone-icon";

export type FieldProps = {
  label: ReactNode;
  /** Shown under the label and read after it, e.g. "Inside measurement, in inches". */
  hint?: ReactNode;
  /** The message to show; its presence marks the control invalid. */
  error?: string;
  /** Says "required" in words next to the label (not only a red star). */
  required?: boolean;
  /** Use when the control needs a known id (for tests or anchors); otherwise one is made. */
  id?: string;
  className?: string;
  children: ReactNode;
};

/** Label, hint and error around one control (Input, Textarea or Select), tied by ids. */
export function Field({
  label,
  hint,
  error,
  required = false,
  id,
  className,
  children,
}: FieldProps) {
  const autoId = useId();
  const controlId = id ?? `field${autoId.replace(/:/g, "")}`;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = error ? `${controlId}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;

  return (
    <div className={cn("flex flex-col gap-1.5", className)}>
      <label htmlFor={controlId} className="font-bold text-ink">
        {label}
        {required ? (
          <span className="ml-1.5 text-sm font-normal text-ink-soft">(required)</span>
        ) : null}
      </label>
      {hint ? (
        <p id={hintId} className="-mt-0.5 text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <FieldContext value={{ controlId, describedBy, invalid: Boolean(error), required }}>
        {children}
      </FieldContext>
      {error ? (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-bold text-berry-700">
          <ToneIcon tone="poor" className="mt-px size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}
