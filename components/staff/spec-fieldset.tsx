"use client";

import type { ReactNode } from "react";
import type { UseFormReturn } from "react-hook-form";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import {
  INTERIOR_FINISHES,
  INTERIOR_FINISH_LABELS,
  INTERIOR_SURFACES,
  INTERIOR_SURFACE_LABELS,
  SHADES,
  SHADE_LABELS,
  WOODS,
  WOOD_LABELS,
  type HouseSpec,
} from "@/lib/catalog/spec";
import type { DraftCheck } from "@/lib/staff/draft-check";
import type { ModelInput } from "@/lib/staff/model-input";
import { CheckNote } from "./check-note";
import { inches, wholeNumber } from "./field-formats";
import { ParsedInput } from "./parsed-input";

type Form = UseFormReturn<ModelInput>;
type SpecField = keyof HouseSpec;

const emptyToUndefined = (v: unknown) => (v === "" ? undefined : v);

/** A field on the left and the criteria that read it on the right (stacked on a phone). */
function Row({
  field,
  check,
  children,
}: {
  field: SpecField;
  check: DraftCheck;
  children: ReactNode;
}) {
  const results = check.results.filter((r) => r.field === field);
  return (
    <div className="grid gap-3 border-t border-paper-200 py-4 first:border-t-0 first:pt-0 md:grid-cols-[minmax(0,1fr)_minmax(0,1.1fr)] md:gap-6">
      <div>{children}</div>
      <div className="flex flex-col gap-2">
        {results.map((r) => (
          <CheckNote key={r.id} result={r} />
        ))}
      </div>
    </div>
  );
}

const INCH_HINT = "Inches: 3/4, 1 1/2 or 0.75.";

export function SpecFieldset({ form, check }: { form: Form; check: DraftCheck }) {
  const { control, register, formState, watch } = form;
  const e = formState.errors.spec;
  const surface = watch("spec.interiorSurface");
  const inchField = (
    name:
      | "chamberGapIn"
      | "chamberHeightIn"
      | "chamberWidthIn"
      | "landingAreaIn"
      | "outerHeightIn"
      | "outerWidthIn"
      | "grooveSpacingIn"
      | "grooveDepthIn",
    label: string,
    hint: string,
    required = true,
  ) => (
    <Row field={name} check={check}>
      <Field label={label} hint={hint} error={e?.[name]?.message} required={required}>
        <ParsedInput
          control={control}
          name={`spec.${name}`}
          inputMode="decimal"
          parse={inches.parse}
          format={inches.format}
        />
      </Field>
    </Row>
  );

  return (
    <div className="flex flex-col">
      <Row field="chamberCount" check={check}>
        <Field
          label="Chambers"
          hint="How many roosting crevices, front to back."
          error={e?.chamberCount?.message}
          required
        >
          <ParsedInput
            control={control}
            name="spec.chamberCount"
            inputMode="numeric"
            parse={wholeNumber.parse}
            format={wholeNumber.format}
          />
        </Field>
      </Row>
      {inchField("chamberGapIn", "Chamber gap", `Front to back inside one crevice. ${INCH_HINT}`)}
      {inchField("chamberHeightIn", "Chamber height", `Inside, top to bottom. ${INCH_HINT}`)}
      {inchField("chamberWidthIn", "Chamber width", `Inside, side to side. ${INCH_HINT}`)}
      {inchField(
        "landingAreaIn",
        "Landing area",
        `How far the back board reaches below the entrance; 0 if none. ${INCH_HINT}`,
      )}
      <Row field="interiorSurface" check={check}>
        <Field
          label="Inside surface"
          hint="What bats grip on inside the chambers."
          error={e?.interiorSurface?.message}
          required
        >
          <Select {...register("spec.interiorSurface", { setValueAs: emptyToUndefined })}>
            <option value="">Choose…</option>
            {INTERIOR_SURFACES.map((s) => (
              <option key={s} value={s}>
                {INTERIOR_SURFACE_LABELS[s]}
              </option>
            ))}
          </Select>
        </Field>
      </Row>
      {surface === "grooved" ? (
        <>
          {inchField(
            "grooveSpacingIn",
            "Groove spacing",
            `Distance between grooves, usually 1/4 to 1/2. ${INCH_HINT}`,
          )}
          {inchField("grooveDepthIn", "Groove depth", "Usually 1/32 to 1/16 in (0.03 to 0.06).")}
        </>
      ) : null}
      <Row field="interiorFinish" check={check}>
        <Field label="Inside finish" error={e?.interiorFinish?.message} required>
          <Select {...register("spec.interiorFinish", { setValueAs: emptyToUndefined })}>
            <option value="">Choose…</option>
            {INTERIOR_FINISHES.map((s) => (
              <option key={s} value={s}>
                {INTERIOR_FINISH_LABELS[s]}
              </option>
            ))}
          </Select>
        </Field>
      </Row>
      <Row field="seamsSealed" check={check}>
        <Checkbox
          label="Seams are sealed (caulked, above all at the roof)"
          error={e?.seamsSealed?.message}
          {...register("spec.seamsSealed")}
        />
      </Row>
      <Row field="wood" check={check}>
        <Field label="Wood" error={e?.wood?.message} required>
          <Select {...register("spec.wood", { setValueAs: emptyToUndefined })}>
            <option value="">Choose…</option>
            {WOODS.map((s) => (
              <option key={s} value={s}>
                {WOOD_LABELS[s]}
              </option>
            ))}
          </Select>
        </Field>
      </Row>
      {inchField("outerHeightIn", "Outside height", `The whole house, top to bottom. ${INCH_HINT}`)}
      {inchField("outerWidthIn", "Outside width", `The whole house, side to side. ${INCH_HINT}`)}
      <Row field="openBottom" check={check}>
        <Checkbox
          label="Open bottom (no floor, so droppings fall out)"
          error={e?.openBottom?.message}
          {...register("spec.openBottom")}
        />
      </Row>
      <Row field="exteriorShade" check={check}>
        <Field
          label="Outside shade"
          hint="Decides which summers the house suits: darker for cool summers, lighter for hot."
          error={e?.exteriorShade?.message}
          required
        >
          <Select {...register("spec.exteriorShade", { setValueAs: emptyToUndefined })}>
            <option value="">Choose…</option>
            {SHADES.map((s) => (
              <option key={s} value={s}>
                {SHADE_LABELS[s]}
              </option>
            ))}
          </Select>
        </Field>
      </Row>
      <Row field="vented" check={check}>
        <Checkbox
          label="Has vents (needed where July highs reach 85 °F)"
          error={e?.vented?.message}
          {...register("spec.vented")}
        />
      </Row>
    </div>
  );
}
