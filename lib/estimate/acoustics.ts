/**
 * Speed of sound and speaking lengths of flue pipes and reed resonators.
 * Open pipe f ≈ c / 2L, stopped f ≈ c / 4L (Handbook of Acoustics, p. 106), lengthened by end
 * corrections after H. Ising (1971), as summarised in secondary sources:
 *   ΔL_mouth = 0.73 · S / √S_M,  ΔL_top = 0.34 · √S  (S pipe cross-section, S_M mouth area, m²).
 * With S = πD²/4 and a rectangular mouth W × h (W = fraction·πD, h = cut-up · W) both are
 * proportional to the diameter, which keeps the per-pipe formula to one division and one multiply.
 */
import type { Construction } from "./scheme";

/** How a pipe resonates: open flues (incl. conical, capped), stopped flues (incl. half-stopped), reed resonators. */
export type Resonator = "open" | "stopped" | "reed-full" | "reed-half";

export const ISING_MOUTH = 0.73;
export const ISING_TOP = 0.34;

/** Speed of sound in dry air, m/s: c = 331.3 · √(1 + T/273.15), T in °C (Wikipedia, "Speed of sound"). */
export function speedOfSoundMPerS(temperatureC: number): number {
  return 331.3 * Math.sqrt(1 + temperatureC / 273.15);
}

/** The resonator model a construction uses. Half-stopped (chimney) pipes are modelled as stopped. */
export function resonatorOf(construction: Construction): Resonator {
  switch (construction) {
    case "stopped":
    case "half-stopped":
      return "stopped";
    case "reed-full":
      return "reed-full";
    case "reed-half":
      return "reed-half";
    default:
      return "open";
  }
}

/** Mouth correction per unit diameter: ΔL_mouth / D = 0.73 / (4 · widthFraction · √cutUp). */
export function mouthCorrectionPerDiameter(mouthWidthFraction: number, cutUpFraction: number): number {
  return ISING_MOUTH / (4 * mouthWidthFraction * Math.sqrt(cutUpFraction));
}

/** Open-end correction per unit diameter: 0.34 · √(π/4) ≈ 0.301, i.e. ≈ 0.60 r (cf. Levine & Schwinger's 0.61 r). */
export const TOP_CORRECTION_PER_DIAMETER = ISING_TOP * Math.sqrt(Math.PI / 4);

/**
 * End correction per unit diameter that a resonator's length loses: mouth + top for open pipes,
 * mouth only for stopped ones; none for reed resonators, which are cut to their nominal length.
 */
export function endCorrectionPerDiameter(resonator: Resonator, mouthWidthFraction: number, cutUpFraction: number): number {
  if (resonator === "open") return mouthCorrectionPerDiameter(mouthWidthFraction, cutUpFraction) + TOP_CORRECTION_PER_DIAMETER;
  if (resonator === "stopped") return mouthCorrectionPerDiameter(mouthWidthFraction, cutUpFraction);
  return 0;
}

/** Wavelength divisor of each resonator: open and full-length reeds ½ wave, stopped and half-length reeds ¼ wave. */
export function waveDivisor(resonator: Resonator): 2 | 4 {
  return resonator === "open" || resonator === "reed-full" ? 2 : 4;
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
