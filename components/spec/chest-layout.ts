/**
 * Where every pipe of a division stands on its chest, for the plan drawing. Follows the estimator's
 * rules (lib/estimate/chest.ts): each pipe takes its footprint plus a clearance; a C/C♯ chest puts the
 * C side and the C♯ side on two half-chests, basses at the outer ends; rows are as deep as their
 * largest pipe plus clearance. Diameters come from the estimator's per-pipe geometry.
 */
import { clearanceMm } from "@/lib/estimate";
import { pipesOfStop, planScheme, type PipeDetail, type Scheme } from "@/lib/estimate";
import type { DrawingRules } from "@/lib/spec/estimate";

export type PlacedPipe = {
  x: number;
  y: number;
  /** Footprint across the row (diameter, or outside width of a wooden pipe). */
  size: number;
  wood: boolean;
  prepared: boolean;
  key: string;
};

export type LaidRow = { label: string; y: number; depth: number; pipes: PlacedPipe[] };

export type ChestPlan = {
  layout: "chromatic" | "c-c-sharp";
  lengthMm: number;
  depthMm: number;
  /** Where the C half-chest ends and the C♯ half begins (C/C♯ layout only). */
  splitMm: number | null;
  passageMm: number;
  rows: LaidRow[];
  offset: { lengthMm: number; depthMm: number; rows: LaidRow[] } | null;
};

type Piece = { key: number; keyName: string; footprint: number; diameter: number; wood: boolean; prepared: boolean; offset: boolean; channel: number };

/** Lays out the chest of division `divisionId`; null when it has no pipes on a chest. */
export function layChest(scheme: Scheme, divisionId: string, rates: DrawingRules): ChestPlan | null {
  const plan = planScheme(scheme);
  if (plan.messages.length) return null;
  const dIndex = plan.divisions.findIndex((d) => d.division.id === divisionId);
  if (dIndex < 0) return null;
  const division = plan.divisions[dIndex].division;
  const n = rates.chest;

  const details = new Map<number, Map<string, PipeDetail>>();
  const detailsOf = (stopIndex: number) => {
    let m = details.get(stopIndex);
    if (!m) {
      m = new Map();
      for (const p of pipesOfStop(scheme, plan.stops[stopIndex].stop.id, rates, plan)) m.set(`${p.rank - 1}:${p.keyMidi}`, p);
      details.set(stopIndex, m);
    }
    return m;
  };

  const byRow = new Map<number, Piece[]>();
  for (const seg of plan.segments) {
    const row = plan.rows[seg.row];
    if (row.division !== dIndex) continue;
    const rank = row.stop === seg.stop ? row.rank : 0;
    const m = detailsOf(seg.stop);
    for (let i = 0; i < seg.count; i++) {
      const key = seg.fromKey + i;
      const d = m.get(`${rank}:${key}`);
      if (!d) continue;
      const wood = d.sideMm !== null;
      const footprint = wood ? d.sideMm! + 2 * rates.boardThicknessMm[d.sizeClass] : d.diameterMm;
      const list = byRow.get(seg.row) ?? [];
      list.push({ key, keyName: d.key, footprint, diameter: d.diameterMm, wood, prepared: !seg.made, offset: i < seg.offsetCount, channel: key + seg.channelOffset });
      byRow.set(seg.row, list);
    }
  }
  if (byRow.size === 0) return null;

  const labelOf = (rowIndex: number) => {
    const r = plan.rows[rowIndex];
    const sp = plan.stops[r.stop];
    const ranks = sp.ranks > 1 ? ` rank ${r.rank + 1}` : "";
    return `${sp.stop.name} ${sp.footageText}′${ranks}`;
  };

  const width = (p: Piece) => p.footprint + clearanceMm(p.diameter, n);
  const rowIds = [...byRow.keys()].sort((a, b) => a - b);
  const end = n.endBoardMm;

  // First pass: lengths of the halves, so the C♯ half can be drawn from its outer end inward.
  let longestC = 0;
  let longestCs = 0;
  let longestWhole = 0;
  for (const id of rowIds) {
    const main = byRow.get(id)!.filter((p) => !p.offset);
    const c = main.filter((p) => (p.channel & 1) === 0).reduce((s, p) => s + width(p), 0);
    const cs = main.filter((p) => (p.channel & 1) === 1).reduce((s, p) => s + width(p), 0);
    longestC = Math.max(longestC, c);
    longestCs = Math.max(longestCs, cs);
    longestWhole = Math.max(longestWhole, c + cs);
  }
  const chromatic = division.chestLayout === "chromatic";
  const lengthMm = chromatic ? longestWhole + 2 * end : longestC + longestCs + 4 * end;
  const splitMm = chromatic ? null : longestC + 2 * end;

  const rows: LaidRow[] = [];
  const offsetRows: LaidRow[] = [];
  let y = 0;
  let oy = 0;
  let offsetLength = 0;
  for (const id of rowIds) {
    const pieces = byRow.get(id)!.sort((a, b) => a.key - b.key);
    const main = pieces.filter((p) => !p.offset);
    const off = pieces.filter((p) => p.offset);
    if (main.length) {
      const largest = main.reduce((a, p) => (p.footprint > a.footprint ? p : a), main[0]);
      const depth = largest.footprint + clearanceMm(largest.diameter, n);
      const cy = y + depth / 2;
      const placed: PlacedPipe[] = [];
      const place = (p: Piece, x: number) => placed.push({ x, y: cy, size: p.footprint, wood: p.wood, prepared: p.prepared, key: p.keyName });
      if (chromatic) {
        let x = end;
        for (const p of main) { place(p, x + width(p) / 2); x += width(p); }
      } else {
        // C side: bass at the left end, rising toward the middle; C♯ side mirrored from the right end.
        let x = end;
        for (const p of main.filter((q) => (q.channel & 1) === 0)) { place(p, x + width(p) / 2); x += width(p); }
        let xr = lengthMm - end;
        for (const p of main.filter((q) => (q.channel & 1) === 1)) { place(p, xr - width(p) / 2); xr -= width(p); }
      }
      rows.push({ label: labelOf(id), y, depth, pipes: placed });
      y += depth;
    }
    if (off.length) {
      const largest = off.reduce((a, p) => (p.footprint > a.footprint ? p : a), off[0]);
      const depth = largest.footprint + clearanceMm(largest.diameter, n);
      let x = end;
      const placed: PlacedPipe[] = [];
      for (const p of off) {
        placed.push({ x: x + width(p) / 2, y: oy + depth / 2, size: p.footprint, wood: p.wood, prepared: p.prepared, key: p.keyName });
        x += width(p);
      }
      offsetLength = Math.max(offsetLength, x + end);
      offsetRows.push({ label: labelOf(id), y: oy, depth, pipes: placed });
      oy += depth;
    }
  }
  const passageMm = division.passageBoard ? n.passageBoardMm : 0;
  return {
    layout: division.chestLayout,
    lengthMm,
    depthMm: y + passageMm,
    splitMm,
    passageMm,
    rows,
    offset: offsetRows.length ? { lengthMm: offsetLength, depthMm: oy, rows: offsetRows } : null,
  };
}
