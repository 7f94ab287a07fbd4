import { describe, expect, it } from "vitest";
import { CATALOG_TAG, modelTag, tagsForModelChange } from "@/lib/catalog/cache-tags";

describe("the tags a staff change to one model touches", () => {
  it("a listing change always reaches the catalog, on sale or not", () => {
    expect(tagsForModelChange("m1", "listing", { onSale: false })).toEqual([modelTag("m1"), CATALOG_TAG]);
    expect(tagsForModelChange("m1", "listing", { onSale: true })).toEqual([modelTag("m1"), CATALOG_TAG]);
  });

  it("a details change reaches the catalog only for a model on sale", () => {
    expect(tagsForModelChange("m1", "details", { onSale: true })).toEqual([modelTag("m1"), CATALOG_TAG]);
    expect(tagsForModelChange("m1", "details", { onSale: false })).toEqual([modelTag("m1")]);
  });

  it("names each model apart, within the framework's 256-character limit for a tag", () => {
    expect(modelTag("a")).not.toBe(modelTag("b"));
    expect(modelTag("6f1c2d9e-8a4b-4c1d-9e2f-0a1b2c3d4e5f").length).toBeLessThanOrEqual(256);
  });
});
