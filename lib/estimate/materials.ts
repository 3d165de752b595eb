/**
 * Pipe metal and wood: alloy densities, sheet thickness by size and alloy, sheet areas of metal
 * pipes, board volumes of wooden pipes with their blocks, caps and stoppers.
 * Element densities, g/cm³, from the open dataset Periodic-Table-JSON (values from Wikipedia).
 */
import type { Material } from "./scheme";

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
/** Metals then woods, in one index space (per-stop material accumulators). */
export const ALL_MATERIALS: readonly Material[] = [...metals, ...woods];
export const MATERIAL_INDEX: Readonly<Record<Material, number>> = Object.fromEntries(ALL_MATERIALS.map((m, i) => [m, i])) as Record<Material, number>;

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

/** Diameter of the normal-scale 8′ C (mm) and the inside width of a square pipe of its cross-section: the references of the thickness norms. */
export const REFERENCE_DIAMETER_MM = 155.5;
export const REFERENCE_SIDE_MM = 155.5 * (Math.sqrt(Math.PI) / 2);

export interface SheetNorms {
  readonly thicknessAt8ftCMm: number;
  readonly thicknessExponent: number;
  readonly minimumThicknessMm: number;
  readonly thicknessFactor: Readonly<Record<Metal, number>>;
}

/**
 * Sheet thickness in mm of a metal pipe of diameter D: t = t₈ · factor(alloy) · (D / 155.5)^p, never
 * below the thinnest sheet cast. Practice (from memory, Töpfer/Ellerhorst tradition): about 1.0–1.5 mm
 * at 8′ C falling to 0.3–0.4 mm at the top of the compass, thicker for lead-rich metal.
 */
export function sheetThicknessMm(diameterMm: number, metal: Metal, n: SheetNorms): number {
  const t = n.thicknessAt8ftCMm * n.thicknessFactor[metal] * Math.pow(diameterMm / REFERENCE_DIAMETER_MM, n.thicknessExponent);
  return t > n.minimumThicknessMm ? t : n.minimumThicknessMm;
}

export interface BoardNorms {
  readonly boardAt8ftCMm: number;
  readonly boardExponent: number;
  readonly minimumBoardMm: number;
  readonly blockLengthPerSide: number;
  readonly capHeightPerSide: number;
  readonly stopperLengthPerSide: number;
}

/**
 * Board thickness in mm of a wooden pipe of inside width a: b₈ · (a / 137.8)^q, never below the
 * thinnest board. Audsley gives about 50–75 mm for 32′ pipes (from memory); the default exponent takes
 * 25 mm at 8′ C to about 55 mm at a normal-scale 32′ C.
 */
export function boardThicknessMm(insideSideMm: number, n: BoardNorms): number {
  const b = n.boardAt8ftCMm * Math.pow(insideSideMm / REFERENCE_SIDE_MM, n.boardExponent);
  return b > n.minimumBoardMm ? b : n.minimumBoardMm;
}

/** Body area factor on π·D·L: cylinders 1, conical flue bodies tapering to ⅓ D ⅔, conical reed resonators (from near nothing) ½. */
export function bodyAreaFactor(construction: string, conicalResonator: boolean): number {
  if (construction === "conical") return 2 / 3;
  if (construction === "reed") return conicalResonator ? 0.5 : 1;
  // A chimney (about ¼ D wide and ⅛ of the body long) adds ¹⁄₃₂ of the body's area.
  if (construction === "half-stopped") return 1 + 1 / 32;
  return 1;
}

/**
 * Sheet closing the top of a metal pipe, per D² (mm² per mm²): a lid π/4 on stopped pipes; a cap
 * with its skirt (π/4 + π · skirt) on capped and half-stopped pipes; nothing on open pipes and reeds.
 */
export function topSheetPerDiameterSq(construction: string, capSkirtPerDiameter: number): number {
  if (construction === "stopped") return Math.PI / 4;
  if (construction === "capped" || construction === "half-stopped") return Math.PI / 4 + Math.PI * capSkirtPerDiameter;
  return 0;
}

/**
 * Sheet area in mm² of one metal pipe: body π·D·L × areaFactor, a conical foot (lateral area
 * π·(D/2)·footLength) and the top (topPerDSq · D²). D, L and footLength in mm.
 */
export function sheetAreaMm2(areaFactor: number, topPerDSq: number, diameterMm: number, lengthMm: number, footLengthMm: number): number {
  return Math.PI * diameterMm * (lengthMm * areaFactor + 0.5 * footLengthMm) + topPerDSq * diameterMm * diameterMm;
}

/** Mass in kg of sheet: area mm² × thickness mm × density g/cm³ (1 mm³ = 10⁻³ cm³, 1 g = 10⁻³ kg). */
export function sheetMassKg(areaMm2: number, thicknessMm: number, densityGCm3: number): number {
  return areaMm2 * thicknessMm * densityGCm3 * 1e-6;
}

/**
 * Solid parts of a wooden pipe per a³ (a the inside width): a block `blockLengthPerSide`·a long
 * under the mouth and a cap of one board across the outside width on every flue, and a stopper with
 * its handle on stopped pipes. Returned as the block-and-stopper volume per a³ and the cap height per a.
 */
export function woodPartsPerSide(construction: string, n: BoardNorms): { solidPerA3: number; capHeightPerA: number } {
  if (construction === "reed") return { solidPerA3: 0, capHeightPerA: 0 };
  const stopped = construction === "stopped" || construction === "capped" || construction === "half-stopped";
  return { solidPerA3: n.blockLengthPerSide + (stopped ? n.stopperLengthPerSide : 0), capHeightPerA: n.capHeightPerSide };
}

/**
 * Timber volume in m³ of one square wooden pipe of inside width a and length L with boards b thick:
 * four walls, (a + 2b)² − a² = 4b(a + b) per unit length (× areaFactor for a tapering reed
 * resonator), plus its block, cap and stopper (woodPartsPerSide); all in mm.
 */
export function woodPipeVolumeM3(insideSideMm: number, lengthMm: number, boardMm: number, areaFactor: number, parts: { solidPerA3: number; capHeightPerA: number }): number {
  const a = insideSideMm;
  const walls = 4 * boardMm * (a + boardMm) * lengthMm * areaFactor;
  const solid = parts.solidPerA3 * a * a * a + parts.capHeightPerA * a * (a + 2 * boardMm) * boardMm;
  return (walls + solid) * 1e-9;
}
