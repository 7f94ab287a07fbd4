import { describe, expect, it } from "vitest";
import { TYPO_MESSAGE, validateTrackingNumber, type Carrier } from "@/lib/fulfillment/tracking";

// Example numbers: "open dataset" is jkeen/tracking_number_data (couriers/*.json), a public list
// of carrier examples; the S10 serial is Wikipedia's worked example for "S10 (UPU standard)".

/** Every number that differs from `n` in exactly one digit. */
function singleDigitTypos(n: string, positions?: (index: number) => boolean): string[] {
  const typos: string[] = [];
  [...n].forEach((char, index) => {
    if (!/\d/.test(char) || (positions && !positions(index))) return;
    for (let digit = 0; digit <= 9; digit += 1) {
      if (String(digit) !== char) typos.push(`${n.slice(0, index)}${digit}${n.slice(index + 1)}`);
    }
  });
  return typos;
}

function accepted(carrier: Carrier, numbers: string[]): string[] {
  return numbers.filter((number) => validateTrackingNumber({ carrier, number }).ok);
}

describe("UPS", () => {
  it("accepts a 1Z number typed with spaces and lowercase, and links to UPS tracking", () => {
    expect(validateTrackingNumber({ carrier: "ups", number: "1z 5r8 939 03 5756 7127" })).toEqual({
      ok: true,
      normalized: "1Z5R89390357567127",
      url: "https://www.ups.com/track?tracknum=1Z5R89390357567127",
      format: "ups-1z",
    });
  });

  it.each(["1Z879E930346834440", "1Z410E7W0392751591", "1Z8V92A70367203024"])(
    "accepts %s (open dataset)",
    (number) => {
      expect(validateTrackingNumber({ carrier: "ups", number }).ok).toBe(true);
    },
  );

  it("says which digit to look at for a typo", () => {
    expect(validateTrackingNumber({ carrier: "ups", number: "1Z5R89390357567128" })).toEqual({
      ok: false,
      message: TYPO_MESSAGE,
    });
    expect(TYPO_MESSAGE).toBe(
      "The last digit doesn't match the rest of the number; check for a typo.",
    );
  });

  it("catches every single-digit typo except a digit off by 5 in a weight-2 position", () => {
    const n = "1Z5R89390357567127";
    // Positions 2.. after "1Z": the 1st, 3rd, … characters weigh 1; the 2nd, 4th, … weigh 2 (odd indexes from 3).
    const weightOne = (index: number) => index >= 2 && index < 17 && index % 2 === 0;
    const weightTwo = (index: number) => index >= 2 && index < 17 && index % 2 === 1;
    expect(accepted("ups", singleDigitTypos(n, weightOne))).toEqual([]);
    expect(
      accepted(
        "ups",
        singleDigitTypos(n, (index) => index === 17),
      ),
    ).toEqual([]);
    const slipped = accepted("ups", singleDigitTypos(n, weightTwo));
    // 2 × 5 = 10 leaves the sum mod 10 unchanged: a known blind spot of this check.
    expect(slipped).toHaveLength(6);
    for (const typo of slipped) {
      const index = [...typo].findIndex((char, i) => char !== n[i]);
      expect(Math.abs(Number(typo[index]) - Number(n[index]))).toBe(5);
    }
  });

  it("explains the shape when it is not a 1Z number", () => {
    for (const number of ["2Z5R89390357567127", "1Z5R8939035756712", "1Z5R8939035756712A"]) {
      expect(validateTrackingNumber({ carrier: "ups", number })).toEqual({
        ok: false,
        message: "A UPS tracking number starts with 1Z and has 18 letters and digits in all.",
      });
    }
  });
});

describe("USPS", () => {
  it.each([
    ["9400 1112 0108 0805 4830 16", "9400111201080805483016"],
    ["9361-2898-7870-0317-6337-95", "9361289878700317633795"],
    ["9505 5110 6960 5048 6006 24", "9505511069605048600624"],
    ["92748931507708513018050063", "92748931507708513018050063"],
  ])("accepts the IMpb number %s (open dataset)", (number, normalized) => {
    expect(validateTrackingNumber({ carrier: "usps", number })).toEqual({
      ok: true,
      normalized,
      url: `https://tools.usps.com/go/TrackConfirmAction?tLabels=${normalized}`,
      format: "usps-impb",
    });
  });

  it("drops a scanned 420 + ZIP routing prefix (Publication 199) and keeps the tracking number", () => {
    const cases: [string, string][] = [
      ["420 22153 9101026837331000039521", "9101026837331000039521"], // ZIP
      ["4201002334249200190132607600833457", "9200190132607600833457"], // ZIP+4
      ["4201028200009261290113185417468510", "9261290113185417468510"], // ZIP+4
    ];
    for (const [number, normalized] of cases) {
      expect(validateTrackingNumber({ carrier: "usps", number })).toMatchObject({
        ok: true,
        normalized,
      });
    }
    expect(
      validateTrackingNumber({ carrier: "usps", number: "4201028200009261290113185417468511" }),
    ).toEqual({
      ok: false,
      message: TYPO_MESSAGE,
    });
  });

  it("accepts a 20-digit number with the same check (open dataset)", () => {
    expect(
      validateTrackingNumber({ carrier: "usps", number: "0307 1790 0005 2348 3741" }),
    ).toMatchObject({ ok: true, format: "usps-20" });
  });

  it("catches every single-digit typo in IMpb and 20-digit numbers (weights 3 and 1 are prime to 10)", () => {
    expect(accepted("usps", singleDigitTypos("9400111201080805483016"))).toEqual([]);
    expect(accepted("usps", singleDigitTypos("92748931507708513018050063"))).toEqual([]);
    expect(accepted("usps", singleDigitTypos("03071790000523483741"))).toEqual([]);
  });

  it("accepts international S10 numbers and checks their digit", () => {
    // Wikipedia's worked serial 47312482 → 9, given US service and country letters.
    expect(validateTrackingNumber({ carrier: "usps", number: "rr 473 124 829 us" })).toEqual({
      ok: true,
      normalized: "RR473124829US",
      url: "https://tools.usps.com/go/TrackConfirmAction?tLabels=RR473124829US",
      format: "usps-s10",
    });
    expect(validateTrackingNumber({ carrier: "usps", number: "RB123456785US" }).ok).toBe(true); // open dataset
    expect(validateTrackingNumber({ carrier: "usps", number: "RB123456786US" })).toEqual({
      ok: false,
      message: TYPO_MESSAGE,
    });
    // The check digit 9 is not the C = 5 that two remainders share, so every serial typo shows.
    expect(accepted("usps", singleDigitTypos("RR473124829US"))).toEqual([]);
  });

  it("refuses the legacy numbers checked with a hidden 91 prefix rather than accept two check digits", () => {
    expect(validateTrackingNumber({ carrier: "usps", number: "7196 9010 7560 0307 7385" })).toEqual(
      { ok: false, message: TYPO_MESSAGE },
    );
  });

  it("explains the accepted shapes", () => {
    const result = validateTrackingNumber({ carrier: "usps", number: "12345" });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain("20, 22 or 26 digits");
  });
});

describe("FedEx", () => {
  it.each([
    ["9865 7878 8855", "fedex-12"],
    ["799531274483", "fedex-12"],
    ["0414 4176 0228 964", "fedex-15"],
    ["568283610012734", "fedex-15"],
    ["61299998820821171811", "fedex-20"],
    ["9611020987654312345672", "fedex-22"],
    ["9261292700768711948021", "fedex-22"],
  ])("accepts %s (open dataset) as %s", (number, format) => {
    const normalized = number.replaceAll(" ", "");
    expect(validateTrackingNumber({ carrier: "fedex", number })).toEqual({
      ok: true,
      normalized,
      url: `https://www.fedex.com/fedextrack/?trknbr=${normalized}`,
      format,
    });
  });

  it("keeps the 12-digit number from a scanned 34-digit Express barcode", () => {
    expect(
      validateTrackingNumber({ carrier: "fedex", number: "1001921334250001000300779017972697" }),
    ).toMatchObject({
      ok: true,
      normalized: "779017972697",
      format: "fedex-34",
    });
  });

  it.each([
    "996578788855",
    "568283610012732",
    "9261292700768711948020",
    "61299998820821171812",
    "9611020987654312345673",
  ])("refuses the mistyped %s", (number) => {
    expect(validateTrackingNumber({ carrier: "fedex", number })).toEqual({
      ok: false,
      message: TYPO_MESSAGE,
    });
  });

  it("catches every single-digit typo in 12-digit (check not 0), 15-digit and 20-digit numbers", () => {
    expect(accepted("fedex", singleDigitTypos("986578788855"))).toEqual([]);
    expect(accepted("fedex", singleDigitTypos("041441760228964"))).toEqual([]);
    expect(accepted("fedex", singleDigitTypos("61299998820821171811"))).toEqual([]);
    // The Ground number inside a 96 barcode: its last 15 digits.
    expect(
      accepted(
        "fedex",
        singleDigitTypos("9611020987654312345672", (index) => index >= 7),
      ),
    ).toEqual([]);
  });

  it("lets some typos through when the 12-digit check is 0, since remainders 0 and 10 both print 0", () => {
    const slipped = accepted("fedex", singleDigitTypos("477179081230"));
    expect(slipped).toHaveLength(10); // of 108 possible single-digit typos
  });

  it("explains the accepted lengths and refuses letters", () => {
    expect(validateTrackingNumber({ carrier: "fedex", number: "12345" })).toEqual({
      ok: false,
      message: "A FedEx tracking number has 12, 15, 20, 22 or 34 digits.",
    });
    expect(validateTrackingNumber({ carrier: "fedex", number: "98657878885A" })).toEqual({
      ok: false,
      message: "A FedEx tracking number has digits only.",
    });
    expect(validateTrackingNumber({ carrier: "fedex", number: "1234567890123456789012" }).ok).toBe(
      false,
    );
  });
});

describe("other carriers and input hygiene", () => {
  it("takes 4 to 40 letters and digits with no link", () => {
    expect(validateTrackingNumber({ carrier: "other", number: "ab-12" })).toEqual({
      ok: true,
      normalized: "AB12",
      url: null,
      format: "other",
    });
    expect(validateTrackingNumber({ carrier: "other", number: "A".repeat(40) }).ok).toBe(true);
    expect(validateTrackingNumber({ carrier: "other", number: "ABC" }).ok).toBe(false);
    expect(validateTrackingNumber({ carrier: "other", number: "A".repeat(41) }).ok).toBe(false);
  });

  it("refuses empty input and symbols with a plain message", () => {
    expect(validateTrackingNumber({ carrier: "ups", number: "  - " })).toEqual({
      ok: false,
      message: "Enter the tracking number from the label.",
    });
    expect(validateTrackingNumber({ carrier: "other", number: "AB#1234" })).toEqual({
      ok: false,
      message: "A tracking number has only letters and digits (spaces and dashes are fine).",
    });
  });
});
