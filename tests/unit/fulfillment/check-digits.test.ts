import { describe, expect, it } from "vitest";
import {
  fedexExpressCheckDigit,
  mod10Weight31CheckDigit,
  s10CheckDigit,
  upsCheckDigit,
} from "@/lib/fulfillment/check-digits";

// Each check names where its example comes from. "Open dataset" is jkeen/tracking_number_data
// (couriers/*.json, test_numbers.valid): a public, independently maintained list of carrier
// examples, not a carrier publication.

const body = (n: string) => n.slice(0, -1);
const check = (n: string) => Number(n.slice(-1));

describe("mod 10, weights 3 and 1 from the right", () => {
  it("gives the GS1 check digits of well-known barcodes (from memory: Wikipedia's EAN-13 and UPC-A examples)", () => {
    expect(mod10Weight31CheckDigit("400638133393")).toBe(1); // EAN-13 4006381333931
    expect(mod10Weight31CheckDigit("03600029145")).toBe(2); // UPC-A 036000291452
  });

  it.each([
    "9400111201080805483016",
    "9361289878700317633795",
    "9505511069605048600624",
    "9405803699300124287899",
    "92748931507708513018050063",
    "03071790000523483741",
  ])("checks USPS %s (open dataset, couriers/usps.json)", (n) => {
    expect(mod10Weight31CheckDigit(body(n))).toBe(check(n));
  });

  it.each(["041441760228964", "568283610012000", "568283610012734"])(
    "checks FedEx Ground %s (open dataset, couriers/fedex.json)",
    (n) => {
      expect(mod10Weight31CheckDigit(body(n))).toBe(check(n));
    },
  );

  it("weights the digit next to the check digit by 3: a 1 there needs a 7", () => {
    expect(mod10Weight31CheckDigit("1")).toBe(7);
    expect(mod10Weight31CheckDigit("10")).toBe(9);
    expect(mod10Weight31CheckDigit("0")).toBe(0);
  });
});

describe("UPS 1Z check digit", () => {
  it.each(["1Z5R89390357567127", "1Z879E930346834440", "1Z410E7W0392751591", "1Z8V92A70367203024"])(
    "checks %s (open dataset, couriers/ups.json)",
    (n) => {
      expect(upsCheckDigit(n.slice(2, -1))).toBe(check(n));
    },
  );

  it("checks 1Z999AA10123456784, the sample number widely reproduced from UPS's developer guides (from memory)", () => {
    expect(upsCheckDigit("999AA1012345678")).toBe(4);
  });

  it("maps letters A=2 … H=9, I=0, J=1 …, Z=7 (odd position, weight 1)", () => {
    const alone = (char: string) => (10 - upsCheckDigit(`${char}00000000000000`)) % 10;
    expect(["A", "B", "H", "I", "J", "R", "S", "Z"].map(alone)).toEqual([2, 3, 9, 0, 1, 9, 0, 7]);
  });
});

describe("UPU S10 check digit", () => {
  it("gives 9 for serial 47312482, the worked example of Wikipedia's 'S10 (UPU standard)'", () => {
    expect(s10CheckDigit("47312482")).toBe(9);
  });

  it("checks RB123456785US (open dataset, couriers/s10.json)", () => {
    expect(s10CheckDigit("12345678")).toBe(5);
  });

  it("maps C = 10 to 0 and C = 11 to 5", () => {
    expect(s10CheckDigit("00000000")).toBe(5); // sum 0 → C = 11 → 5
    expect(s10CheckDigit("10100000")).toBe(0); // 8 + 4 = 12 ≡ 1 → C = 10 → 0
    expect(s10CheckDigit("00000011")).toBe(6); // 9 + 7 = 16 ≡ 5 → C = 6
    expect(s10CheckDigit("00000001")).toBe(4); // 7 → C = 4
  });
});

describe("FedEx Express 12-digit check digit", () => {
  it.each(["986578788855", "477179081230", "799531274483", "790535312317", "974367662710"])(
    "checks %s (open dataset, couriers/fedex.json)",
    (n) => {
      expect(fedexExpressCheckDigit(body(n))).toBe(check(n));
    },
  );

  it("reads a remainder of 10 as 0", () => {
    // The last two digits weigh 3 and 1: 3 × 3 + 1 × 1 = 10, remainder 10 → 0.
    expect(fedexExpressCheckDigit("00000000031")).toBe(0);
    expect(fedexExpressCheckDigit("00000000021")).toBe(7); // 2 × 3 + 1 = 7
  });

  it("refuses anything but digits", () => {
    expect(() => fedexExpressCheckDigit("98657878885A")).toThrow(RangeError);
  });
});
