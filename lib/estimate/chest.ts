/**
 * Windchest space. Pipes of a rank stand in a row; each takes its width plus a clearance that grows
 * with the pipe (a minimum plus a fraction of the diameter). A chromatic chest has one row per rank;
 * a C/C♯ chest splits each rank into a C side and a C♯ side, two half-chests side by side. The chest
 * is as long as its longest row plus end boards. Depth is Σ over rows of (largest pipe + clearance),
 * plus a passage board for tuning where the division has one. Offset bass chests are sized the same
 * way and are assumed to stand elsewhere in the case (not counted against the space).
 */
import type { Rates } from "./rates";

export type ChestLayout = "chromatic" | "c-c-sharp";
type ChestNorms = Rates["chest"];

/** Clearance in mm a pipe of diameter d (mm) needs beside it. */
export function clearanceMm(diameterMm: number, n: ChestNorms): number {
  return n.clearanceMinMm + n.clearanceFractionOfDiameter * diameterMm;
}

/** Row length in mm one pipe takes: its footprint (diameter, or outside width of a wooden pipe) plus clearance. */
export function pipeRowWidthMm(footprintMm: number, diameterMm: number, n: ChestNorms): number {
  return footprintMm + clearanceMm(diameterMm, n);
}

/** One rank's row on a chest: summed widths on the C side and the C♯ side, and its largest pipe. */
export interface ChestRow {
  readonly cSideMm: number;
  readonly cSharpSideMm: number;
  readonly largestFootprintMm: number;
  readonly largestDiameterMm: number;
}

export interface ChestSize {
  readonly layout: ChestLayout;
  readonly rows: number;
  /** Total length needed along the case: one chest, or both half-chests of a C/C♯ layout. */
  readonly lengthMm: number;
  readonly depthMm: number;
  /** C/C♯ layout: length of the C half-chest and the C♯ half-chest. */
  readonly halvesMm?: readonly [number, number];
}

const r1 = (x: number) => Math.round(x * 10) / 10;

/** Size of a chest holding `rows`. An empty chest is 0 × 0. */
export function chestSize(rows: readonly ChestRow[], layout: ChestLayout, passageBoard: boolean, n: ChestNorms): ChestSize {
  if (rows.length === 0) return { layout, rows: 0, lengthMm: 0, depthMm: 0 };
  let longestC = 0;
  let longestCs = 0;
  let longestWhole = 0;
  let depth = 0;
  for (const r of rows) {
    if (r.cSideMm > longestC) longestC = r.cSideMm;
    if (r.cSharpSideMm > longestCs) longestCs = r.cSharpSideMm;
    if (r.cSideMm + r.cSharpSideMm > longestWhole) longestWhole = r.cSideMm + r.cSharpSideMm;
    depth += r.largestFootprintMm + clearanceMm(r.largestDiameterMm, n);
  }
  if (passageBoard) depth += n.passageBoardMm;
  const ends = 2 * n.endBoardMm;
  if (layout === "chromatic") return { layout, rows: rows.length, lengthMm: r1(longestWhole + ends), depthMm: r1(depth) };
  const halves = [r1(longestC + ends), r1(longestCs + ends)] as const;
  return { layout, rows: rows.length, lengthMm: r1(halves[0] + halves[1]), depthMm: r1(depth), halvesMm: halves };
}

export interface ChestFit {
  readonly fits: boolean;
  /** Space left (+) or short (−), mm. */
  readonly lengthMarginMm: number;
  readonly depthMarginMm: number;
}

/** Does a chest fit the space available (length × depth, mm)? */
export function chestFit(size: ChestSize, space: { readonly lengthMm: number; readonly depthMm: number }): ChestFit {
  const lengthMarginMm = r1(space.lengthMm - size.lengthMm);
  const depthMarginMm = r1(space.depthMm - size.depthMm);
  return { fits: lengthMarginMm >= 0 && depthMarginMm >= 0, lengthMarginMm, depthMarginMm };
}
