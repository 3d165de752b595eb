/**
 * Scales as a tonal director reads them, and a scale fitted to survey measurements.
 *
 * A pipe's deviation from Töpfer's normal scale, in semitones, is how many semitones lower on the
 * normal scale a pipe of its diameter would stand: δ = s + 16 · log2(D / 155.5 mm), s the semitones
 * it sounds above 8′ C (normal scale: D = 155.5 mm / 2^(s/16) — Wikipedia, "Organ flue pipe scaling",
 * citing Adelung 1991, pp. 85–86). The estimator's scale (lib/estimate/scale.ts) is a deviation `dev`
 * at the rank's C and a halving note H, so along the keyboard, x semitones above the rank's C,
 * δ(x) = dev + x · (1 − 16 / (H − 1)) (derived): a straight line, level for the normal halving on
 * the 17th note, rising for a later halving (the trebles wider), falling for an earlier one.
 * Fitting a scale is then a least-squares line through the measured deviations, with H held to the
 * whole notes the scheme allows.
 */
import { NORMAL_SCALE_8FT_C_MM, SQUARE_SIDE_PER_DIAMETER } from "@/lib/estimate/scale";
import { midiToNote, noteToMidi } from "@/lib/estimate/notes";

/** The rank's C is the keyboard's C (MIDI 36): its reference note (lib/estimate/scale.ts). */
export const RANK_C_MIDI = 36;
/** Halving notes the scheme model allows (scaleSchema.halvingOn). */
export const HALVING_MIN = 8;
export const HALVING_MAX = 32;
export const NORMAL_HALVING = 17;
/** Narrower than this span of notes (a fifth), the measurements say nothing trustworthy about the halving. */
export const MIN_SPAN_FOR_HALVING = 7;
/** A measured pipe further than this from the fitted line is worth a second look, semitones. */
export const RESIDUAL_WARNING_HT = 1;
/** Plausible pipe sizes, mm: from a 64′ bass to the smallest treble pipe. */
const SMALLEST_MM = 1;
const LARGEST_MM = 1000;

/** Deviation in semitones from the normal scale of a pipe of diameter D sounding s semitones above 8′ C. */
export function deviationHt(semitonesAbove8ftC: number, diameterMm: number): number {
  return semitonesAbove8ftC + 16 * Math.log2(diameterMm / NORMAL_SCALE_8FT_C_MM);
}

/** How much the deviation rises per semitone up the keyboard for a halving on note H: 1 − 16/(H − 1). */
export function slopeOfHalving(halvingOn: number): number {
  return 1 - 16 / (halvingOn - 1);
}

/** The scale's deviation x semitones above the rank's C. */
export function deviationAlong(scale: { readonly deviationHt: number; readonly halvingOn: number }, semitonesAboveRankC: number): number {
  return scale.deviationHt + semitonesAboveRankC * slopeOfHalving(scale.halvingOn);
}

export interface MeasurementInput {
  /** The key the pipe stands on, in Helmholtz notation: C, c, c', c''. */
  readonly note: string;
  /** Measured outside diameter (metal) or inside side (wood), mm. */
  readonly sizeMm: number;
}

export interface FitRequest {
  readonly measurements: readonly MeasurementInput[];
  /** The rank's own C, semitones above 8′ C (0 for 8′, 12 for 4′, −12 for 16′). */
  readonly referenceSemitones: number;
  /** Wooden ranks are measured by their inside side; the scale is of the circle of equal area. */
  readonly wooden: boolean;
  /** The rank's keys, MIDI: a measurement outside them is refused. */
  readonly compass: { readonly lowMidi: number; readonly highMidi: number };
  /** Kept when the notes measured are too close together to say anything about the halving. */
  readonly currentHalvingOn: number;
  /** For messages: how a length is written in the firm's units (e.g. "54.9 mm"). */
  readonly formatLength?: (mm: number) => string;
}

export interface FitProblem {
  /** Row of the measurement, from 0; null for the request as a whole. */
  readonly row: number | null;
  readonly field: "note" | "size" | null;
  readonly message: string;
}

export interface Residual {
  readonly note: string;
  readonly keyMidi: number;
  readonly measuredMm: number;
  readonly fittedMm: number;
  /** Measured minus fitted, mm and semitones of scale (positive: the pipe is wider than the fit). */
  readonly mm: number;
  readonly ht: number;
  /** The measured pipe's own deviation from the normal scale. */
  readonly deviationHt: number;
}

export type FitResult =
  | {
      readonly ok: true;
      /** Rounded to a tenth of a semitone, as a scale is written. */
      readonly deviationHt: number;
      readonly halvingOn: number;
      /** False when the halving was kept, not fitted (one note, or notes within a fifth). */
      readonly halvingFitted: boolean;
      readonly residuals: readonly Residual[];
      /** Root-mean-square residual, semitones. */
      readonly rmsHt: number;
      readonly warnings: readonly string[];
    }
  | { readonly ok: false; readonly problems: readonly FitProblem[] };

const round1 = (x: number) => Math.round(x * 10) / 10;
const defaultFormat = (mm: number) => `${Number(mm.toFixed(1))} mm`;

/**
 * Fits the deviation and halving that best match measured pipes, least squares in semitones of scale
 * (a log scale, so a 2 mm error on a bass pipe weighs as much as a 0.3 mm error on a treble pipe of
 * the same relative size). Every bad row is named; nothing is fitted from a request with a bad row.
 */
export function fitScale(req: FitRequest): FitResult {
  const fmt = req.formatLength ?? defaultFormat;
  const problems: FitProblem[] = [];
  if (req.measurements.length === 0)
    return { ok: false, problems: [{ row: null, field: null, message: "Enter at least one measured pipe: its note and its size." }] };
  const seen = new Map<number, number>();
  const points: { x: number; y: number; keyMidi: number; note: string; mm: number }[] = [];
  const what = req.wooden ? "inside side" : "diameter";
  req.measurements.forEach((m, row) => {
    const note = m.note.trim();
    const key = noteToMidi(note);
    if (note === "") problems.push({ row, field: "note", message: `Row ${row + 1}: which note was measured? Write it as the trade does, e.g. C, c, c', c''.` });
    else if (key === null) problems.push({ row, field: "note", message: `Row ${row + 1}: "${note}" is not a note; write it as the trade does, e.g. C, c, c', c''.` });
    else if (key < req.compass.lowMidi || key > req.compass.highMidi)
      problems.push({ row, field: "note", message: `Row ${row + 1}: ${note} is outside this rank's compass (${midiToNote(req.compass.lowMidi)}–${midiToNote(req.compass.highMidi)}).` });
    else if (seen.has(key))
      problems.push({ row, field: "note", message: `Row ${row + 1}: ${note} is measured already in row ${seen.get(key)! + 1}; keep one measurement per note (or enter their average).` });
    if (!Number.isFinite(m.sizeMm) || m.sizeMm < SMALLEST_MM || m.sizeMm > LARGEST_MM)
      problems.push({
        row, field: "size",
        message: Number.isFinite(m.sizeMm)
          ? `Row ${row + 1}: a ${what} of ${fmt(m.sizeMm)} is not a pipe's; enter the measured ${what} (${fmt(SMALLEST_MM)} to ${fmt(LARGEST_MM)}).`
          : `Row ${row + 1}: enter the measured ${what} as a number.`,
      });
    if (key !== null && problems.every((p) => p.row !== row)) {
      seen.set(key, row);
      const diameter = req.wooden ? m.sizeMm / SQUARE_SIDE_PER_DIAMETER : m.sizeMm;
      const x = key - RANK_C_MIDI;
      points.push({ x, y: deviationHt(req.referenceSemitones + x, diameter), keyMidi: key, note: midiToNote(key), mm: m.sizeMm });
    }
  });
  if (problems.length > 0) return { ok: false, problems };

  const xs = points.map((p) => p.x);
  const span = Math.max(...xs) - Math.min(...xs);
  const halvingFitted = span >= MIN_SPAN_FOR_HALVING;
  const candidates = halvingFitted ? range(HALVING_MIN, HALVING_MAX) : [req.currentHalvingOn];
  let best = { h: candidates[0], dev: 0, sse: Infinity };
  for (const h of candidates) {
    const k = slopeOfHalving(h);
    // With the slope fixed, the least-squares intercept is the mean of y − kx.
    const dev = mean(points.map((p) => p.y - k * p.x));
    const sse = points.reduce((s, p) => s + (p.y - dev - k * p.x) ** 2, 0);
    if (sse < best.sse - 1e-12) best = { h, dev, sse };
  }
  const scale = { deviationHt: round1(best.dev), halvingOn: best.h };
  if (scale.deviationHt < -48 || scale.deviationHt > 48)
    return { ok: false, problems: [{ row: null, field: null, message: `These sizes are ${Math.abs(scale.deviationHt)} semitones off the normal scale: check the units and the notes.` }] };

  const residuals: Residual[] = points.map((p) => {
    const fittedDev = deviationAlong(scale, p.x);
    const fittedDiameter = NORMAL_SCALE_8FT_C_MM * Math.pow(2, (fittedDev - req.referenceSemitones - p.x) / 16);
    const fittedMm = req.wooden ? fittedDiameter * SQUARE_SIDE_PER_DIAMETER : fittedDiameter;
    return { note: p.note, keyMidi: p.keyMidi, measuredMm: p.mm, fittedMm, mm: p.mm - fittedMm, ht: p.y - fittedDev, deviationHt: p.y };
  });
  const rmsHt = Math.sqrt(mean(residuals.map((r) => r.ht ** 2)));
  const warnings: string[] = [];
  if (!halvingFitted)
    warnings.push(
      points.length === 1
        ? `One pipe measured: only the width is fitted; the halving stays on note ${scale.halvingOn}. Measure pipes an octave or more apart to fit the halving too.`
        : `The notes measured lie within a fifth: only the width is fitted; the halving stays on note ${scale.halvingOn}. Measure pipes an octave or more apart to fit the halving too.`,
    );
  for (const r of residuals)
    if (Math.abs(r.ht) > RESIDUAL_WARNING_HT)
      warnings.push(`${r.note} is ${Math.abs(round1(r.ht))} semitones ${r.ht > 0 ? "wider" : "narrower"} than the fitted scale: check the measurement; the pipe may come from another rank.`);
  return { ok: true, ...scale, halvingFitted, residuals, rmsHt, warnings };
}

function mean(xs: readonly number[]): number {
  return xs.reduce((s, x) => s + x, 0) / xs.length;
}

function range(from: number, to: number): number[] {
  return Array.from({ length: to - from + 1 }, (_, i) => from + i);
}
