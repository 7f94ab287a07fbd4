import { forwardRef, useId, type InputHTMLAttributes, type ReactNode } from "react";

import { cn } from "./cn";

export type CheckboxProps = Omit<InputHTMLAttributes<HTMLInputElement>, "type"> & {
  /** The clickable label beside the box. */
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
};

/**
 * A native checkbox with its label, hint and error tied by ids. The native control keeps its
 * keyboard and screen reader behaviour; accent-color gives it our moss green.
 */
export const Checkbox = forwardRef<HTMLInputElement, CheckboxProps>(function Checkbox(
  { label, hint, error, id, className, ...rest },
  ref,
) {
  const autoId = useId();
  const inputId = id ?? `check${autoId.replace(/:/g, "")}`;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  const describedBy = [hintId, errorId, rest["aria-describedby"]].filter(Boolean).join(" ");

  return (
    <div className={cn("flex items-start gap-3", className)}>
      <input
        ref={ref}
        id={inputId}
        type="checkbox"
        className={cn(
          "mt-0.5 size-5 shrink-0 cursor-pointer rounded border-bark-500 accent-moss-700",
          "focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-dusk-500",
          "disabled:cursor-not-allowed",
        )}
        {...rest}
        aria-describedby={describedBy || undefined}
        aria-invalid={error ? true : rest["aria-invalid"]}
      />
      <div className="flex flex-col gap-0.5">
        <label htmlFor={inputId} className="cursor-pointer leading-snug text-ink">
          {label}
        </label>
        {hint ? (
          <p id={hintId} className="text-sm text-ink-soft">
            {hint}
          </p>
        ) : null}
        {error ? (
          <p id={errorId} className="text-sm font-bold text-berry-700">
            {error}
          </p>
        ) : null}
      </div>
    </div>
  );
});
