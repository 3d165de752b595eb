/**
 * Footages (a stop's pitch in feet) as exact fractions, their harmonic of 8′ pitch, and frequencies.
 * A footage f is harmonic 8/f of unison pitch: 4′ an octave up, 2⅔′ the twelfth (3rd harmonic),
 * 1⅗′ the seventeenth (5th) — Grove, "Organ stop"; Wikibooks "Organ/Pitches"; BYU Organ Tutor.
 */

export interface Fraction {
  readonly num: number;
  readonly den: number;
}

export type MutationTuning = "tempered" | "pure";

const VULGAR: Readonly<Record<string, Fraction>> = {
  "½": { num: 1, den: 2 }, "⅓": { num: 1, den: 3 }, "⅔": { num: 2, den: 3 }, "¼": { num: 1, den: 4 },
  "¾": { num: 3, den: 4 }, "⅕": { num: 1, den: 5 }, "⅖": { num: 2, den: 5 }, "⅗": { num: 3, den: 5 },
  "⅘": { num: 4, den: 5 }, "⅙": { num: 1, den: 6 }, "⅚": { num: 5, den: 6 }, "⅐": { num: 1, den: 7 },
  "⅛": { num: 1, den: 8 }, "⅜": { num: 3, den: 8 }, "⅝": { num: 5, den: 8 }, "⅞": { num: 7, den: 8 },
  "⅑": { num: 1, den: 9 }, "⅒": { num: 1, den: 10 },
};
const VULGAR_BY_VALUE = new Map(Object.entries(VULGAR).map(([ch, f]) => [`${f.num}/${f.den}`, ch]));

/** Longest footage accepted (64′ stops exist, rarely) and the finest harmonic of 64′ accepted (1/16′). */
const MAX_FOOTAGE = 64;
const MAX_HARMONIC_OF_64 = 1024;

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

function reduce(num: number, den: number): Fraction {
  const g = gcd(num, den);
  return { num: num / g, den: den / g };
}

function fromDecimalText(text: string): Fraction | null {
  if (!/^\d+(\.\d{1,6})?$/.test(text)) return null;
  const [whole, frac = ""] = text.split(".");
  const den = 10 ** frac.length;
  return reduce(Number(whole) * den + Number(frac || "0"), den);
}

/**
 * Parses a footage as the trade writes it — "8", "16'", "2 2/3", "2⅔", "1 3/5", "10⅔", "1/2", "½" —
 * into an exact fraction. Returns null unless it is a footage: a positive length of at most 64′
 * that divides 64′ a whole number of times (every flue and mutation pitch is 64′/n).
 */
/** How a footage that is not one is refused, everywhere. */
export const MSG_NOT_FOOTAGE = "is not a footage; write a whole number of feet or an exact fraction, e.g. 8, 2 2/3, 1 3/5";

/** Longest footage text accepted ("10 2/3 ft" is 9); longer text is refused before any pattern sees it. */
export const MAX_FOOTAGE_TEXT = 16;

export function parseFootage(input: string | number): Fraction | null {
  // A scheme uses a few dozen footages, parsed again on every edit: keep what was parsed (bounded).
  const known = footageMemo.get(input);
  if (known !== undefined) return known;
  const f = parseFootageText(input);
  if (footageMemo.size < 1024) footageMemo.set(input, f);
  return f;
}

const footageMemo = new Map<string | number, Fraction | null>();

function parseFootageText(input: string | number): Fraction | null {
  let f: Fraction | null = null;
  if (typeof input === "number") {
    if (Number.isInteger(input)) f = { num: input, den: 1 };
    else f = fromDecimalText(String(input));
  } else {
    if (input.length > MAX_FOOTAGE_TEXT) return null;
    // Trim, strip the unit, trim again: a pattern that starts with \s* and is anchored only at the
    // end retries from every position, quadratic in the input's length (80,000 spaces took 7 s).
    const text = input.trim().replace(/(?:'|′|ft)$/, "").trim();
    let m: RegExpExecArray | null;
    if (/^\d+$/.test(text)) f = { num: Number(text), den: 1 };
    else if ((m = /^(\d+)?\s*([½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅐⅛⅜⅝⅞⅑⅒])$/.exec(text))) {
      const v = VULGAR[m[2]];
      const whole = m[1] ? Number(m[1]) : 0;
      f = reduce(whole * v.den + v.num, v.den);
    } else if ((m = /^(?:(\d+)[\s-]+)?(\d+)\/(\d+)$/.exec(text))) {
      const whole = m[1] ? Number(m[1]) : 0;
      const den = Number(m[3]);
      if (den === 0) return null;
      f = reduce(whole * den + Number(m[2]), den);
    } else {
      f = fromDecimalText(text);
    }
  }
  if (!f || f.num <= 0) return null;
  if (f.num > MAX_FOOTAGE * f.den) return null;
  const n = (MAX_FOOTAGE * f.den) / f.num; // harmonic of 64′
  if (!Number.isInteger(n) || n > MAX_HARMONIC_OF_64) return null;
  return f;
}

/** The footage in feet as a number (for display and lengths only; sharing uses the exact fraction). */
export function footageFt(f: Fraction): number {
  return f.num / f.den;
}

/** Harmonic of 8′ pitch as an exact fraction: 8′ → 1, 4′ → 2, 2⅔′ → 3, 16′ → 1/2, 10⅔′ → 3/4. */
export function harmonicOf8ft(f: Fraction): Fraction {
  return reduce(8 * f.den, f.num);
}

/**
 * Semitones the stop sounds above unison (8′) pitch. Tempered (the default, as most organs tune
 * mutations) rounds to the nearest semitone; pure keeps the harmonic's exact interval 12·log2(8/f).
 */
export function semitonesAbove8ft(f: Fraction, tuning: MutationTuning = "tempered"): number {
  const exact = 12 * Math.log2((8 * f.den) / f.num);
  return tuning === "pure" ? exact : Math.round(exact);
}

/** Cents by which a pure harmonic n lies from its tempered neighbour (twelfth +1.96, seventeenth −13.69). */
export function pureMinusTemperedCents(harmonic: number): number {
  const exact = 1200 * Math.log2(harmonic);
  return exact - 100 * Math.round(exact / 100);
}

/** Equal-tempered frequency in Hz of MIDI note m (fractional for pure mutations), A4 = 69 = pitchHz (ISO 16: 440). */
export function frequencyHz(midi: number, pitchHz = 440): number {
  return pitchHz * Math.pow(2, (midi - 69) / 12);
}

/** A footage typeset as the trade writes it, without the prime: "8", "2⅔", "1⅗", "10⅔", "½", "4/9". */
export function formatFootage(f: Fraction): string {
  const whole = Math.floor(f.num / f.den);
  const rest = f.num - whole * f.den;
  if (rest === 0) return String(whole);
  const frac = VULGAR_BY_VALUE.get(`${rest}/${f.den}`) ?? `${whole ? " " : ""}${rest}/${f.den}`;
  return `${whole || ""}${frac}`;
}
