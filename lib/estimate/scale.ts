/**
 * Pipe diameters from the scale. Töpfer's normal scale: the cross-section changes 1 : √8 per octave,
 * so the diameter halves on the 17th note (16 semitones); 8′ C = 155.5 mm —
 * Wikipedia, "Organ flue pipe scaling", citing Adelung, Einführung in den Orgelbau (1991), pp. 85–86.
 * A scale is a deviation in semitones from the normal scale read at the rank's own reference note
 * (its C: 4′ C for a 4′ rank), and a halving note that governs it from there.
 */

/** Diameter of 8′ C on the normal scale, mm (Adelung via Wikipedia). */
export const NORMAL_SCALE_8FT_C_MM = 155.5;

export interface ScaleParams {
  /** Semitones wider (+) or narrower (−) than normal at the reference note. */
  readonly deviationHt: number;
  /** Note (counted from 1) on which the diameter halves; normal 17. */
  readonly halvingOn: number;
  /** The reference note, in semitones above 8′ C: the rank's own C. */
  readonly referenceSemitones: number;
}

/** Diameter ratio from one semitone to the next: 2^(−1/(halvingOn − 1)). */
export function diameterRatioPerSemitone(halvingOn: number): number {
  // As an exponential: Math.pow costs several times Math.exp, and every form of every rank takes one.
  return Math.exp(-Math.LN2 / (halvingOn - 1));
}

/** Normal-scale diameter in mm of a pipe sounding `semitones` above 8′ C: 155.5 / 2^(semitones/16). */
export function normalDiameterMm(semitonesAbove8ftC: number): number {
  return NORMAL_SCALE_8FT_C_MM * Math.pow(2, -semitonesAbove8ftC / 16);
}

/**
 * Diameter in mm of a pipe sounding `semitones` above 8′ C: the normal diameter `deviationHt`
 * semitones below the reference note, then halving on the scale's own note:
 * D = D_normal(ref − dev) · 2^(−(s − ref)/(halvingOn − 1)).
 */
export function diameterMm(semitonesAbove8ftC: number, scale: ScaleParams): number {
  const atRef = normalDiameterMm(scale.referenceSemitones - scale.deviationHt);
  return atRef * Math.pow(2, -(semitonesAbove8ftC - scale.referenceSemitones) / (scale.halvingOn - 1));
}

/** Mouth width in mm of a round pipe: a fraction of the circumference (normal ¼ — Wikipedia, op. cit.; Dickson p. 42). */
export function mouthWidthMm(diameterMm: number, fractionOfCircumference: number): number {
  return fractionOfCircumference * Math.PI * diameterMm;
}

/** Inside side in mm of a square wooden pipe with the cross-section of the scaled circle: D·√π/2. */
export const SQUARE_SIDE_PER_DIAMETER = Math.sqrt(Math.PI) / 2;

export function squareSideMm(diameterMm: number): number {
  return diameterMm * SQUARE_SIDE_PER_DIAMETER;
}
