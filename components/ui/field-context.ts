"use client";

import { createContext, useContext } from "react";

// A Field hands its control the ids it needs, so `<Field label="…"><Input {...register("x")} /></Field>`
// is labelled and described without the caller wiring ids by hand.
type FieldContextValue = {
  controlId: string;
  describedBy: string | undefined;
  invalid: boolean;
  required: boolean;
};

export const FieldContext = createContext<FieldContextValue | null>(null);

type ControlAria = {
  id?: string;
  "aria-describedby"?: string;
  "aria-invalid"?: boolean | "true" | "false" | "grammar" | "spelling";
  "aria-required"?: boolean | "true" | "false";
  invalid?: boolean;
};

/** Merges a control's own props with its Field's ids; the control's own props win. */
export function useFieldControlProps(props: ControlAria) {
  const field = useContext(FieldContext);
  const invalid = props.invalid ?? (field?.invalid || undefined);
  const describedBy = [field?.describedBy, props["aria-describedby"]].filter(Boolean).join(" ");
  return {
    id: props.id ?? field?.controlId,
    "aria-describedby": describedBy || undefined,
    "aria-invalid": props["aria-invalid"] ?? (invalid ? true : undefined),
    "aria-required": props["aria-required"] ?? (field?.required || undefined),
  };
}
