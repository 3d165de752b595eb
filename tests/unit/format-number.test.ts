import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatNumber } from "@/components/spec/format";

// The editor formats numbers through one cached Intl.NumberFormat per precision. The reference is
// the platform's own Number.prototype.toLocaleString with the same locale and options (ECMA-402),
// with the thousands comma replaced by a narrow no-break space (U+202F) as drawings write 3 420.
const reference = (n: number, digits: number) =>
  n.toLocaleString("en-GB", { minimumFractionDigits: 0, maximumFractionDigits: digits }).replace(/,/g, "\u202f");

describe("formatNumber", () => {
  it("groups thousands with a narrow space and rounds to the digits asked for", () => {
    expect(formatNumber(3420)).toBe("3\u202f420");
    expect(formatNumber(1234567.891, 2)).toBe("1\u202f234\u202f567.89");
    expect(formatNumber(0.5, 0)).toBe("1");
    expect(formatNumber(-2.25, 1)).toBe("-2.3");
  });

  it("shows a dash for a value that is not a number", () => {
    expect(formatNumber(Number.NaN)).toBe("–");
    expect(formatNumber(Number.POSITIVE_INFINITY, 2)).toBe("–");
  });

  it("writes every number as toLocaleString does, whichever precision was asked for first", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.integer({ min: 0, max: 4 }), (n, digits) => {
        expect(formatNumber(n, digits)).toBe(reference(n, digits));
      }),
    );
  });
});
