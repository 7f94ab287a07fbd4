import { parseUsd } from "@/lib/checkout/money";
import { inchesForInput, parseInches, parseWholeNumber } from "@/lib/staff/parse-inches";

// Parse and format pairs for ParsedInput, kept stable (module level) so effects do not rerun.

export const inches = { parse: parseInches, format: inchesForInput };

export const wholeNumber = {
  parse: parseWholeNumber,
  format: (n: number | undefined) => (n === undefined || Number.isNaN(n) ? "" : String(n)),
};

export const decimal = {
  parse: (text: string) =>
    text.trim() === ""
      ? undefined
      : /^\d+(\.\d+)?$/.test(text.trim())
        ? Number(text.trim())
        : Number.NaN,
  format: (n: number | undefined) => (n === undefined || Number.isNaN(n) ? "" : String(n)),
};

export const dollars = {
  parse: (text: string) => {
    if (text.trim() === "") return undefined;
    const parsed = parseUsd(text);
    return parsed.ok ? parsed.cents : Number.NaN;
  },
  format: (cents: number | undefined) =>
    cents === undefined || Number.isNaN(cents) ? "" : (cents / 100).toFixed(2),
};
