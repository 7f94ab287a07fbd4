"use client";

import { useState } from "react";
import { useController, type Control, type FieldValues, type Path } from "react-hook-form";
import { Input, type InputProps } from "@/components/ui/input";

type ParsedInputProps<T extends FieldValues> = Omit<
  InputProps,
  "name" | "value" | "defaultValue" | "onChange"
> & {
  control: Control<T>;
  name: Path<T>;
  /** Text → value: undefined when empty, NaN when unreadable (the schema then explains). */
  parse: (text: string) => number | undefined;
  format: (value: number | undefined) => string;
};

const same = (a: number | undefined, b: unknown) => (Number.isNaN(a) && Number.isNaN(b)) || a === b;

/**
 * A text box whose form value is a number read from what people type: "3/4" for inches, "149.50"
 * for dollars. The text stays as typed; only the parsed value goes into the form.
 */
export function ParsedInput<T extends FieldValues>({
  control,
  name,
  parse,
  format,
  ...rest
}: ParsedInputProps<T>) {
  const {
    field: { ref, name: fieldName, value, onBlur, onChange },
  } = useController({ control, name });
  const current = value as number | undefined;
  const [text, setText] = useState(() => format(current));
  const [seen, setSeen] = useState(current);
  // A change from outside (a reset after saving) shows the new value; typing never reformats.
  if (!same(seen, current)) {
    setSeen(current);
    if (!same(parse(text), current)) setText(format(current));
  }
  return (
    <Input
      {...rest}
      ref={ref}
      name={fieldName}
      value={text}
      autoComplete="off"
      onBlur={onBlur}
      onChange={(event) => {
        setText(event.target.value);
        onChange(parse(event.target.value));
      }}
    />
  );
}
