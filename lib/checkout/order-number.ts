/** How an order's number is shown: "RW-" and at least five digits (our own format). */
export function formatOrderNumber(n: number): string {
  return `RW-${String(n).padStart(5, "0")}`;
}

/** Accepts "RW-00042", "rw42" or "42" as typed in a search box. */
export function parseOrderNumber(text: string): number | null {
  const m = /^\s*(?:rw-?)?0*(\d{1,9})\s*$/i.exec(text);
  return m ? Number(m[1]) : null;
}
