import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { nominalLengthMm, sizeClassIndex, sizeClassOf, splitBySizeClass } from "./departments";

describe("size classes", () => {
  it("classes pipes by nominal length at 8, 4, 2 and 1 ft (1 ft = 304.8 mm, NIST SP 811)", () => {
    expect(sizeClassOf(2438.5)).toBe("over8");
    expect(sizeClassOf(2438.4)).toBe("4to8");
    expect(sizeClassOf(1219.3)).toBe("4to8");
    expect(sizeClassOf(1219.2)).toBe("2to4");
    expect(sizeClassOf(609.7)).toBe("2to4");
    expect(sizeClassOf(609.6)).toBe("1to2");
    expect(sizeClassOf(304.9)).toBe("1to2");
    expect(sizeClassOf(304.8)).toBe("under1");
    expect(sizeClassIndex(10)).toBe(4);
  });

  it("reckons an open 8′ C as 8 ft, a stopped one as 4 ft and an eighth-length reed resonator as 1 ft (common practice, no source)", () => {
    expect(nominalLengthMm(0, 1)).toBeCloseTo(2438.4, 9);
    expect(sizeClassOf(nominalLengthMm(0, 1))).toBe("4to8");
    expect(sizeClassOf(nominalLengthMm(-12, 1))).toBe("over8"); // 16′ C
    expect(sizeClassOf(nominalLengthMm(0, 0.5))).toBe("2to4"); // stopped 8′ C, a 4 ft pipe
    expect(sizeClassOf(nominalLengthMm(12, 1))).toBe("2to4"); // 4′ C
    expect(nominalLengthMm(0, 1 / 8)).toBeCloseTo(304.8, 9);
  });

  it("splits a run of pipes into classes as counting them one by one does", () => {
    fc.assert(
      fc.property(fc.integer({ min: -36, max: 72 }), fc.integer({ min: 1, max: 61 }), fc.constantFrom(1, 0.5, 0.25, 0.125), (s0, count, fraction) => {
        const fast = new Float64Array(5);
        splitBySizeClass(nominalLengthMm(s0, fraction), count, fast, 0);
        const slow = new Float64Array(5);
        for (let i = 0; i < count; i++) slow[sizeClassIndex(nominalLengthMm(s0 + i, fraction))]++;
        return fast.every((v, i) => v === slow[i]);
      }),
    );
  });
});
