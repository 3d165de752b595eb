/**
 * Speed of sound and speaking lengths of flue pipes and reed resonators.
 * Open pipe f ≈ c / 2L, stopped f ≈ c / 4L (Handbook of Acoustics, p. 106), lengthened by end
 * corrections after H. Ising (1971), as summarised in secondary sources:
 *   ΔL_mouth = 0.73 · S / √S_M,  ΔL_top = 0.34 · √S  (S pipe cross-section, S_M mouth area, m²).
 * For a round metal pipe (S = πD²/4, mouth W = fraction·πD wide and cut-up·W high) and for a square
 * wooden pipe of the same cross-section (inside width a = D·√π/2, the mouth spanning the width a)
 * both corrections are proportional to the diameter, which keeps the per-pipe formula to one
 * division and one multiply.
 */
import { SQUARE_SIDE_PER_DIAMETER } from "./scale";

/** How a pipe resonates: open flues (incl. conical), stopped flues (stopped, capped, half-stopped), reed resonators. */
export type Resonator = "open" | "stopped" | "reed";

export const ISING_MOUTH = 0.73;
export const ISING_TOP = 0.34;

/** Speed of sound in dry air, m/s: c = 331.3 · √(1 + T/273.15), T in °C (Wikipedia, "Speed of sound"). */
export function speedOfSoundMPerS(temperatureC: number): number {
  return 331.3 * Math.sqrt(1 + temperatureC / 273.15);
}

/**
 * The resonator model a construction uses. A closed top — a stopper, a soldered lid, a movable cap —
 * makes a stopped pipe; a chimney through it (half-stopped) is modelled as stopped too.
 */
export function resonatorOf(construction: string): Resonator {
  switch (construction) {
    case "stopped":
    case "capped":
    case "half-stopped":
      return "stopped";
    case "reed":
      return "reed";
    default:
      return "open";
  }
}

/** Mouth correction per unit diameter of a round mouth: ΔL_mouth / D = 0.73 / (4 · widthFraction · √cutUp). */
export function mouthCorrectionPerDiameter(mouthWidthFraction: number, cutUpFraction: number): number {
  return ISING_MOUTH / (4 * mouthWidthFraction * Math.sqrt(cutUpFraction));
}

/**
 * Mouth correction per unit diameter of a square wooden pipe whose mouth spans the inside width a:
 * S = a², S_M = a · cutUp·a, so ΔL_mouth = 0.73 · a / √cutUp, with a = D·√π/2.
 */
export function woodMouthCorrectionPerDiameter(cutUpFraction: number): number {
  return (ISING_MOUTH * SQUARE_SIDE_PER_DIAMETER) / Math.sqrt(cutUpFraction);
}

/** Open-end correction per unit diameter: 0.34 · √(π/4) ≈ 0.301, i.e. ≈ 0.60 r (cf. Levine & Schwinger's 0.6133 r). Same for a square of equal area. */
export const TOP_CORRECTION_PER_DIAMETER = ISING_TOP * Math.sqrt(Math.PI / 4);

/**
 * End correction per unit diameter that a resonator's length loses: mouth + top for open pipes,
 * mouth only for stopped ones; none for reed resonators, which are cut to their nominal length.
 */
export function endCorrectionPerDiameter(resonator: Resonator, mouthWidthFraction: number, cutUpFraction: number, wood = false): number {
  if (resonator === "reed") return 0;
  const mouth = wood ? woodMouthCorrectionPerDiameter(cutUpFraction) : mouthCorrectionPerDiameter(mouthWidthFraction, cutUpFraction);
  return resonator === "open" ? mouth + TOP_CORRECTION_PER_DIAMETER : mouth;
}

/**
 * Wavelength divisor of a resonator: open flues ½ wave (2), stopped ¼ wave (4); a reed resonator is
 * the given fraction of full (half-wave) length: full 2, half 4, an eighth 16.
 */
export function waveDivisor(resonator: Resonator, resonatorFraction = 1): number {
  return resonator === "open" ? 2 : resonator === "stopped" ? 4 : 2 / resonatorFraction;
}

/** A pipe can be no shorter than this fraction of its uncorrected length (guards absurdly wide scales). */
export const MIN_LENGTH_FRACTION = 0.25;

/**
 * Speaking length in metres of a pipe sounding frequencyHz: c / (divisor · f) − k · D, where k is
 * endCorrectionPerDiameter (m per m of diameter) and D the diameter in metres.
 */
export function speakingLengthM(frequencyHz: number, diameterM: number, divisor: number, correctionPerDiameter: number, speedMPerS: number): number {
  const nominal = speedMPerS / (divisor * frequencyHz);
  const l = nominal - correctionPerDiameter * diameterM;
  return l > nominal * MIN_LENGTH_FRACTION ? l : nominal * MIN_LENGTH_FRACTION;
}

/** Inverse of speakingLengthM: the frequency in Hz a pipe of lengthM and diameterM sounds. */
export function resonantFrequencyHz(lengthM: number, diameterM: number, divisor: number, correctionPerDiameter: number, speedMPerS: number): number {
  return speedMPerS / (divisor * (lengthM + correctionPerDiameter * diameterM));
}
