import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { toMidi } from "@tonaljs/midi";
import { compassNoteCount, midiToNote, noteToMidi, parseCompass } from "./notes";

describe("Helmholtz note names", () => {
  it("puts middle C at c' = MIDI 60", () => {
    // Wikipedia, "Helmholtz pitch notation": middle C is c' (= C4); @tonaljs/midi toMidi("C4") = 60.
    expect(noteToMidi("c'")).toBe(60);
    expect(noteToMidi("c'")).toBe(toMidi("C4"));
  });

  it("names the octaves C, c, c', c'', c''', c'''' and CC, CCC below", () => {
    // Wikipedia, "Helmholtz pitch notation": C = C2, c = C3, CC = C1, CCC = C0; checked against @tonaljs/midi.
    const pairs: [string, string][] = [
      ["CCC", "C0"], ["CC", "C1"], ["C", "C2"], ["c", "C3"], ["c'", "C4"], ["c''", "C5"], ["c'''", "C6"], ["c''''", "C7"],
      ["G", "G2"], ["g'", "G4"], ["f'", "F4"], ["a'", "A4"], ["BB", "B1"],
    ];
    for (const [helmholtz, scientific] of pairs) expect(noteToMidi(helmholtz), helmholtz).toBe(toMidi(scientific));
  });

  it("reads sharps and flats, ASCII or typeset", () => {
    expect(noteToMidi("c#'")).toBe(61);
    expect(noteToMidi("c♯'")).toBe(61);
    expect(noteToMidi("bb")).toBe(noteToMidi("a#"));
    expect(noteToMidi("B♭")).toBe(46);
    expect(noteToMidi("c′′")).toBe(72);
  });

  it("refuses what is not a note name", () => {
    for (const bad of ["H", "C'", "CD", "c'''''''", "", "c4", "middle c"]) expect(noteToMidi(bad), bad).toBeNull();
  });

  it("round-trips every MIDI number from CCC (12) to b''''' (119)", () => {
    fc.assert(fc.property(fc.integer({ min: 12, max: 119 }), (m) => noteToMidi(midiToNote(m)) === m));
  });
});

describe("compasses", () => {
  // Royal College of Organists (1881, as quoted in The Etude, 1903) and the AGO console standard (1933/1961/2002).
  it("counts a manual C–c'''' as 61 notes, a pedal C–g' as 32 and C–f' as 30", () => {
    const count = (low: string, high: string) => {
      const c = parseCompass({ low, high })!;
      return compassNoteCount(c.lowMidi, c.highMidi);
    };
    expect(count("C", "c''''")).toBe(61);
    expect(count("C", "g'")).toBe(32);
    expect(count("C", "f'")).toBe(30);
    // Older manual compasses, derived by counting.
    expect(count("C", "a'''")).toBe(58);
    expect(count("C", "g'''")).toBe(56);
    expect(count("C", "f'''")).toBe(54);
    // A short compass from tenor c on a 61-note manual.
    expect(count("c", "c''''")).toBe(49);
  });

  it("maps the manual compass to MIDI 36–96 (derived)", () => {
    expect(parseCompass({ low: "C", high: "c''''" })).toEqual({ lowMidi: 36, highMidi: 96 });
  });

  it("gives no notes for a compass upside down", () => {
    expect(compassNoteCount(96, 36)).toBe(0);
  });
});
