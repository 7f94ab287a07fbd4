import {
  fedexExpressCheckDigit,
  mod10Weight31CheckDigit,
  s10CheckDigit,
  upsCheckDigit,
} from "./check-digits";

// Tracking numbers typed or scanned at the packing bench. A check digit catches a mistyped digit
// before a buyer gets a link to someone else's parcel (or to nothing).

export const CARRIERS = ["ups", "usps", "fedex", "other"] as const;
export type Carrier = (typeof CARRIERS)[number];

export function isCarrier(value: unknown): value is Carrier {
  return typeof value === "string" && (CARRIERS as readonly string[]).includes(value);
}

export const CARRIER_LABELS: Record<Carrier, string> = {
  ups: "UPS",
  usps: "USPS",
  fedex: "FedEx",
  other: "Another carrier",
};

export type TrackingFormat =
  | "ups-1z"
  | "usps-impb"
  | "usps-20"
  | "usps-s10"
  | "fedex-12"
  | "fedex-15"
  | "fedex-20"
  | "fedex-22"
  | "fedex-34"
  | "other";

export type TrackingCheck =
  | { ok: true; normalized: string; url: string | null; format: TrackingFormat }
  | { ok: false; message: string };

export const TYPO_MESSAGE =
  "The last digit doesn't match the rest of the number; check for a typo.";

// The carriers' own public tracking pages, one number each. From memory: this machine has no
// network to check them; the open dataset jkeen/tracking_number_data lists older addresses for
// the same pages.
const TRACKING_PAGES: Record<Exclude<Carrier, "other">, (number: string) => string> = {
  ups: (n) => `https://www.ups.com/track?tracknum=${encodeURIComponent(n)}`,
  usps: (n) => `https://tools.usps.com/go/TrackConfirmAction?tLabels=${encodeURIComponent(n)}`,
  fedex: (n) => `https://www.fedex.com/fedextrack/?trknbr=${encodeURIComponent(n)}`,
};

type Verdict = { format: TrackingFormat; normalized: string } | { message: string };

function lastDigit(text: string): number {
  return Number(text.slice(-1));
}

function checkedBy(format: TrackingFormat, normalized: string, valid: boolean): Verdict {
  return valid ? { format, normalized } : { message: TYPO_MESSAGE };
}

function checkUps(n: string): Verdict {
  if (!/^1Z[0-9A-Z]{15}\d$/.test(n)) {
    return {
      message: "A UPS tracking number starts with 1Z and has 18 letters and digits in all.",
    };
  }
  return checkedBy("ups-1z", n, upsCheckDigit(n.slice(2, -1)) === lastDigit(n));
}

function mod10Ok(n: string): boolean {
  return mod10Weight31CheckDigit(n.slice(0, -1)) === lastDigit(n);
}

// A scanned IMpb may carry the routing code first: "420" plus the 5- or 9-digit ZIP (USPS
// Publication 199). It is not part of the tracking number, so it is dropped.
function withoutRouting(n: string): string {
  if (!n.startsWith("420")) return n;
  const candidates = [n.slice(3 + 9), n.slice(3 + 5)].filter(
    (rest) => (rest.length === 22 || rest.length === 26) && rest.startsWith("9"),
  );
  // 34 digits fit both ZIP+4 with a 22-digit number and ZIP with a 26-digit one: the check digit decides.
  return candidates.find(mod10Ok) ?? candidates[0] ?? n;
}

function checkUsps(n: string): Verdict {
  // International items: the UPU S10 form, e.g. two letters, 8 digits, check digit, "US".
  if (/^[A-Z]{2}\d{9}[A-Z]{2}$/.test(n)) {
    return checkedBy("usps-s10", n, s10CheckDigit(n.slice(2, 10)) === Number(n.charAt(10)));
  }
  const number = withoutRouting(n);
  // IMpb: 22 digits (26 with a 9-digit mailer ID), starting with the application identifier 9x.
  if (/^9\d{21}$/.test(number) || /^9\d{25}$/.test(number))
    return checkedBy("usps-impb", number, mod10Ok(number));
  // Older 20-digit numbers, same mod 10. Some legacy Certified Mail numbers were checked with the
  // barcode's hidden "91" prefix instead; we refuse those rather than accept two check digits,
  // which would let about one typo in nine through.
  if (/^\d{20}$/.test(number)) return checkedBy("usps-20", number, mod10Ok(number));
  return {
    message:
      "A USPS tracking number has 20, 22 or 26 digits (most start with 9), or, for international mail, " +
      "2 letters, 9 digits and 2 letters.",
  };
}

function checkFedex(n: string): Verdict {
  if (!/^\d+$/.test(n)) return { message: "A FedEx tracking number has digits only." };
  switch (n.length) {
    case 12:
      return checkedBy("fedex-12", n, fedexExpressCheckDigit(n.slice(0, -1)) === lastDigit(n));
    case 15:
      return checkedBy("fedex-15", n, mod10Ok(n));
    case 20:
      // Ground Economy numbers handed to USPS: IMpb mod 10 with the "92" identifier left off the
      // label (open dataset jkeen/tracking_number_data, "FedEx SmartPost"; no FedEx publication).
      return checkedBy("fedex-20", n, mod10Ok(`92${n}`));
    case 22:
      // "96" barcode: the last 15 digits are the Ground number with its own check digit; "92" is
      // the IMpb form of Ground Economy (open dataset, as above).
      if (n.startsWith("96")) return checkedBy("fedex-22", n, mod10Ok(n.slice(-15)));
      if (n.startsWith("92")) return checkedBy("fedex-22", n, mod10Ok(n));
      return { message: "A 22-digit FedEx number starts with 96 or 92." };
    case 34:
      // Express label barcode: it ends with the 12-digit tracking number (every example in the
      // open dataset does), so that is checked and kept.
      return checkedBy(
        "fedex-34",
        n.slice(-12),
        fedexExpressCheckDigit(n.slice(-12, -1)) === lastDigit(n),
      );
    default:
      return { message: "A FedEx tracking number has 12, 15, 20, 22 or 34 digits." };
  }
}

/** Normalizes (no spaces or dashes, uppercase), checks the shape and check digit, and links to the carrier's page. */
export function validateTrackingNumber({
  carrier,
  number,
}: {
  carrier: Carrier;
  number: string;
}): TrackingCheck {
  const normalized = number.replace(/[\s\-‐‑‒–—]/g, "").toUpperCase();
  if (normalized === "") return { ok: false, message: "Enter the tracking number from the label." };
  if (!/^[0-9A-Z]+$/.test(normalized)) {
    return {
      ok: false,
      message: "A tracking number has only letters and digits (spaces and dashes are fine).",
    };
  }
  if (carrier === "other") {
    if (normalized.length < 4 || normalized.length > 40) {
      return { ok: false, message: "Enter 4 to 40 letters and digits." };
    }
    // Unknown carriers have no check digit we can trust, and no tracking page we know.
    return { ok: true, normalized, url: null, format: "other" };
  }
  const verdict =
    carrier === "ups"
      ? checkUps(normalized)
      : carrier === "usps"
        ? checkUsps(normalized)
        : checkFedex(normalized);
  if ("message" in verdict) return { ok: false, message: verdict.message };
  return {
    ok: true,
    normalized: verdict.normalized,
    url: TRACKING_PAGES[carrier](verdict.normalized),
    format: verdict.format,
  };
}
