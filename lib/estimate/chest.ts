/**
 * Windchest space — the one chest rule, used by the estimator's figures and by the chest drawing.
 * Pipes of a rank stand in a row; each takes its footprint (diameter, or a wooden pipe's outside
 * width) plus a clearance that grows with the pipe (a minimum plus a fraction of the diameter). A
 * chromatic chest has one row per rank; a C/C♯ chest splits each rank by the parity of its channel
 * into a C side and a C♯ side, two half-chests, basses at their outer ends. The chest is as long as
 * its longest row (or half-rows) plus end boards. Depth is Σ over rows of (largest pipe + its
 * clearance), plus a passage board for tuning where the division has one. Offset bass chests are
 * sized the same way (chromatic, no passage board) and stand elsewhere in the case.
 */
import type { Rates } from "./rates";

export type ChestLayout = "chromatic" | "c-c-sharp";
type ChestNorms = Rates["chest"];

/** Clearance in mm a pipe of diameter d (mm) needs beside it. */
export function clearanceMm(diameterMm: number, n: ChestNorms): number {
  return n.clearanceMinMm + n.clearanceFractionOfDiameter * diameterMm;
}

/** Row length in mm one pipe takes: its footprint plus clearance. */
export function pipeRowWidthMm(footprintMm: number, diameterMm: number, n: ChestNorms): number {
  return rowWidthMm(footprintMm, diameterMm, n.clearanceMinMm, n.clearanceFractionOfDiameter);
}

/** pipeRowWidthMm with the norms' two clearances as numbers: the per-pipe stage reads them once per estimate, not per pipe. */
export function rowWidthMm(footprintMm: number, diameterMm: number, clearanceMinMm: number, clearanceFractionOfDiameter: number): number {
  return footprintMm + clearanceMinMm + clearanceFractionOfDiameter * diameterMm;
}

/** Depth in mm of a row: its largest pipe plus that pipe's clearance. */
export function rowDepthMm(largestFootprintMm: number, largestDiameterMm: number, n: ChestNorms): number {
  return largestFootprintMm + clearanceMm(largestDiameterMm, n);
}

/** Which half-chest a channel stands on: 0 the C side (C, D, E, F♯, G♯, A♯), 1 the C♯ side; always 0 on a chromatic chest. */
export function chestSideOf(channel: number, layout: ChestLayout): 0 | 1 {
  return layout === "chromatic" ? 0 : ((channel & 1) as 0 | 1);
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
    depth += rowDepthMm(r.largestFootprintMm, r.largestDiameterMm, n);
  }
  if (passageBoard) depth += n.passageBoardMm;
  const ends = 2 * n.endBoardMm;
  if (layout === "chromatic") return { layout, rows: rows.length, lengthMm: r1(longestWhole + ends), depthMm: r1(depth) };
  const halves = [r1(longestC + ends), r1(longestCs + ends)] as const;
  return { layout, rows: rows.length, lengthMm: r1(halves[0] + halves[1]), depthMm: r1(depth), halvesMm: halves };
}

export interface RowPipe {
  readonly footprintMm: number;
  readonly diameterMm: number;
  readonly channel: number;
}

/**
 * Where the pipes of one row stand along a chest of `size` (x of each pipe's centre, mm from the
 * left end), given lowest key first, by the firm's `bassesAt`:
 * - ends: chromatic left to right after the end board; on a C/C♯ chest the C side rises from the
 *   left end toward the middle, the C♯ side from the right end;
 * - centre: on a C/C♯ chest each half's basses stand at the middle, the treble outwards; a
 *   chromatic row stands centred on the chest, its lowest pipe in the middle and the next ones
 *   alternately right and left of it.
 * The pipes take the same widths either way, so the row's length (and the chest's) does not change.
 */
export function placeRow(pipes: readonly RowPipe[], size: ChestSize, n: ChestNorms): number[] {
  const centre = n.bassesAt === "centre";
  const xs: number[] = new Array(pipes.length);
  if (size.layout === "chromatic" && centre) {
    // Lowest in the middle: order …, 4, 2, 0, 1, 3, … (indices into pipes), laid left to right.
    const order: number[] = [];
    for (let i = 0; i < pipes.length; i++) {
      if (i % 2 === 0) order.unshift(i);
      else order.push(i);
    }
    let total = 0;
    for (const p of pipes) total += pipeRowWidthMm(p.footprintMm, p.diameterMm, n);
    let x = Math.max(n.endBoardMm, (size.lengthMm - total) / 2);
    for (const i of order) {
      const w = pipeRowWidthMm(pipes[i].footprintMm, pipes[i].diameterMm, n);
      xs[i] = x + w / 2;
      x += w;
    }
    return xs;
  }
  const split = size.halvesMm ? size.halvesMm[0] : size.lengthMm;
  // Cursors and their direction for the C side (or the whole chromatic row) and the C♯ side.
  let a = centre ? split - n.endBoardMm : n.endBoardMm;
  const aDir = centre ? -1 : 1;
  let b = centre ? split + n.endBoardMm : size.lengthMm - n.endBoardMm;
  const bDir = centre ? 1 : -1;
  pipes.forEach((p, i) => {
    const w = pipeRowWidthMm(p.footprintMm, p.diameterMm, n);
    if (chestSideOf(p.channel, size.layout) === 0) {
      xs[i] = a + (aDir * w) / 2;
      a += aDir * w;
    } else {
      xs[i] = b + (bDir * w) / 2;
      b += bDir * w;
    }
  });
  return xs;
}

/** The chest row of a list of pipes, by the same rule the estimator sums. */
export function rowOf(pipes: readonly RowPipe[], layout: ChestLayout, n: ChestNorms): ChestRow {
  let c = 0;
  let cs = 0;
  let foot = 0;
  let dia = 0;
  for (const p of pipes) {
    const w = pipeRowWidthMm(p.footprintMm, p.diameterMm, n);
    if (chestSideOf(p.channel, layout) === 0) c += w;
    else cs += w;
    if (p.footprintMm > foot) [foot, dia] = [p.footprintMm, p.diameterMm];
  }
  return { cSideMm: c, cSharpSideMm: cs, largestFootprintMm: foot, largestDiameterMm: dia };
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
