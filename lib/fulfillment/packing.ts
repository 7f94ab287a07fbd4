import { billableWeightLb, type BillableWeight } from "@/lib/checkout/billable-weight";

// Each house ships in its own carton (PRODUCT.md §5), so the packing form starts with one box
// per house, sized and weighed from the model's carton; the volunteer corrects what the scale says.

export type LineWithCarton = {
  name: string;
  quantity: number;
  carton: { lengthIn: number; widthIn: number; heightIn: number; weightLb: number };
};

export type BoxDraft = {
  description: string;
  lengthIn: number;
  widthIn: number;
  heightIn: number;
  weightLb: number;
};

/** One box per house: "Hollow Four (1 of 2)" when a model is ordered more than once. */
export function boxesForLines(lines: readonly LineWithCarton[]): BoxDraft[] {
  return lines.flatMap((line) =>
    Array.from({ length: line.quantity }, (_, index) => ({
      description: line.quantity > 1 ? `${line.name} (${index + 1} of ${line.quantity})` : line.name,
      ...line.carton,
    })),
  );
}

/** The billable weight of a box as typed, or null while a measurement is missing or not positive. */
export function billableForBox(box: Partial<BoxDraft>): BillableWeight | null {
  const { lengthIn, widthIn, heightIn, weightLb } = box;
  const values = [lengthIn, widthIn, heightIn, weightLb];
  if (!values.every((v): v is number => typeof v === "number" && Number.isFinite(v) && v > 0)) return null;
  return billableWeightLb({ lengthIn: lengthIn!, widthIn: widthIn!, heightIn: heightIn!, weightLb: weightLb! });
}
