// Dates in messages: a gift's date is the center's calendar day (pass its time zone,
// lib/giving/queries.ts getCenterTimeZone), so a receipt and a statement never disagree about
// the day of a gift. Without a zone the date is read in UTC.

export function formatMailDate(date: Date, timeZone = "UTC"): string {
  return new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone }).format(date);
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
