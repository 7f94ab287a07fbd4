"use client";

import { forwardRef, type InputHTMLAttributes } from "react";

import { cn } from "./cn";
import { getControlClasses } from "./control-classes";
import { useFieldControlProps } from "./field-context";

export type InputProps = InputHTMLAttributes<HTMLInputElement> & {
  /** Marks the input invalid when used outside a Field (a Field sets this from its error). */
  invalid?: boolean;
};

/** A single-line text input; forwards its ref so react-hook-form's `register` works. */
export const Input = forwardRef<HTMLInputElement, InputProps>(function Input(
  { className, invalid, id, type = "text", ...rest },
  ref,
) {
  const aria = useFieldControlProps({ ...rest, id, invalid });
  return (
    <input
      ref={ref}
      type={type}
      className={getControlClasses(cn("min-h-11", className))}
      {...rest}
      {...aria}
    />
  );
});
