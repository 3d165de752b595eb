import { describe, expect, it } from "vitest";
import { footageText } from "@/components/spec/format";

// The trade writes pitches with a prime and true fractions (design notes; e.g. 2⅔′, 1⅗′). Unicode has
// single glyphs for a few fractions only (the "Number Forms" block: ½ ⅓ ⅔ ⅕ … ⅐ ⅑ ⅒);
// other fractions are written with superscript and subscript digits around U+2044 FRACTION SLASH,
// as Unicode's chapter 6.2 ("Fraction Slash") describes.
describe("footageText", () => {
  it("uses the single glyph where Unicode has one", () => {
    expect(footageText("2 2/3")).toBe("2⅔′");
    expect(footageText("1 3/5")).toBe("1⅗′");
    expect(footageText(8)).toBe("8′");
  });

  it("builds the septième 4 4/7′ (32′ ÷ 7) with the fraction slash, not a space and a solidus", () => {
    expect(footageText("4 4/7")).toBe("4⁴⁄₇′");
    expect(footageText("2 2/7")).toBe("2²⁄₇′");
    expect(footageText("4 4/7")).not.toMatch(/ |\//);
  });

  it("keeps what is not a footage visible as typed", () => {
    expect(footageText("eight")).toBe("eight?");
  });
});
