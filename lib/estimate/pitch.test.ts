import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { midiToFreq } from "@tonaljs/midi";
import { footageFt, formatFootage, frequencyHz, harmonicOf8ft, parseFootage, pureMinusTemperedCents, semitonesAbove8ft } from "./pitch";

const f = (t: string | number) => {
  const x = parseFootage(t);
  if (!x) throw new Error(`not a footage: ${t}`);
  return x;
};

describe("frequencies", () => {
  it("tunes A4 to 440 Hz by default", () => {
    // ISO 16 (1975): standard pitch A4 = 440 Hz.
    expect(frequencyHz(69)).toBe(440);
  });

  it("puts middle C at 261.626 Hz", () => {
    // OEIS A214832 (equal temperament, piano keys): middle C 261.626 Hz.
    expect(frequencyHz(60)).toBeCloseTo(261.626, 3);
  });

  it("agrees with @tonaljs/midi midiToFreq note by note over the manual and pedal range", () => {
    for (let m = 12; m <= 108; m++) {
      expect(frequencyHz(m), `MIDI ${m}`).toBeCloseTo(midiToFreq(m), 9);
      expect(frequencyHz(m, 415), `MIDI ${m} at 415`).toBeCloseTo(midiToFreq(m, 415), 9);
    }
  });

  it("puts the lowest C of 8′, 16′ and 32′ stops at 65.406, 32.703 and 16.352 Hz (derived)", () => {
    const lowC = (ft: string) => frequencyHz(36 + semitonesAbove8ft(f(ft)));
    expect(lowC("8")).toBeCloseTo(65.406, 3);
    expect(lowC("16")).toBeCloseTo(32.703, 3);
    expect(lowC("32")).toBeCloseTo(16.352, 3);
  });
});

describe("footages", () => {
  it("reads the trade's ways of writing a footage as exact fractions", () => {
    expect(f("2 2/3")).toEqual({ num: 8, den: 3 });
    expect(f("2⅔")).toEqual({ num: 8, den: 3 });
    expect(f("2⅔′")).toEqual({ num: 8, den: 3 });
    expect(f("1 3/5")).toEqual({ num: 8, den: 5 });
    expect(f("1⅗")).toEqual({ num: 8, den: 5 });
    expect(f("10⅔")).toEqual({ num: 32, den: 3 });
    expect(f("5 1/3")).toEqual({ num: 16, den: 3 });
    expect(f("16'")).toEqual({ num: 16, den: 1 });
    expect(f("½")).toEqual({ num: 1, den: 2 });
    expect(f(8)).toEqual({ num: 8, den: 1 });
    expect(f(0.5)).toEqual({ num: 1, den: 2 });
  });

  it("refuses rounded mutations and lengths that are not footages", () => {
    for (const bad of ["2.67", "2.666", 2.67, "3", "0", "-8", "abc", "128", "", "1/0", "2,5"]) expect(parseFootage(bad), String(bad)).toBeNull();
  });

  it("relates footage and harmonic: octaves halve, mutations are 8′/n", () => {
    // Grove, "Organ stop": 4′ an octave above 8′, 2′ two octaves, 1′ three; 16′ one below, 32′ two below.
    expect(semitonesAbove8ft(f("4"))).toBe(12);
    expect(semitonesAbove8ft(f("2"))).toBe(24);
    expect(semitonesAbove8ft(f("1"))).toBe(36);
    expect(semitonesAbove8ft(f("16"))).toBe(-12);
    expect(semitonesAbove8ft(f("32"))).toBe(-24);
    // Wikibooks "Organ/Pitches": 2⅔′ is the twelfth, the 3rd harmonic (octave and a fifth = 19 semitones).
    expect(harmonicOf8ft(f("2 2/3"))).toEqual({ num: 3, den: 1 });
    expect(semitonesAbove8ft(f("2 2/3"))).toBe(19);
    // BYU Organ Tutor: 1⅗′ is the seventeenth (5th partial), 1⅓′ the nineteenth (6th partial).
    expect(harmonicOf8ft(f("1 3/5"))).toEqual({ num: 5, den: 1 });
    expect(semitonesAbove8ft(f("1 3/5"))).toBe(28);
    expect(harmonicOf8ft(f("1 1/3"))).toEqual({ num: 6, den: 1 });
    expect(semitonesAbove8ft(f("1 1/3"))).toBe(31);
    // Derived: the sub-unison series 16′/n and 32′/n — 5⅓′ = 16/3, 10⅔′ = 32/3.
    expect(harmonicOf8ft(f("5 1/3"))).toEqual({ num: 3, den: 2 });
    expect(harmonicOf8ft(f("10 2/3"))).toEqual({ num: 3, den: 4 });
  });

  it("keeps footage × harmonic = 8′ for every footage 64′/n", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1024 }), (n) => {
        const x = parseFootage(formatFootage({ num: 64, den: n }) || "x");
        if (!x) return false;
        const h = harmonicOf8ft(x);
        return footageFt(x) * (h.num / h.den) === 8 || Math.abs(footageFt(x) * (h.num / h.den) - 8) < 1e-12;
      }),
    );
  });

  it("typesets footages with true fractions", () => {
    expect(formatFootage(f("2 2/3"))).toBe("2⅔");
    expect(formatFootage(f("1 3/5"))).toBe("1⅗");
    expect(formatFootage(f("10 2/3"))).toBe("10⅔");
    expect(formatFootage(f("1/2"))).toBe("½");
    expect(formatFootage(f("4/9"))).toBe("4/9");
    expect(formatFootage(f("16"))).toBe("16");
  });
});

describe("tempered and pure mutations", () => {
  it("puts a pure twelfth 1.96 cents above tempered and a pure seventeenth 13.69 cents below (derived: 1200·log2 n)", () => {
    expect(pureMinusTemperedCents(3)).toBeCloseTo(1.955, 3);
    expect(pureMinusTemperedCents(5)).toBeCloseTo(-13.686, 3);
  });

  it("tempers by default and tunes pure on request", () => {
    expect(semitonesAbove8ft(f("2 2/3"))).toBe(19);
    expect(semitonesAbove8ft(f("2 2/3"), "pure")).toBeCloseTo(19.0196, 4);
    expect(semitonesAbove8ft(f("4"), "pure")).toBe(12);
  });
});
