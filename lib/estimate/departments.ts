/**
 * The firm's departments (who does the work, at what hourly rate, with what crew) and the size
 * classes its per-pipe norms are written in. No imports: the rates schema, the labour norms and the
 * programme all build on these lists.
 */
import { M_PER_FT } from "./units";

export const departments = [
  "design", "metalPipes", "woodPipes", "reeds", "voicing", "chestAction", "casework", "console", "electrics",
  "dismantling", "transport", "erection", "tonalFinishing", "management",
] as const;
export type Department = (typeof departments)[number];

export const departmentLabels: Readonly<Record<Department, string>> = {
  design: "Design and drawings",
  metalPipes: "Metal pipe shop",
  woodPipes: "Wood pipe shop",
  reeds: "Reed making",
  voicing: "Voicing",
  chestAction: "Chests, action and wind",
  casework: "Casework and swell boxes",
  console: "Console",
  electrics: "Electrics",
  dismantling: "Dismantling and packing",
  transport: "Crating, loading and driving",
  erection: "Erection",
  tonalFinishing: "Tonal finishing on site",
  management: "Project management",
};

/** Department positions in the Float64Array accumulators the estimator uses. */
export const D = Object.fromEntries(departments.map((d, i) => [d, i])) as Readonly<Record<Department, number>>;
export const DEPARTMENT_COUNT = departments.length;

/**
 * Size classes of a pipe's nominal length, as estimators write per-pipe norms ("hours per new metal
 * pipe of 2–4 ft"): over 8′, 4–8′, 2–4′, 1–2′, under 1′.
 */
export const sizeClasses = ["over8", "4to8", "2to4", "1to2", "under1"] as const;
export type SizeClass = (typeof sizeClasses)[number];
export const sizeClassLabels: Readonly<Record<SizeClass, string>> = {
  over8: "over 8 ft", "4to8": "4–8 ft", "2to4": "2–4 ft", "1to2": "1–2 ft", under1: "under 1 ft",
};

/** 8 ft in mm (1 ft = 304.8 mm, NIST SP 811). */
export const FT8_MM = 8 * M_PER_FT * 1000;
// A hair above each footage, so a C that reaches a boundary by repeated stepping stays in the shorter class.
const B8 = FT8_MM * (1 + 1e-9);
const B4 = (FT8_MM / 2) * (1 + 1e-9);
const B2 = (FT8_MM / 4) * (1 + 1e-9);
const B1 = (FT8_MM / 8) * (1 + 1e-9);
/** Class boundaries in mm, longest first (a pipe longer than BOUNDS[i] is in class i or a longer one). */
export const SIZE_CLASS_BOUNDS_MM: readonly number[] = [B8, B4, B2, B1];

/**
 * Size class index (0 = over 8′ … 4 = under 1′) of a pipe's nominal length in mm (nominalLengthMm);
 * boundaries belong to the shorter class, so an 8′ C is a 4–8′ pipe.
 */
export function sizeClassIndex(lengthMm: number): number {
  return lengthMm > B8 ? 0 : lengthMm > B4 ? 1 : lengthMm > B2 ? 2 : lengthMm > B1 ? 3 : 4;
}

export function sizeClassOf(lengthMm: number): SizeClass {
  return sizeClasses[sizeClassIndex(lengthMm)];
}

/**
 * A pipe's nominal length as the trade reckons size, in mm: 8 ft at 8′ C for an open pipe, halving
 * every octave, times `lengthFraction` (½ for a stopped pipe or a half-length resonator, ⅛ for an
 * eighth-length regal resonator …). Independent of pitch standard and temperature, unlike the
 * speaking length, so norms priced "per pipe of 4–8 ft" do not jump when the pitch changes.
 */
export function nominalLengthMm(semitonesAbove8ftC: number, lengthFraction: number): number {
  return FT8_MM * lengthFraction * Math.pow(2, -semitonesAbove8ftC / 12);
}

/** 12·log2 of each class bound: nominal lengths compared as semitones. */
const BOUND_SEMITONES = SIZE_CLASS_BOUNDS_MM.map((b) => 12 * Math.log2(b));

/**
 * How many of `count` pipes are longer than size-class bound c (SIZE_CLASS_BOUNDS_MM[c]), when the
 * first pipe's nominal length is 2^(firstSemitones/12) mm and each next one a semitone shorter:
 * pipe i is longer while i < firstSemitones − 12·log2(bound). O(1), no stepping.
 */
export function pipesLongerThanBound(firstSemitones: number, c: number, count: number): number {
  const x = firstSemitones - BOUND_SEMITONES[c];
  return x <= 0 ? 0 : Math.min(count, Math.ceil(x));
}

/**
 * How many of `count` pipes, whose nominal length starts at `firstMm` and shrinks a semitone at a
 * time, fall in each size class: writes five counts into out[at … at+4]. O(1) per run of pipes
 * (the boundaries are found with a logarithm, not pipe by pipe).
 */
export function splitBySizeClass(firstMm: number, count: number, out: Float64Array, at: number): void {
  splitBySizeClassFrom(12 * Math.log2(firstMm), count, out, at);
}

/** splitBySizeClass for a first pipe given as 12·log2(its nominal length in mm). */
export function splitBySizeClassFrom(firstSemitones: number, count: number, out: Float64Array, at: number): void {
  let done = 0;
  for (let c = 0; c < 4; c++) {
    const upTo = pipesLongerThanBound(firstSemitones, c, count);
    if (upTo > done) {
      out[at + c] += upTo - done;
      done = upTo;
    }
  }
  if (count > done) out[at + 4] += count - done;
}
