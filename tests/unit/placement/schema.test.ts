// Input schemas of POST /api/placement and GET /api/sun-hours. Source: store rules (PRODUCT.md
// §4 inputs); the calendar check follows the Gregorian calendar (2028 is a leap year, 2026 not).
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { placementInputSchema, sunHoursQuerySchema } from "@/lib/placement/schema";

const body = {
  zip: "80302",
  mount: "pole",
  heightFt: 15,
  facingDeg: 157,
  pairedBackToBack: false,
  stacked: false,
  waterMi: 0.2,
  woodsEdgeFt: 30,
  clearFlightPath: true,
  brightLight: false,
  predators: false,
};

function fieldErrors<T>(result: z.ZodSafeParseResult<T>) {
  if (result.success) throw new Error("expected the input to be refused");
  return z.flattenError(result.error).fieldErrors;
}

describe("placementInputSchema", () => {
  it("accepts a ZIP or a latitude and longitude", () => {
    expect(placementInputSchema.safeParse(body).success).toBe(true);
    const { zip: _zip, ...noZip } = body;
    const byCoords = placementInputSchema.safeParse({ ...noZip, lat: 40, lon: -105 });
    expect(byCoords.success && byCoords.data.lat).toBe(40);
  });

  it("needs one of them, and both coordinates together", () => {
    const { zip: _zip, ...noZip } = body;
    expect(fieldErrors(placementInputSchema.safeParse(noZip)).zip).toEqual([
      "Enter a ZIP code, or a latitude and longitude.",
    ]);
    expect(fieldErrors(placementInputSchema.safeParse({ ...noZip, lat: 40 })).lon).toEqual([
      "Give both latitude and longitude, or neither.",
    ]);
  });

  it("treats null (an empty form field) as not given", () => {
    const result = placementInputSchema.safeParse({
      ...body,
      lat: null,
      lon: null,
      julyHighF: null,
    });
    expect(result.success && result.data.lat).toBeUndefined();
  });

  it.each([
    ["lat", 90, true],
    ["lat", 90.01, false],
    ["lat", -90, true],
    ["lon", -180, true],
    ["lon", 180.5, false],
    ["facingDeg", 0, true],
    ["facingDeg", 359.99, true],
    ["facingDeg", 360, false],
    ["facingDeg", -1, false],
    ["heightFt", -1, false],
    ["waterMi", -0.1, false],
  ] as const)("%s = %s → valid %s", (field, value, ok) => {
    const extra = field === "lat" ? { lon: 0 } : field === "lon" ? { lat: 0 } : {};
    expect(placementInputSchema.safeParse({ ...body, ...extra, [field]: value }).success).toBe(ok);
  });

  it("numbers must be numbers, with a readable message", () => {
    const errors = fieldErrors(placementInputSchema.safeParse({ ...body, heightFt: "15" }));
    expect(errors.heightFt).toEqual(["Height must be a number."]);
    const missing = fieldErrors(placementInputSchema.safeParse({ ...body, waterMi: undefined }));
    expect(missing.waterMi).toEqual(["Distance to water is required."]);
  });

  it("refuses a malformed ZIP, an unknown mount and a non-boolean answer", () => {
    const errors = fieldErrors(
      placementInputSchema.safeParse({ ...body, zip: "8030", mount: "fence", stacked: "no" }),
    );
    expect(errors.zip).toEqual(["Enter a 5-digit U.S. ZIP code."]);
    expect(errors.mount?.[0]).toMatch(/pole, a building wall or a tree/);
    expect(errors.stacked?.[0]).toMatch(/^Answer yes or no/);
  });
});

describe("sunHoursQuerySchema", () => {
  const query = { lat: "40.01", lon: "-105.27", facingDeg: "157.5", date: "2026-06-21" };

  it("coerces decimal strings", () => {
    expect(sunHoursQuerySchema.parse(query)).toEqual({
      lat: 40.01,
      lon: -105.27,
      facingDeg: 157.5,
      date: "2026-06-21",
    });
    expect(sunHoursQuerySchema.parse({ ...query, date: null }).date).toBeUndefined();
  });

  it("refuses a date that does not exist, on the date field", () => {
    const errors = fieldErrors(sunHoursQuerySchema.safeParse({ ...query, date: "2026-02-30" }));
    expect(errors).toEqual({ date: ["That date does not exist: check the month and the day."] });
    expect(sunHoursQuerySchema.safeParse({ ...query, date: "2028-02-29" }).success).toBe(true);
    expect(sunHoursQuerySchema.safeParse({ ...query, date: "2026-02-29" }).success).toBe(false);
  });

  it("gives one clear message for a malformed date", () => {
    expect(
      fieldErrors(sunHoursQuerySchema.safeParse({ ...query, date: "21/06/2026" })).date,
    ).toEqual(["Enter the date as YYYY-MM-DD, for example 2026-06-21."]);
  });

  it("refuses missing, non-numeric and out-of-range numbers", () => {
    const errors = fieldErrors(
      sunHoursQuerySchema.safeParse({ lat: null, lon: "abc", facingDeg: "360" }),
    );
    expect(errors.lat).toEqual(["Latitude is required."]);
    expect(errors.lon).toEqual(["Longitude must be a number."]);
    expect(errors.facingDeg?.[0]).toMatch(/below|not including/);
    expect(sunHoursQuerySchema.safeParse({ ...query, lat: "" }).success).toBe(false);
    expect(sunHoursQuerySchema.safeParse({ ...query, lat: "0x10" }).success).toBe(false);
  });
});

describe("the skyline field", () => {
  const skyline = [0, 0, 5, 20, 30, 20, 5, 0, 0, 0, 0, 0, 0, 0, 0, 0];

  it("is optional in the body, and kept as given", () => {
    expect(placementInputSchema.parse(body).skyline).toBeUndefined();
    expect(placementInputSchema.parse({ ...body, skyline: null }).skyline).toBeUndefined();
    expect(placementInputSchema.parse({ ...body, skyline }).skyline).toEqual(skyline);
  });

  it.each([
    ["a string", "0,0,0"],
    ["15 angles", skyline.slice(1)],
    ["an angle above 90", [...skyline.slice(0, 15), 91]],
    ["a negative angle", [-1, ...skyline.slice(1)]],
    ["a null angle", [null, ...skyline.slice(1)]],
    ["an angle as text", ["5", ...skyline.slice(1)]],
  ])("refuses %s with one message on the skyline field", (_name, value) => {
    const errors = fieldErrors(placementInputSchema.safeParse({ ...body, skyline: value }));
    expect(Object.keys(errors)).toEqual(["skyline"]);
    expect(errors.skyline?.[0]).toMatch(/skyline|angle toward/);
  });

  it("reads a comma list in the sun-hours query, with a mount", () => {
    const parsed = sunHoursQuerySchema.parse({
      lat: "40",
      lon: "-105",
      facingDeg: "160",
      mount: "pole",
      skyline: skyline.join(","),
    });
    expect(parsed.skyline).toEqual(skyline);
    expect(parsed.mount).toBe("pole");
    const bad = fieldErrors(
      sunHoursQuerySchema.safeParse({ lat: "40", lon: "-105", facingDeg: "160", skyline: "0,1e1" }),
    );
    expect(Object.keys(bad)).toEqual(["skyline"]);
    expect(
      fieldErrors(
        sunHoursQuerySchema.safeParse({ lat: "40", lon: "-105", facingDeg: "160", mount: "roof" }),
      ).mount,
    ).toBeDefined();
  });
});
