/**
 * A stop's pipe table: every pipe, rank by rank, as `pipesOfStop` computes it, with the columns a
 * tonal director and the pipe shop read (cut-up and foot length from the same firm's norms the
 * estimator uses), its totals, and the table as CSV for a spreadsheet. Pure: no I/O.
 */
import Papa from "papaparse";
import { pipesOfStop, type GeometryRules, type PipeDetail, type PipeState } from "@/lib/estimate/geometry";
import { planScheme, type SchemePlan } from "@/lib/estimate/pipes";
import type { Scheme } from "@/lib/estimate/scheme";
import { sizeClassLabels, type SizeClass } from "@/lib/estimate/departments";
import { lengthDecimals, lengthIn, lengthUnitLabel, weightIn, weightUnitLabel, type DrawingUnits } from "./units";

/** A pipe as the table shows it: the estimator's pitch fields as they are, its sizes split by kind of pipe. */
export interface PipeRow extends Pick<PipeDetail, "rank" | "key" | "keyMidi" | "sounds" | "footage" | "frequencyHz"> {
  /** Flue pipes: the speaking length; null for reed pipes. */
  readonly speakingLengthMm: number | null;
  /** Reed pipes: the resonator's length; null for flues. */
  readonly resonatorLengthMm: number | null;
  /** Round pipes: the diameter; null for wooden pipes, which give their inside sides. */
  readonly diameterMm: number | null;
  readonly insideSideMm: number | null;
  readonly mouthWidthMm: number | null;
  /** Mouth height: the cut-up fraction of the mouth width (the firm's norm by family, or the stop's own). */
  readonly cutUpMm: number | null;
  readonly footLengthMm: number | null;
  /** Sheet (metal) or board (wood) thickness. */
  readonly thicknessMm: number | null;
  readonly wood: boolean;
  readonly material: PipeDetail["material"];
  readonly metalKg: number;
  readonly woodM3: number;
  readonly sizeClass: SizeClass;
  readonly state: PipeState;
  readonly onOffsetChest: boolean;
}

/** Pipes standing in the finished organ: the estimator's `pipes.total` and its metal and timber. */
const IN_ORGAN: ReadonlySet<PipeState> = new Set(["new", "reused", "restored"]);

export interface PipeTableTotals {
  /** Rows by state: pipes the stop owns or adds (new, reused, restored, prepared, removed) and those it plays from another rank (shared, borrowed). */
  readonly byState: Readonly<Record<PipeState, number>>;
  /** new + reused + restored, as the estimator counts them. */
  readonly inOrgan: number;
  /** Metal and timber of the pipes in the organ, kg and m³. */
  readonly metalKg: number;
  readonly woodM3: number;
  readonly onOffsetChest: number;
}

export interface PipeTable {
  readonly stopId: string;
  readonly stopName: string;
  readonly divisionName: string;
  readonly rows: readonly PipeRow[];
  readonly totals: PipeTableTotals;
}

export const pipeStateLabels: Readonly<Record<PipeState, string>> = {
  new: "new",
  reused: "reused",
  restored: "restored",
  shared: "shared with its rank",
  borrowed: "borrowed",
  prepared: "prepared for",
  removed: "removed",
};

/**
 * The pipe table of one stop under the firm's geometry rules. Pass the scheme's plan when it is at
 * hand (the editor plans once per edit). Throws the estimator's MSG_NO_SUCH_STOP for an unknown id.
 */
export function pipeTable(scheme: Scheme, stopId: string, rules: GeometryRules, plan: SchemePlan = planScheme(scheme)): PipeTable {
  const pipes = pipesOfStop(scheme, stopId, rules, plan);
  const sp = plan.stops.find((s) => s.stop.id === stopId)!;
  const owner = (sp.rootIndex >= 0 ? plan.stops[sp.rootIndex] : sp).stop;
  const family = owner.family === "reed" ? "principal" : owner.family;
  const cutUp = owner.scale.cutUp ?? rules.cutUpByFamily[family];
  const rows = pipes.map((p) => rowOf(p, cutUp, rules));
  return { stopId, stopName: sp.stop.name, divisionName: plan.divisions[sp.divisionIndex].division.name, rows, totals: totalsOf(rows) };
}

function rowOf(p: PipeDetail, cutUp: number, rules: GeometryRules): PipeRow {
  const reed = p.construction === "reed";
  const wood = p.sideMm !== null;
  return {
    rank: p.rank,
    key: p.key,
    keyMidi: p.keyMidi,
    sounds: p.sounds,
    footage: p.footage,
    frequencyHz: p.frequencyHz,
    speakingLengthMm: reed ? null : p.speakingLengthMm,
    resonatorLengthMm: reed ? p.speakingLengthMm : null,
    diameterMm: wood ? null : p.diameterMm,
    insideSideMm: p.sideMm,
    mouthWidthMm: p.mouthWidthMm,
    cutUpMm: p.mouthWidthMm === null ? null : p.mouthWidthMm * cutUp,
    // The estimator books a foot of sheet on every metal pipe (a reed's boot likewise), by size class.
    footLengthMm: wood ? null : rules.pipeMetal.footLengthMm[p.sizeClass],
    thicknessMm: wood ? p.boardMm : p.sheetMm,
    wood,
    material: p.material,
    metalKg: p.metalKg,
    woodM3: p.woodM3,
    sizeClass: p.sizeClass,
    state: p.state,
    onOffsetChest: p.onOffsetChest,
  };
}

export function totalsOf(rows: readonly PipeRow[]): PipeTableTotals {
  const byState: Record<PipeState, number> = { new: 0, reused: 0, restored: 0, shared: 0, borrowed: 0, prepared: 0, removed: 0 };
  let metalKg = 0;
  let woodM3 = 0;
  let offset = 0;
  for (const r of rows) {
    byState[r.state]++;
    if (r.onOffsetChest) offset++;
    if (!IN_ORGAN.has(r.state)) continue;
    metalKg += r.metalKg;
    woodM3 += r.woodM3;
  }
  return { byState, inOrgan: byState.new + byState.reused + byState.restored, metalKg, woodM3, onOffsetChest: offset };
}

// ── CSV ──────────────────────────────────────────────────────────────────────────────────────

type Column = { readonly header: string; readonly cell: (r: PipeRow) => string | number };

const fixed = (x: number | null, dp: number) => (x === null ? "" : Number(x.toFixed(dp)));

/** The table's columns with their units in the header, so a spreadsheet reads plain numbers. */
export function pipeTableColumns(units: DrawingUnits): readonly Column[] {
  const L = lengthUnitLabel(units);
  const W = weightUnitLabel(units);
  const len = (mm: number | null) => (mm === null ? "" : fixed(lengthIn(units, mm), lengthDecimals(units, mm) + 1));
  const thin = (mm: number | null) => (mm === null ? "" : fixed(lengthIn(units, mm), units === "mm" ? 2 : 3));
  return [
    { header: "Rank", cell: (r) => r.rank },
    { header: "Key", cell: (r) => r.key },
    { header: "Sounds", cell: (r) => r.sounds },
    { header: "Footage (ft)", cell: (r) => r.footage },
    { header: "Frequency (Hz)", cell: (r) => fixed(r.frequencyHz, 2) },
    { header: `Speaking length (${L})`, cell: (r) => len(r.speakingLengthMm) },
    { header: `Resonator length (${L})`, cell: (r) => len(r.resonatorLengthMm) },
    { header: `Diameter (${L})`, cell: (r) => len(r.diameterMm) },
    { header: `Inside side, wood (${L})`, cell: (r) => len(r.insideSideMm) },
    { header: `Mouth width (${L})`, cell: (r) => len(r.mouthWidthMm) },
    { header: `Cut-up (${L})`, cell: (r) => len(r.cutUpMm) },
    { header: `Foot length (${L})`, cell: (r) => len(r.footLengthMm) },
    { header: `Metal or board thickness (${L})`, cell: (r) => thin(r.thicknessMm) },
    { header: `Metal weight (${W})`, cell: (r) => (r.wood ? "" : fixed(weightIn(units, r.metalKg), 3)) },
    { header: "Timber (litres)", cell: (r) => (r.wood ? fixed(r.woodM3 * 1000, 2) : "") },
    { header: "Size class", cell: (r) => sizeClassLabels[r.sizeClass] },
    { header: "State", cell: (r) => pipeStateLabels[r.state] },
    { header: "Chest", cell: (r) => (r.onOffsetChest ? "offset" : "main") },
  ];
}

/**
 * The table as CSV: a byte-order mark so spreadsheets read it as UTF-8 (primes and sharps), CRLF
 * line ends (RFC 4180), one header row, one row per pipe.
 */
export function pipeTableCsv(table: PipeTable, units: DrawingUnits): string {
  const columns = pipeTableColumns(units);
  const data = table.rows.map((r) => columns.map((c) => c.cell(r)));
  return "\uFEFF" + Papa.unparse({ fields: columns.map((c) => c.header), data }, { newline: "\r\n" });
}

/** Several stops' tables in one file, each row led by its division and stop. */
export function pipeTablesCsv(tables: readonly PipeTable[], units: DrawingUnits): string {
  const columns = pipeTableColumns(units);
  const data = tables.flatMap((t) => t.rows.map((r) => [t.divisionName, t.stopName, ...columns.map((c) => c.cell(r))]));
  return "\uFEFF" + Papa.unparse({ fields: ["Division", "Stop", ...columns.map((c) => c.header)], data }, { newline: "\r\n" });
}
