// Billable weight of one carton (PRODUCT.md §5).
// Source: UPS and FedEx published dimensional-weight rules for U.S. daily rates: cubic inches
// divided by 139, any fraction of a pound raised to the next pound, billed on the greater of
// that and the actual weight; since 2025-08-18 each measured dimension is first rounded UP to
// the next whole inch (previously to the nearest inch). Published check: a 26 × 16 × 6 in carton
// bills at 18 lb (2,496 in³ / 139 = 17.96).

/** Cubic inches per billable pound for U.S. daily rates (UPS and FedEx, divisor 139). */
export const DIM_DIVISOR_CUBIC_IN_PER_LB = 139;

// A carton measured in centimetres or computed from fractions can arrive as 26.000000000000004;
// without this slack float noise alone would add a whole inch (or pound) to the bill.
const FLOAT_SLACK = 1e-9;

export type Carton = { lengthIn: number; widthIn: number; heightIn: number; weightLb: number };

export type BillableWeight = {
  /** Actual weight, rounded up to the next whole pound. */
  actualLb: number;
  /** Dimensional weight: rounded L × W × H / 139, rounded up to the next whole pound. */
  dimLb: number;
  /** The greater of the two: what the carrier charges for. */
  billableLb: number;
  /** Each dimension rounded up to the next whole inch, as the carrier measures it. */
  roundedDims: { lengthIn: number; widthIn: number; heightIn: number };
};

function roundUpWhole(value: number): number {
  // Anything positive counts as at least 1 (inch or pound), however close to zero.
  return Math.max(1, Math.ceil(value - FLOAT_SLACK));
}

function assertPositive(name: keyof Carton, value: number): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`The carton ${name} must be a positive number, got ${value}.`);
  }
}

/** Billable weight of a carton with its parts, so the packing screen can show how it was reached. */
export function billableWeightLb(carton: Carton): BillableWeight {
  for (const name of ["lengthIn", "widthIn", "heightIn", "weightLb"] as const) {
    assertPositive(name, carton[name]);
  }
  const roundedDims = {
    lengthIn: roundUpWhole(carton.lengthIn),
    widthIn: roundUpWhole(carton.widthIn),
    heightIn: roundUpWhole(carton.heightIn),
  };
  const cubicIn = roundedDims.lengthIn * roundedDims.widthIn * roundedDims.heightIn;
  // Integer ceiling division: exact, where cubicIn / 139 in floating point need not be.
  const dimLb = Math.floor(
    (cubicIn + DIM_DIVISOR_CUBIC_IN_PER_LB - 1) / DIM_DIVISOR_CUBIC_IN_PER_LB,
  );
  const actualLb = roundUpWhole(carton.weightLb);
  return { actualLb, dimLb, billableLb: Math.max(actualLb, dimLb), roundedDims };
}
