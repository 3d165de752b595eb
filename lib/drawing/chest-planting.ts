/**
 * Chest planting: where every pipe of a division stands, in plan and in elevation, what stands on
 * each chest (weight) and what wind its ranks take. The positions come from the estimator's one
 * chest rule (lib/estimate/chest.ts: rowOf, chestSize, placeRow — sides, clearances, end boards,
 * passage board, where the basses stand) applied to the estimator's per-pipe geometry (pipesOfStop),
 * so the drawing and the figures cannot disagree; chest-planting.test.ts holds them equal on the
 * example schemes. Pure: no React, no I/O.
 */
import {
  chestSize, formatFootage, parseFootage, pipeRowWidthMm, pipesOfStop, placeRow, planScheme, rowDepthMm, rowOf,
  type ChestSize, type GeometryRules, type PipeDetail, type PipeState, type Rates, type RowPipe, type Scheme, type SchemePlan,
} from "@/lib/estimate";
import { romanNumeral } from "@/components/spec/format";

/**
 * What the planting needs of the firm's rates beyond the pipe geometry (which carries the chest rule
 * and the full-organ chord): timber densities, for weights. No price, norm or crew.
 */
export type PlantingRules = GeometryRules & { readonly woodDensityKgM3: Rates["woodDensityKgM3"] };

export interface PlantedPipe {
  /** Centre of the pipe along the chest and across it, mm from the chest's left end and back edge. */
  readonly x: number;
  readonly y: number;
  /** Footprint across the row (diameter, or outside width of a wooden pipe), mm. */
  readonly size: number;
  /** What the pipe takes along its row by the chest rule: footprint plus clearance, mm. */
  readonly rowWidthMm: number;
  readonly wood: boolean;
  readonly state: PipeState;
  readonly key: string;
  /** Standing height: speaking length (a reed's resonator) plus the foot the estimator books for a metal pipe, mm. */
  readonly heightMm: number;
  /** Finished metal, or timber at the firm's density, kg; 0 for a prepared position. */
  readonly weightKg: number;
}

export interface PlantedRow {
  readonly label: string;
  readonly stopId: string;
  /** Back edge of the row and its depth across the chest, mm. */
  readonly y: number;
  readonly depth: number;
  readonly pipes: readonly PlantedPipe[];
  /** The rank's wind for the full-organ chord, m³/min: its mean wind per key × the keys held. */
  readonly windM3PerMin: number;
}

export interface ChestLoad {
  /** Pipes made new, and existing pipes kept, restored or reused, kg. */
  readonly newPipesKg: number;
  readonly existingPipesKg: number;
  /** The chest itself, by the firm's weight per m² of chest. */
  readonly chestKg: number;
  readonly totalKg: number;
}

export interface PlantedChest {
  readonly layout: ChestSize["layout"];
  readonly lengthMm: number;
  readonly depthMm: number;
  /** Where the C half-chest ends and the C♯ half begins (C/C♯ layout only). */
  readonly splitMm: number | null;
  readonly passageMm: number;
  readonly rows: readonly PlantedRow[];
  readonly load: ChestLoad;
}

/** Pipes taller than the case allows, one entry per rank. */
export interface TooTall {
  readonly label: string;
  readonly keys: readonly string[];
  readonly tallestMm: number;
  /** How far the tallest goes above the height available, mm. */
  readonly overMm: number;
}

export interface Elevation {
  /** Clear height in the case above the chest, mm; null when not yet known. */
  readonly availableMm: number | null;
  readonly tallestMm: number;
  readonly tooTall: readonly TooTall[];
}

export interface DivisionPlanting {
  readonly divisionId: string;
  readonly divisionName: string;
  readonly bassesAt: "ends" | "centre";
  readonly main: PlantedChest;
  readonly offset: PlantedChest | null;
  readonly elevation: Elevation;
  /** Σ of its ranks' wind, m³/min (stops of its own; extensions and borrowings are in the estimator's division figure). */
  readonly windM3PerMin: number;
}

type Piece = RowPipe & { key: number; keyName: string; wood: boolean; state: PipeState; offset: boolean; heightMm: number; weightKg: number; windLPerS: number; counted: boolean };

const IN_ORGAN: ReadonlySet<PipeState> = new Set(["new", "reused", "restored"]);

/** A pipe's standing height: the estimator's tallest-pipe rule (speaking length, plus the foot of a metal pipe by size class). */
export function standingHeightMm(p: Pick<PipeDetail, "speakingLengthMm" | "sideMm" | "sizeClass">, rules: GeometryRules): number {
  return p.sideMm !== null ? p.speakingLengthMm : p.speakingLengthMm + rules.pipeMetal.footLengthMm[p.sizeClass];
}

function weightOf(p: PipeDetail, rules: PlantingRules): number {
  if (p.state === "prepared") return 0;
  if (p.sideMm === null) return p.metalKg;
  return p.woodM3 * (rules.woodDensityKgM3[p.material as keyof Rates["woodDensityKgM3"]] ?? 0);
}

/**
 * Plants every division of a scheme (one plan, one `pipesOfStop` per stop). A division with no pipe
 * on a chest is left out. The scheme must plan cleanly (the editor only draws a sound scheme).
 */
export function plantScheme(scheme: Scheme, rules: PlantingRules, plan: SchemePlan = planScheme(scheme)): DivisionPlanting[] {
  if (plan.messages.length) return [];
  const n = rules.chest;

  // Every pipe of the plan's chest rows, by row, in key order.
  // A stop's pipes by rank and key (rank · 256 + MIDI key: keys stay below 128).
  const details = new Map<number, Map<number, PipeDetail>>();
  const detailsOf = (stopIndex: number) => {
    let m = details.get(stopIndex);
    if (!m) {
      m = new Map();
      for (const p of pipesOfStop(scheme, plan.stops[stopIndex].stop.id, rules, plan)) if (p.state !== "shared") m.set((p.rank - 1) * 256 + p.keyMidi, p);
      details.set(stopIndex, m);
    }
    return m;
  };
  const byRow = new Map<number, Piece[]>();
  for (const seg of plan.segments) {
    const row = plan.rows[seg.row];
    const rank = row.stop === seg.stop ? row.rank : 0;
    const m = detailsOf(seg.stop);
    let list = byRow.get(seg.row);
    if (!list) byRow.set(seg.row, (list = []));
    for (let i = 0; i < seg.count; i++) {
      const key = seg.fromKey + i;
      const d = m.get(rank * 256 + key);
      if (!d) continue;
      list.push({
        key, keyName: d.key, footprintMm: d.footprintMm, diameterMm: d.diameterMm, wood: d.sideMm !== null, state: d.state,
        offset: i < seg.offsetCount, channel: key + seg.channelOffset, heightMm: standingHeightMm(d, rules), weightKg: weightOf(d, rules),
        // The estimator's wind of a rank is that of the pipes its own stop owns (extensions use their rank's mean per key).
        windLPerS: d.state === "prepared" ? 0 : d.windLPerS, counted: seg.stop === row.stop,
      });
    }
  }

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

  const out: DivisionPlanting[] = [];
  plan.divisions.forEach((dp, dIndex) => {
    const division = dp.division;
    const chordKeys = division.keyboard === "pedal" ? rules.wind.chordKeysPedal : rules.wind.chordKeys;
    const rowIds = [...byRow.keys()].filter((id) => plan.rows[id].division === dIndex && byRow.get(id)!.length).sort((a, b) => a - b);
    if (!rowIds.length) return;
    const pieces = rowIds.map((id) => ({ id, all: byRow.get(id)!.sort((a, b) => a.key - b.key) }));
    const mainRows = pieces.map((p) => ({ ...p, pipes: p.all.filter((q) => !q.offset) })).filter((p) => p.pipes.length);
    const offRows = pieces.map((p) => ({ ...p, pipes: p.all.filter((q) => q.offset) })).filter((p) => p.pipes.length);

    // Wind per rank: Σ of its own pipes' wind ÷ its stop's notes = mean per key, × the keys held (wind.ts).
    const windOf = new Map<number, number>();
    for (const p of pieces) {
      const notes = plan.stops[plan.rows[p.id].stop].notes;
      let q = 0;
      for (const x of p.all) if (x.counted) q += x.windLPerS;
      windOf.set(p.id, notes > 0 ? ((q / notes) * chordKeys * 60) / 1000 : 0);
    }

    const lay = (rows: typeof mainRows, s: ChestSize, passageMm: number): PlantedChest => {
      let y = 0;
      let newKg = 0;
      let oldKg = 0;
      const laid = rows.map((r): PlantedRow => {
        const row = rowOf(r.pipes, s.layout, n);
        const depth = rowDepthMm(row.largestFootprintMm, row.largestDiameterMm, n);
        const xs = placeRow(r.pipes, s, n);
        const pipes = r.pipes.map((p, i): PlantedPipe => {
          if (p.state === "new") newKg += p.weightKg;
          else if (IN_ORGAN.has(p.state)) oldKg += p.weightKg;
          return { x: xs[i], y: y + depth / 2, size: p.footprintMm, rowWidthMm: pipeRowWidthMm(p.footprintMm, p.diameterMm, n), wood: p.wood, state: p.state, key: p.keyName, heightMm: p.heightMm, weightKg: p.weightKg };
        });
        const planted: PlantedRow = { label: labelOf(r.id), stopId: plan.stops[plan.rows[r.id].stop].stop.id, y, depth, pipes, windM3PerMin: 0 };
        y += depth;
        return planted;
      });
      const chestKg = ((s.lengthMm * s.depthMm) / 1e6) * n.kgPerM2;
      return {
        layout: s.layout, lengthMm: s.lengthMm, depthMm: s.depthMm, splitMm: s.halvesMm ? s.halvesMm[0] : null, passageMm, rows: laid,
        load: { newPipesKg: newKg, existingPipesKg: oldKg, chestKg, totalKg: newKg + oldKg + chestKg },
      };
    };

    const size = chestSize(mainRows.map((r) => rowOf(r.pipes, division.chestLayout, n)), division.chestLayout, division.passageBoard, n);
    const offSize = offRows.length ? chestSize(offRows.map((r) => rowOf(r.pipes, "chromatic", n)), "chromatic", false, n) : null;
    const main = lay(mainRows, size, division.passageBoard && mainRows.length ? n.passageBoardMm : 0);
    // Each rank's wind is told once, on the main chest's row (or the offset row when it stands wholly there).
    const told = new Set<number>();
    const withWind = (c: PlantedChest, rows: typeof mainRows): PlantedChest => ({
      ...c,
      rows: c.rows.map((r, i) => {
        const id = rows[i].id;
        if (told.has(id)) return r;
        told.add(id);
        return { ...r, windM3PerMin: windOf.get(id) ?? 0 };
      }),
    });
    const mainWithWind = withWind(main, mainRows);
    const offset = offSize ? withWind(lay(offRows, offSize, 0), offRows) : null;

    const availableMm = division.space?.heightMm ?? null;
    let tallestMm = 0;
    const tooTall: TooTall[] = [];
    for (const p of pieces) {
      let top = 0;
      const keys: string[] = [];
      for (const x of p.all) {
        if (x.heightMm > top) top = x.heightMm;
        if (availableMm !== null && x.heightMm > availableMm) keys.push(x.keyName);
      }
      if (top > tallestMm) tallestMm = top;
      if (keys.length) tooTall.push({ label: labelOf(p.id), keys, tallestMm: top, overMm: top - availableMm! });
    }

    out.push({
      divisionId: division.id, divisionName: division.name, bassesAt: n.bassesAt,
      main: mainWithWind, offset, elevation: { availableMm, tallestMm, tooTall },
      windM3PerMin: [...windOf.values()].reduce((s, x) => s + x, 0),
    });
  });
  return out;
}

/** Plants one division; null when it has no pipe on a chest. */
export function plantDivision(scheme: Scheme, divisionId: string, rules: PlantingRules, plan?: SchemePlan): DivisionPlanting | null {
  return plantScheme(scheme, rules, plan).find((d) => d.divisionId === divisionId) ?? null;
}

/** "C–F♯ (7 pipes)" style words for the keys of the pipes that are too tall: first and last, and how many. */
export function keysInWords(keys: readonly string[]): string {
  if (keys.length === 1) return `${keys[0]} (1 pipe)`;
  return `${keys[0]} to ${keys[keys.length - 1]} (${keys.length} pipes)`;
}
