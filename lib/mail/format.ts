// Dates in messages are read in UTC, the clock the payment service and the database keep, as
// lib/checkout/receipts.ts does for year-end statements, so a receipt and a statement never
// disagree about the day of a gift.

export function formatMailDate(date: Date): string {
  return new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: "UTC" }).format(date);
}

export function formatAddress(address: {
  name?: string;
  line1: string;
  line2?: string;
  city: string;
  state: string;
  zip: string;
}): string {
  return [
    address.name,
    address.line1,
    address.line2,
    `${address.city}, ${address.state} ${address.zip}`,
  ]
    .filter((part) => part && part.trim() !== "")
    .join(", ");
}
