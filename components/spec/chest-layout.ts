/**
 * Where every pipe of a division stands on its chest, for the plan drawing. The rule is the
 * estimator's own (lib/estimate/chest.ts: rowOf, chestSize, placeRow) applied to the estimator's
 * per-pipe geometry (pipesOfStop), so the drawing and the figures cannot disagree; a test holds them
 * equal on the example schemes.
 */
import {
  chestSize, formatFootage, parseFootage, pipesOfStop, placeRow, planScheme, rowDepthMm, rowOf, type ChestSize, type GeometryRules, type PipeDetail, type RowPipe, type Scheme,
} from "@/lib/estimate";
import { romanNumeral } from "./format";

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

type Piece = RowPipe & { key: number; keyName: string; wood: boolean; prepared: boolean; offset: boolean };

/** Lays out the chest of division `divisionId`; null when it has no pipes on a chest. */
export function layChest(scheme: Scheme, divisionId: string, rates: GeometryRules): ChestPlan | null {
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
      const list = byRow.get(seg.row) ?? [];
      list.push({
        key, keyName: d.key, footprintMm: d.footprintMm, diameterMm: d.diameterMm, wood: d.sideMm !== null, prepared: d.state === "prepared",
        offset: i < seg.offsetCount, channel: key + seg.channelOffset,
      });
      byRow.set(seg.row, list);
    }
  }
  if (byRow.size === 0) return null;

  const labelOf = (rowIndex: number) => {
    const r = plan.rows[rowIndex];
    const sp = plan.stops[r.stop];
    if (sp.ranks <= 1) return `${sp.stop.name} ${sp.footageText}′`;
    // A mixture's ranks each have their own pitch at the bottom (its first break), not the stop's nominal one.
    const bottom = sp.stop.breaks?.[0]?.footages[r.rank];
    const f = bottom === undefined || bottom === null ? null : parseFootage(bottom);
    if (sp.stop.family === "mixture") return `${sp.stop.name} ${romanNumeral(sp.ranks)}, rank ${r.rank + 1}${f ? ` (${formatFootage(f)}′ at the bottom)` : ""}`;
    return `${sp.stop.name} ${sp.footageText}′ rank ${r.rank + 1}`;
  };

  const rowIds = [...byRow.keys()].sort((a, b) => a - b);
  const pieces = rowIds.map((id) => ({ id, all: byRow.get(id)!.sort((a, b) => a.key - b.key) }));
  const mainRows = pieces.map((p) => ({ ...p, pipes: p.all.filter((q) => !q.offset) })).filter((p) => p.pipes.length);
  const offRows = pieces.map((p) => ({ ...p, pipes: p.all.filter((q) => q.offset) })).filter((p) => p.pipes.length);
  const size: ChestSize = chestSize(mainRows.map((r) => rowOf(r.pipes, division.chestLayout, n)), division.chestLayout, division.passageBoard, n);
  const offSize = offRows.length ? chestSize(offRows.map((r) => rowOf(r.pipes, "chromatic", n)), "chromatic", false, n) : null;

  const lay = (rows: typeof mainRows, s: ChestSize): LaidRow[] => {
    let y = 0;
    return rows.map((r) => {
      const row = rowOf(r.pipes, s.layout, n);
      const depth = rowDepthMm(row.largestFootprintMm, row.largestDiameterMm, n);
      const xs = placeRow(r.pipes, s, n);
      const laid: LaidRow = {
        label: labelOf(r.id), y, depth,
        pipes: r.pipes.map((p, i) => ({ x: xs[i], y: y + depth / 2, size: p.footprintMm, wood: p.wood, prepared: p.prepared, key: p.keyName })),
      };
      y += depth;
      return laid;
    });
  };

  const passageMm = division.passageBoard ? n.passageBoardMm : 0;
  return {
    layout: division.chestLayout,
    lengthMm: size.lengthMm,
    depthMm: size.depthMm,
    splitMm: size.halvesMm ? size.halvesMm[0] : null,
    passageMm,
    rows: lay(mainRows, size),
    offset: offSize ? { lengthMm: offSize.lengthMm, depthMm: offSize.depthMm, rows: lay(offRows, offSize) } : null,
  };
}
