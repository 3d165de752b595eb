/**
 * Note names as organ builders write them (Helmholtz: CCC, CC, C, c, c', c'' …) and MIDI numbers.
 * Middle C is c' = MIDI 60 (Wikipedia, "Helmholtz pitch notation"); so C = 36, the lowest key of a
 * manual, and c'''' = 96 its highest (derived).
 */

const LETTER_SEMITONE: Readonly<Record<string, number>> = { c: 0, d: 2, e: 4, f: 5, g: 7, a: 9, b: 11 };
const SHARP_NAMES = ["c", "c#", "d", "d#", "e", "f", "f#", "g", "g#", "a", "a#", "b"] as const;

const NOTE_RE = /^(?:([A-G])\1{0,2}(#|b|♯|♭)?|([a-g])(#|b|♯|♭)?('{1,5}|′{1,5})?)$/;

/** MIDI number of a Helmholtz note name, or null if the text is not one. "C" → 36, "c'" → 60, "CC" → 24. */
export function noteToMidi(name: string): number | null {
  // Note names repeat across a scheme and every edit parses them again: keep what was parsed (bounded).
  const known = noteMemo.get(name);
  if (known !== undefined) return known;
  const midi = parseNote(name);
  if (noteMemo.size < 1024) noteMemo.set(name, midi);
  return midi;
}

const noteMemo = new Map<string, number | null>();

function parseNote(name: string): number | null {
  const m = NOTE_RE.exec(name);
  if (!m) return null;
  let midi: number;
  let accidental: string | undefined;
  if (m[1]) {
    // Capitals: C is MIDI 36, each doubling of the letter an octave lower.
    midi = 36 - 12 * (name.replace(/[#b♯♭]$/, "").length - 1) + LETTER_SEMITONE[m[1].toLowerCase()];
    accidental = m[2];
  } else {
    const primes = m[5] ? m[5].length : 0;
    midi = 48 + 12 * primes + LETTER_SEMITONE[m[3]];
    accidental = m[4];
  }
  if (accidental === "#" || accidental === "♯") midi += 1;
  if (accidental === "b" || accidental === "♭") midi -= 1;
  return midi;
}

/** Helmholtz name of a MIDI number, sharps spelt with "#": 36 → "C", 61 → "c#'", 24 → "CC". */
export function midiToNote(midi: number): string {
  return Number.isInteger(midi) && midi >= 0 && midi < 128 ? NOTE_NAMES[midi] : nameOf(midi);
}

function nameOf(midi: number): string {
  const pc = ((midi % 12) + 12) % 12;
  const octave = Math.floor(midi / 12) - 1; // scientific octave: C4 = 60
  const base = SHARP_NAMES[pc];
  if (octave >= 3) return base + "'".repeat(octave - 3);
  const letter = base[0].toUpperCase();
  const sharp = base.length > 1 ? "#" : "";
  return letter.repeat(3 - octave) + sharp;
}

/** Notes in a compass, both ends included: C–c'''' → 61, C–g' → 32, C–f' → 30. */
export function compassNoteCount(lowMidi: number, highMidi: number): number {
  return highMidi >= lowMidi ? highMidi - lowMidi + 1 : 0;
}

/** Parsed compass of a division or stop; null where a name does not parse. */
export function parseCompass(c: { readonly low: string; readonly high: string }): { lowMidi: number; highMidi: number } | null {
  const lowMidi = noteToMidi(c.low);
  const highMidi = noteToMidi(c.high);
  return lowMidi === null || highMidi === null ? null : { lowMidi, highMidi };
}

/** Names of MIDI 0–127, worked out once: the estimate names two notes per stop on every edit. */
const NOTE_NAMES: readonly string[] = Array.from({ length: 128 }, (_, m) => nameOf(m));
