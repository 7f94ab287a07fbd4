import { describe, expect, it } from "vitest";
import { dedicationLines } from "@/lib/giving/dedication-words";

describe("what a receipt says about a gift's extras", () => {
  it("names the tribute, keeps the deduction the donor's, and states the covered fee", () => {
    expect(dedicationLines({ tributeKind: "memory", tributeName: "Rowan Ellery", feeCoveredCents: 106 })).toEqual([
      "This gift was made in memory of Rowan Ellery.",
      "The contribution, and any deduction for it, is yours as the donor.",
      "It includes $1.06 you added to cover the card fee; that is part of your gift.",
    ]);
    expect(dedicationLines({ tributeKind: "honor", tributeName: "Sam", feeCoveredCents: 0 })[0]).toBe("This gift was made in honour of Sam.");
  });

  it("says nothing when there is nothing extra", () => {
    expect(dedicationLines(null)).toEqual([]);
    expect(dedicationLines({ tributeKind: null, tributeName: null, feeCoveredCents: 0 })).toEqual([]);
  });
});
