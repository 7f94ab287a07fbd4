// A staff alert goes out when a model's stock falls under its low-stock threshold: once, at the
// crossing (before ≥ threshold > after), not on every later sale while it stays low.
// Common practice (reorder-point alerts), no source.

export function crossesLowStock({
  before,
  after,
  threshold,
}: {
  before: number;
  after: number;
  threshold: number;
}): boolean {
  return after < threshold && threshold <= before;
}
