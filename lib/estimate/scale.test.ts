import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { diameterMm, diameterRatioPerSemitone, mouthWidthMm, squareSideMm } from "./scale";

const NORMAL = { deviationHt: 0, halvingOn: 17, referenceSemitones: 0 };

describe("Töpfer's normal scale", () => {
  it("gives the published C diameters within 0.2 mm", () => {
    // Wikipedia, "Organ flue pipe scaling", citing Adelung, Einführung in den Orgelbau (1991), pp. 85–86.
    const table: [string, number, number][] = [
      ["32′", -24, 439.7], ["16′", -12, 261.5], ["8′", 0, 155.5], ["4′", 12, 92.4], ["2′", 24, 54.9], ["1′", 36, 32.6], ["½′", 48, 19.3],
    ];
    for (const [label, semitones, mm] of table) expect(Math.abs(diameterMm(semitones, NORMAL) - mm), label).toBeLessThanOrEqual(0.2);
  });

  it("halves the diameter on the 17th note", () => {
    // Same source: cross-section 1 : √8 per octave, so the diameter halves every 16 semitones.
    fc.assert(fc.property(fc.integer({ min: -36, max: 60 }), (s) => Math.abs(diameterMm(s + 16, NORMAL) - diameterMm(s, NORMAL) / 2) < 1e-9));
    expect(diameterRatioPerSemitone(17) ** 16).toBeCloseTo(0.5, 12);
  });

  it("widens by a semitone per +1 ht: middle c′ 54.9 mm, −2 ht 50.4, +1 ht 57.4", () => {
    // Same article's worked example for c′ of an 8′ rank (24 semitones above 8′ C).
    expect(diameterMm(24, NORMAL)).toBeCloseTo(54.9, 0);
    expect(Math.abs(diameterMm(24, { ...NORMAL, deviationHt: -2 }) - 50.4)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(diameterMm(24, { ...NORMAL, deviationHt: 1 }) - 57.4)).toBeLessThanOrEqual(0.1);
  });

  it("reads a deviation at the rank's own C, whatever its halving note", () => {
    // A 4′ rank halving on the 19th note, 2 ht narrow: at 4′ C it is exactly the normal 4′ C two semitones narrower,
    // as a practitioner reads it; measured from 8′ C the same numbers would have given a pipe 1.3 semitones off.
    for (const [ref, h] of [[12, 19], [24, 15], [19, 20], [0, 18]] as const)
      for (const dev of [-3, 0, 2]) {
        const atRef = diameterMm(ref, { deviationHt: dev, halvingOn: h, referenceSemitones: ref });
        expect(atRef).toBeCloseTo(diameterMm(ref - dev, NORMAL), 9);
      }
    // On the normal halving the reference note does not matter.
    expect(diameterMm(30, { deviationHt: -2, halvingOn: 17, referenceSemitones: 12 })).toBeCloseTo(diameterMm(30, { ...NORMAL, deviationHt: -2 }), 9);
  });

  it("halves on the scale's own note from the reference", () => {
    fc.assert(
      fc.property(fc.integer({ min: 12, max: 24 }), fc.integer({ min: -24, max: 48 }), (h, s) => {
        const scale = { deviationHt: 1, halvingOn: h, referenceSemitones: 12 };
        return Math.abs(diameterMm(s + h - 1, scale) - diameterMm(s, scale) / 2) < 1e-9;
      }),
    );
  });
});

describe("mouth width and wooden pipes", () => {
  it("makes the normal mouth a quarter of the circumference", () => {
    // Wikipedia, op. cit.; W. E. Dickson, Practical Organ Building, p. 42.
    expect(mouthWidthMm(155.5, 0.25)).toBeCloseTo((Math.PI * 155.5) / 4, 9);
    expect(mouthWidthMm(155.5, 0.25)).toBeCloseTo(122.13, 2);
  });

  it("gives a square wooden pipe the cross-section of the scaled circle", () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 500, noNaN: true }), (d) => Math.abs(squareSideMm(d) ** 2 - (Math.PI * d * d) / 4) < 1e-6 * d * d));
  });
});
