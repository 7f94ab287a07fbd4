"use client";

import { forwardRef, type SelectHTMLAttributes } from "react";

import { cn } from "./cn";
import { getControlClasses } from "./control-classes";
import { useFieldControlProps } from "./field-context";

export type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { invalid?: boolean };

/**
 * A native select (keyboard, screen reader and phone pickers for free) with our own chevron.
 * Pass `<option>` children.
 */
export const Select = forwardRef<HTMLSelectElement, SelectProps>(function Select(
  { className, invalid, id, children, ...rest },
  ref,
) {
  const aria = useFieldControlProps({ ...rest, id, invalid });
  return (
    <div className={cn("relative", className)}>
      <select
        ref={ref}
        className={getControlClasses("min-h-11 cursor-pointer appearance-none pr-10")}
        {...rest}
        {...aria}
      >
        {children}
      </select>
      <svg
        viewBox="0 0 20 20"
        aria-hidden="true"
        className="pointer-events-none absolute top-1/2 right-3 size-5 -translate-y-1/2 fill-bark-600"
      >
        <path d="M5.3 7.3a1 1 0 0 1 1.4 0L10 10.6l3.3-3.3a1 1 0 1 1 1.4 1.4l-4 4a1 1 0 0 1-1.4 0l-4-4a1 1 0 0 1 0-1.4Z" />
      </svg>
    </div>
  );
});
