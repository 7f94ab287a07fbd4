// Writes CSV for the queue export.
// Source: RFC 4180, "Common Format and MIME Type for Comma-Separated Values (CSV) Files" (2005):
// records end with CRLF; a field holding a comma, a double quote, CR or LF is wrapped in double
// quotes and each double quote inside is doubled.
// Spreadsheet formula guard: OWASP, "CSV Injection" (community page, read from memory): a text
// cell that starts with =, +, -, @, tab or CR is run as a formula by spreadsheet programs, so it
// gets a leading apostrophe. Buyer names come from a public checkout form.

export type CsvCell = string | number | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

/** One field, quoted and guarded as needed; numbers are written as they are. */
export function csvField(value: CsvCell): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A whole file: a header record, then one record per row, every record ending in CRLF. */
export function toCsv({ header, rows }: { header: readonly string[]; rows: readonly (readonly CsvCell[])[] }): string {
  return [header, ...rows].map((record) => `${record.map(csvField).join(",")}\r\n`).join("");
}
