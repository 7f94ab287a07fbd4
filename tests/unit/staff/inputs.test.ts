import { describe, expect, it } from "vitest";
import { inspectionInputSchema, inspectionMoment, isRealDate } from "@/lib/staff/inspection-input";
import { firstFreeSlug, modelInputSchema, slugify } from "@/lib/staff/model-input";
import { altTextSchema } from "@/lib/staff/photo-input";
import { adjustStockSchema, ledgerReason, receiveStockSchema } from "@/lib/staff/stock-input";
import { SOUND_SPEC } from "../catalog/sample-spec";

const MODEL_ID = "7c9e6679-7425-40de-944b-e07fc1f90ae7";

describe("model input", () => {
  const valid = {
    name: "Hollow Four",
    tagline: "",
    description: "",
    priceCents: 14900,
    builderName: "Hollow Creek Joinery",
    mounts: ["pole"],
    backToBackKit: false,
    carton: { lengthIn: 26, widthIn: 16, heightIn: 6, weightLb: 9 },
    lowStockThreshold: 3,
    spec: SOUND_SPEC,
  };

  it("accepts a complete model and names the first problem of a broken one", () => {
    expect(modelInputSchema.safeParse(valid).success).toBe(true);
    const noMount = modelInputSchema.safeParse({ ...valid, mounts: [] });
    expect(noMount.error?.issues[0]?.message).toBe("Choose at least one way to mount it.");
    // 150 lb is the most UPS and FedEx take as one parcel (their published limits).
    expect(
      modelInputSchema.safeParse({ ...valid, carton: { ...valid.carton, weightLb: 150 } }).success,
    ).toBe(true);
    expect(
      modelInputSchema.safeParse({ ...valid, carton: { ...valid.carton, weightLb: 150.5 } })
        .success,
    ).toBe(false);
    expect(modelInputSchema.safeParse({ ...valid, priceCents: 99 }).error?.issues[0]?.message).toBe(
      "The price must be at least $1.00.",
    );
  });

  it("makes slugs from names and finds the first free one", () => {
    expect(slugify("Hollow Four (2026)")).toBe("hollow-four-2026");
    expect(slugify("Crème & Brûlée")).toBe("creme-and-brulee");
    expect(slugify("!!!")).toBe("house");
    expect(
      firstFreeSlug({ base: "hollow-four", taken: new Set(["hollow-four", "hollow-four-2"]) }),
    ).toBe("hollow-four-3");
  });
});

describe("stock input", () => {
  it("refuses a damaged adjustment that adds, a returned one that removes, and a zero change", () => {
    const msg = (input: object) =>
      adjustStockSchema.safeParse({ modelId: MODEL_ID, note: "", ...input }).error?.issues[0]
        ?.message;
    expect(msg({ reason: "damaged", change: 1 })).toMatch(/Damaged houses leave stock/);
    expect(msg({ reason: "returned", change: -1 })).toMatch(/Returned houses come back/);
    expect(msg({ reason: "damaged", change: 0 })).toMatch(/A change of 0 changes nothing/);
    expect(msg({ reason: "recount", change: -1 })).toMatch(/Say what the recount found/);
    expect(
      adjustStockSchema.safeParse({ modelId: MODEL_ID, reason: "damaged", change: -1, note: "" })
        .success,
    ).toBe(true);
  });

  it("needs a batch and a builder to receive, and at least one house", () => {
    const base = {
      modelId: MODEL_ID,
      count: 1,
      batch: "2026-spring-1",
      builderName: "Hollow Creek Joinery",
      note: "",
    };
    expect(receiveStockSchema.safeParse(base).success).toBe(true);
    expect(receiveStockSchema.safeParse({ ...base, count: 0 }).success).toBe(false);
    expect(receiveStockSchema.safeParse({ ...base, count: 500 }).success).toBe(true);
    expect(receiveStockSchema.safeParse({ ...base, count: 501 }).success).toBe(false);
    expect(
      receiveStockSchema.safeParse({ ...base, batch: "  " }).error?.issues[0]?.message,
    ).toMatch(/batch name or number/);
  });

  it("keeps the reason word and the note in the ledger", () => {
    expect(ledgerReason({ reason: "damaged", note: "split back board" })).toBe(
      "Damaged: split back board",
    );
    expect(ledgerReason({ reason: "returned", note: "" })).toBe("Returned");
  });
});

describe("inspection input", () => {
  it("accepts real calendar days only (2024 was a leap year, 2025 was not)", () => {
    expect(isRealDate("2024-02-29")).toBe(true);
    expect(isRealDate("2025-02-29")).toBe(false);
    expect(isRealDate("2026-13-01")).toBe(false);
    expect(isRealDate("26-01-01")).toBe(false);
  });

  it("refuses a day in the future", () => {
    const base = {
      modelId: MODEL_ID,
      measured: {
        chamberGapIn: 0.75,
        chamberHeightIn: 24,
        chamberWidthIn: 20,
        landingAreaIn: 5,
        roughening: "grooved",
        seamsSealed: true,
      },
      inspector: "Tobias Marlow",
      notes: "",
    };
    expect(inspectionInputSchema.safeParse({ ...base, inspectedOn: "2026-01-10" }).success).toBe(
      true,
    );
    const far = inspectionInputSchema.safeParse({ ...base, inspectedOn: "2999-01-01" });
    expect(far.error?.issues[0]?.message).toBe("The inspection day cannot be in the future.");
  });

  it("stores the day at noon UTC, which is the same day in every U.S. time zone", () => {
    const moment = inspectionMoment("2026-03-08");
    // UTC−10 (Hawaii) and UTC−4 (Eastern daylight) both still read 8 March.
    for (const offsetHours of [-10, -4]) {
      expect(new Date(moment.getTime() + offsetHours * 3_600_000).toISOString().slice(0, 10)).toBe(
        "2026-03-08",
      );
    }
  });
});

describe("alt text", () => {
  it("is required, and is a description rather than a file name", () => {
    expect(altTextSchema.safeParse("").success).toBe(false);
    expect(altTextSchema.safeParse("IMG_2041.JPG").error?.issues[0]?.message).toBe(
      "Describe what the photo shows, not its file name.",
    );
    expect(altTextSchema.safeParse("Four-chamber house on a cedar pole").success).toBe(true);
    expect(altTextSchema.safeParse("x".repeat(201)).success).toBe(false);
  });
});
