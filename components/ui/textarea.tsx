"use client";

import { forwardRef, type TextareaHTMLAttributes } from "react";

import { cn } from "./cn";
import { getControlClasses } from "./control-classes";
import { useFieldControlProps } from "./field-context";

export type TextareaProps = TextareaHTMLAttributes<HTMLTextAreaElement> & { invalid?: boolean };

/** A multi-line input that grows only when the reader drags it (vertical resize). */
export const Textarea = forwardRef<HTMLTextAreaElement, TextareaProps>(function Textarea(
  { className, invalid, id, rows = 4, ...rest },
  ref,
) {
  const aria = useFieldControlProps({ ...rest, id, invalid });
  return (
    <textarea
      ref={ref}
      rows={rows}
      className={getControlClasses(cn("resize-y py-2.5 leading-relaxed", className))}
      {...rest}
      {...aria}
    />
  );
});
