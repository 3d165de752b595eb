/**
 * Pipe metal and wood: alloy densities, sheet areas and masses, board volumes of wooden pipes.
 * Element densities, g/cm³, from the open dataset Periodic-Table-JSON (values from Wikipedia).
 */
import type { Construction, Material } from "./scheme";

export const ELEMENT_DENSITY_G_CM3 = {
  tin: 7.287,
  lead: 11.34,
  zinc: 7.14,
  copper: 8.96,
  antimony: 6.697,
} as const;

export type Element = keyof typeof ELEMENT_DENSITY_G_CM3;
export type Composition = Readonly<Partial<Record<Element, number>>>;

export const metals = ["high-tin", "spotted", "common", "zinc", "copper"] as const;
export const woods = ["pine", "oak", "mahogany"] as const;
export type Metal = (typeof metals)[number];
export type Wood = (typeof woods)[number];

export function isWood(material: Material): material is Wood {
  return material === "pine" || material === "oak" || material === "mahogany";
}

export const MSG_EMPTY_COMPOSITION = "an alloy needs at least one element with a positive weight fraction";

/**
 * Density of an alloy by the rule of mixtures on weight fractions, 1/ρ = Σ wᵢ/ρᵢ (derived; ignores
 * the small volume change on alloying). Fractions are normalised, so {tin: 50, lead: 50} works too.
 */
export function alloyDensityGCm3(composition: Composition): number {
  let total = 0;
  let specificVolume = 0;
  for (const [el, w] of Object.entries(composition) as [Element, number][]) {
    if (!(w > 0)) continue;
    total += w;
    specificVolume += w / ELEMENT_DENSITY_G_CM3[el];
  }
  if (total <= 0) throw new Error(MSG_EMPTY_COMPOSITION);
  return total / specificVolume;
}

export function containsLead(composition: Composition): boolean {
  return (composition.lead ?? 0) > 0;
}

/** Body area factor on π·D·L: cylinders 1, conical bodies tapering to ⅓ D ⅔, full-length (conical) reed resonators ½. */
export function bodyAreaFactor(construction: Construction): number {
  switch (construction) {
    case "conical":
      return 2 / 3;
    case "reed-full":
      return 0.5;
    default:
      return 1;
  }
}

/**
 * Sheet area in mm² of one metal pipe: body π·D·L·factor, a conical foot (lateral area π·(D/2)·footLength),
 * and a cap of π·D²/4 on stopped and capped pipes. D, L and footLength in mm.
 */
export function sheetAreaMm2(areaFactor: number, capped: boolean, diameterMm: number, lengthMm: number, footLengthMm: number): number {
  const body = Math.PI * diameterMm * lengthMm * areaFactor;
  const foot = 0.5 * Math.PI * diameterMm * footLengthMm;
  return capped ? body + foot + 0.25 * Math.PI * diameterMm * diameterMm : body + foot;
}

/** Mass in kg of sheet: area mm² × thickness mm × density g/cm³ (1 mm³ = 10⁻³ cm³, 1 g = 10⁻³ kg). */
export function sheetMassKg(areaMm2: number, thicknessMm: number, densityGCm3: number): number {
  return areaMm2 * thicknessMm * densityGCm3 * 1e-6;
}

/**
 * Board volume in m³ of a square wooden pipe of inside side a and length L with walls of thickness t:
 * four walls, (a + 2t)² − a² = 4t(a + t) per unit length; all in mm.
 */
export function woodBoardVolumeM3(insideSideMm: number, lengthMm: number, boardMm: number): number {
  return 4 * boardMm * (insideSideMm + boardMm) * lengthMm * 1e-9;
}
