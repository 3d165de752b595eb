/**
 * Pipe counts and the layout of ranks, from the scheme alone. Pipes = ranks × notes of the rank's
 * compass (the stop's own, else its division's), mixture ranks one by one; breaks change pitches,
 * not numbers. An extension adds only the notes its own compass needs beyond the rank it draws on
 * (a 32-note pedal 16′ rank extended to 8′ adds 12 — common practice); borrowed stops add none;
 * prepared stops take chest space but no pipes yet; removed stops leave the organ.
 * New, reused (retained, revoiced, relocated) and restored pipes are kept apart.
 *
 * The plan it returns (segments of consecutive pipes, chest rows) is what the estimator's per-pipe
 * loop runs over; it also carries every message about an inconsistent scheme.
 */
import type { Division, Scheme, Stop } from "./scheme";
import { compassNoteCount, noteToMidi, parseCompass } from "./notes";
import { formatFootage, harmonicOf8ft, MSG_NOT_FOOTAGE, parseFootage, semitonesAbove8ft, type Fraction } from "./pitch";
import type { PipeWork } from "./labour";

export type StopKind = "own" | "extension" | "borrowed" | "prepared" | "removed";
export type PipeStatus = "new" | "reused" | "restored";

export interface PipeCounts {
  readonly new: number;
  readonly reused: number;
  readonly restored: number;
  /** new + reused + restored: pipes standing in the finished organ. */
  readonly total: number;
  /** Pipes of prepared-for stops (space and wiring now, pipes later); not in total. */
  readonly prepared: number;
  /** Existing pipes of removed stops; not in total. */
  readonly removed: number;
}

export const NO_PIPES: PipeCounts = counts(0, 0, 0, 0, 0);

/** Pipe counts from their parts; total is new + reused + restored. */
export function counts(fresh: number, reused: number, restored: number, prepared: number, removed: number): PipeCounts {
  return { new: fresh, reused, restored, total: fresh + reused + restored, prepared, removed };
}

export function addCounts(a: PipeCounts, b: PipeCounts): PipeCounts {
  return counts(a.new + b.new, a.reused + b.reused, a.restored + b.restored, a.prepared + b.prepared, a.removed + b.removed);
}

/** What happens to a stop's own pipes, by treatment. */
export function kindOf(treatment: Stop["treatment"]): StopKind {
  switch (treatment) {
    case "extension":
    case "borrowed":
    case "prepared":
    case "removed":
      return treatment;
    default:
      return "own";
  }
}

export function statusOf(work: PipeWork): PipeStatus {
  return work === "new" ? "new" : work === "restored" ? "restored" : "reused";
}

/** A run of consecutive pipes of one rank with one footage: what the per-pipe loop iterates. */
export interface Segment {
  /** Global index of the stop the pipes are counted for. */
  readonly stop: number;
  /** Global index of the stop whose rank they belong to (construction, material, scale). */
  readonly rank: number;
  /** Chest row they stand in. */
  readonly row: number;
  readonly fromKey: number;
  readonly count: number;
  /** Semitones above unison pitch (fractional for pure mutations). */
  readonly shift: number;
  /** The footage these pipes speak at. */
  readonly footage: Fraction;
  /** key + channelOffset = the chest channel (C or C♯ side by its parity). */
  readonly channelOffset: number;
  /** The first N pipes of the segment stand on the offset chest. */
  readonly offsetCount: number;
  /** False for prepared stops: space is taken, no pipes are made. */
  readonly made: boolean;
}

export interface ChestRowPlan {
  /** Division whose chest the row stands on. */
  readonly division: number;
  readonly stop: number;
  readonly rank: number;
}

export interface StopPlan {
  readonly index: number;
  readonly divisionIndex: number;
  readonly stop: Stop;
  readonly kind: StopKind;
  /** Work on the stop's own pipes; extensions' added pipes are new. */
  readonly work: PipeWork | null;
  readonly lowKey: number;
  readonly highKey: number;
  readonly notes: number;
  readonly ranks: number;
  readonly footage: Fraction;
  readonly footageText: string;
  readonly harmonic: Fraction;
  /** Semitones above unison, tempered or pure by the scheme's tuning. */
  readonly shift: number;
  /** Stop whose rank supplies the pipes (itself for own stops; −1 when unresolved). */
  readonly rootIndex: number;
  readonly sourceDivisionIndex: number;
  readonly pipes: PipeCounts;
}

export interface DivisionPlan {
  readonly index: number;
  readonly division: Division;
  readonly lowKey: number;
  readonly highKey: number;
  readonly notes: number;
  readonly stops: readonly number[];
}

export interface SchemePlan {
  readonly divisions: readonly DivisionPlan[];
  readonly stops: readonly StopPlan[];
  readonly segments: readonly Segment[];
  readonly rows: readonly ChestRowPlan[];
  /** Everything inconsistent in the scheme, naming division and stop; empty when the plan is sound. */
  readonly messages: readonly string[];
  /** The same messages with the path of the field each is about, for forms that show them in place. */
  readonly issues: readonly PlanIssue[];
}

export interface PlanIssue {
  readonly path: readonly (string | number)[];
  readonly message: string;
}
type Say = (path: readonly (string | number)[], message: string) => void;

/** Message prefixes name the division and stop by their names, as the user wrote them. */
export function where(d: { readonly name: string }, s?: { readonly name: string }): string {
  return s ? `Division "${d.name}", stop "${s.name}"` : `Division "${d.name}"`;
}

const footageText = (f: string | number) => (typeof f === "number" ? String(f) : f);

/** Occupancy of sounding semitones (index = semitones above 8′ C + OCC_BASE) for ranks that carry extensions. */
const OCC_BASE = 96;
const OCC_SIZE = 256;

/** Resolves a scheme into stops, chest rows and segments of pipes, with pipe counts and messages. */
export function planScheme(scheme: Scheme): SchemePlan {
  const issues: PlanIssue[] = [];
  const say: Say = (path, message) => issues.push({ path, message });
  const stopPath = (d: { divisionIndex: number; stop: Stop }, field: string) =>
    ["divisions", d.divisionIndex, "stops", scheme.divisions[d.divisionIndex].stops.indexOf(d.stop), field];
  const tuning = scheme.tuning.mutations;
  const divisions: DivisionPlan[] = [];
  const segments: Segment[] = [];
  const rows: ChestRowPlan[] = [];
  const stopById = new Map<string, number>();
  const divisionIds = new Set<string>();

  type Draft = { -readonly [K in keyof StopPlan]: StopPlan[K] };
  const drafts: Draft[] = [];

  scheme.divisions.forEach((division, di) => {
    if (divisionIds.has(division.id)) say(["divisions", di, "id"], `${where(division)}: the id "${division.id}" is used by another division`);
    divisionIds.add(division.id);
    let c = parseCompass(division.compass);
    if (!c) {
      say(["divisions", di, "compass"], `${where(division)}: compass ${division.compass.low}–${division.compass.high} is not in note names such as C, c', c''''`);
      c = { lowMidi: 36, highMidi: 96 };
    } else if (c.lowMidi > c.highMidi) {
      say(["divisions", di, "compass"], `${where(division)}: compass runs downward (${division.compass.low} to ${division.compass.high}); give the lowest note first`);
    }
    const stopIndexes: number[] = [];
    division.stops.forEach((stop, si) => {
      const index = drafts.length;
      const at = where(division, stop);
      const sp = (field: string) => ["divisions", di, "stops", si, field];
      if (stopById.has(stop.id)) say(sp("id"), `${at}: the id "${stop.id}" is used by another stop`);
      else stopById.set(stop.id, index);
      let lowKey = c.lowMidi;
      let highKey = c.highMidi;
      if (stop.compass) {
        const sc = parseCompass(stop.compass);
        if (!sc) say(sp("compass"), `${at}: compass ${stop.compass.low}–${stop.compass.high} is not in note names`);
        else if (sc.lowMidi > sc.highMidi) say(sp("compass"), `${at}: compass runs downward (${stop.compass.low} to ${stop.compass.high}); give the lowest note first`);
        else if (sc.lowMidi < c.lowMidi || sc.highMidi > c.highMidi)
          say(sp("compass"), `${at}: compass ${stop.compass.low}–${stop.compass.high} goes beyond the division's ${division.compass.low}–${division.compass.high}`);
        else [lowKey, highKey] = [sc.lowMidi, sc.highMidi];
      }
      const footage = parseFootage(stop.footage);
      if (!footage) say(sp("footage"), `${at}: footage "${footageText(stop.footage)}" ${MSG_NOT_FOOTAGE}`);
      const f = footage ?? { num: 8, den: 1 };
      const notes = compassNoteCount(lowKey, highKey);
      if (stop.offsetBassPipes > notes) say(sp("offsetBassPipes"), `${at}: ${stop.offsetBassPipes} offset bass pipes, but the stop has only ${notes} notes`);
      const kind = kindOf(stop.treatment);
      drafts.push({
        index, divisionIndex: di, stop, kind,
        work: kind === "own" ? (stop.treatment as PipeWork) : null,
        lowKey, highKey, notes, ranks: stop.ranks, footage: f, footageText: formatFootage(f), harmonic: harmonicOf8ft(f),
        shift: semitonesAbove8ft(f, tuning), rootIndex: kind === "own" || kind === "prepared" ? index : -1,
        sourceDivisionIndex: di, pipes: NO_PIPES,
      });
      stopIndexes.push(index);
    });
    divisions.push({ index: di, division, lowKey: c.lowMidi, highKey: c.highMidi, notes: compassNoteCount(c.lowMidi, c.highMidi), stops: stopIndexes });
  });

  // Sources of extensions and borrowings, followed to the stop that owns the rank.
  for (const d of drafts) {
    if (d.kind !== "extension" && d.kind !== "borrowed") continue;
    const at = where(scheme.divisions[d.divisionIndex], d.stop);
    const label = d.kind === "extension" ? "extension source" : "borrowed source";
    if (!d.stop.source) {
      say(stopPath(d, "source"), `${at}: an ${d.kind === "extension" ? "extension" : "borrowed stop"} needs a source stop`);
      continue;
    }
    const src = stopById.get(d.stop.source);
    if (src === undefined) {
      say(stopPath(d, "source"), `${at}: ${label} "${d.stop.source}" does not exist`);
      continue;
    }
    if (src === d.index) {
      say(stopPath(d, "source"), `${at}: a stop cannot draw on itself`);
      continue;
    }
    let root = src;
    const seen = new Set<number>([d.index]);
    let broken = false;
    while (drafts[root].kind === "extension" || drafts[root].kind === "borrowed") {
      if (seen.has(root)) {
        say(stopPath(d, "source"), `${at}: ${label} "${d.stop.source}" leads round in a circle`);
        broken = true;
        break;
      }
      seen.add(root);
      const next = drafts[root].stop.source === undefined ? undefined : stopById.get(drafts[root].stop.source!);
      if (next === undefined) {
        broken = true; // reported on that stop
        break;
      }
      root = next;
    }
    if (broken) continue;
    if (drafts[root].kind === "removed") {
      say(stopPath(d, "source"), `${at}: ${label} "${d.stop.source}" is removed`);
      continue;
    }
    if (d.kind === "extension" && drafts[root].ranks > 1) {
      say(stopPath(d, "source"), `${at}: ${label} "${d.stop.source}" has ${drafts[root].ranks} ranks; an extension draws on a single rank`);
      continue;
    }
    d.rootIndex = root;
    d.sourceDivisionIndex = drafts[src].divisionIndex;
  }

  // Own and prepared ranks: one chest row per rank, one segment per break range.
  for (const d of drafts) {
    const division = scheme.divisions[d.divisionIndex];
    const at = where(division, d.stop);
    if (d.kind === "removed") {
      d.pipes = counts(0, 0, 0, 0, d.ranks * d.notes);
      continue;
    }
    if (d.kind !== "own" && d.kind !== "prepared") continue;
    const rankFootages = breakPlan(d, at, tuning, (field, message) => say(stopPath(d, field), message));
    for (let r = 0; r < d.ranks; r++) {
      const row = rows.length;
      rows.push({ division: d.divisionIndex, stop: d.index, rank: r });
      const runs = rankFootages[r];
      for (let k = 0; k < runs.length; k++) {
        const from = runs[k].fromKey;
        const to = k + 1 < runs.length ? runs[k + 1].fromKey - 1 : d.highKey;
        const count = to - from + 1;
        if (count <= 0) continue;
        segments.push({
          stop: d.index, rank: d.index, row, fromKey: from, count, shift: runs[k].shift, footage: runs[k].footage, channelOffset: 0,
          offsetCount: Math.max(0, Math.min(count, d.lowKey + d.stop.offsetBassPipes - from)), made: d.kind === "own",
        });
      }
    }
    const n = d.ranks * d.notes;
    if (d.kind === "prepared") d.pipes = counts(0, 0, 0, n, 0);
    else {
      const s = statusOf(d.work!);
      d.pipes = counts(s === "new" ? n : 0, s === "reused" ? n : 0, s === "restored" ? n : 0, 0, 0);
    }
  }

  // Extensions, in scheme order: each adds the notes of its compass its rank does not yet sound.
  const occupancy = new Map<number, Uint8Array>();
  const rowOfRank = new Map<number, number>();
  rows.forEach((r, i) => r.rank === 0 && rowOfRank.set(r.stop, i));
  for (const d of drafts) {
    if (d.kind !== "extension" || d.rootIndex < 0) continue;
    const root = drafts[d.rootIndex];
    const rootShiftT = semitonesAbove8ft(root.footage, "tempered");
    const extShiftT = semitonesAbove8ft(d.footage, "tempered");
    let occ = occupancy.get(root.index);
    if (!occ) {
      occ = new Uint8Array(OCC_SIZE);
      for (let k = root.lowKey; k <= root.highKey; k++) occ[k - 36 + rootShiftT + OCC_BASE] = 1;
      occupancy.set(root.index, occ);
    }
    const made = root.kind === "own";
    const row = rowOfRank.get(root.index)!;
    let added = 0;
    let offsetLeft = d.stop.offsetBassPipes;
    let runFrom = -1;
    for (let k = d.lowKey; k <= d.highKey + 1; k++) {
      const i = k - 36 + extShiftT + OCC_BASE;
      const free = k <= d.highKey && i >= 0 && i < OCC_SIZE && occ[i] === 0;
      if (free) {
        occ[i] = 1;
        added++;
        if (runFrom < 0) runFrom = k;
      } else if (runFrom >= 0) {
        // A run of added notes ends: one segment; its lowest pipes take what is left of the offset basses.
        const count = k - runFrom;
        const offsetCount = Math.min(offsetLeft, count);
        offsetLeft -= offsetCount;
        segments.push({
          stop: d.index, rank: root.index, row, fromKey: runFrom, count, shift: d.shift, footage: d.footage,
          channelOffset: extShiftT - rootShiftT, offsetCount, made,
        });
        runFrom = -1;
      }
    }
    d.pipes = made ? counts(added, 0, 0, 0, 0) : counts(0, 0, 0, added, 0);
  }

  checkAccessories(scheme, divisionIds, say);
  return { divisions, stops: drafts, segments, rows, messages: issues.map((i) => i.message), issues };
}

/** Per rank, the runs of keys with one footage: from the breaks for mixtures, else the stop's footage. */
function breakPlan(
  d: StopPlan, at: string, tuning: Scheme["tuning"]["mutations"], say: (field: string, message: string) => void,
): { fromKey: number; shift: number; footage: Fraction }[][] {
  const plain = () => Array.from({ length: d.ranks }, () => [{ fromKey: d.lowKey, shift: d.shift, footage: d.footage }]);
  const breaks = d.stop.breaks;
  if (!breaks || breaks.length === 0) {
    if (d.ranks > 1 && (d.stop.family === "mixture" || d.stop.family === "mutation"))
      say("breaks", `${at}: a ${d.stop.family} of ${d.ranks} ranks needs breaks giving each rank's footage`);
    return plain();
  }
  const out: { fromKey: number; shift: number; footage: Fraction }[][] = Array.from({ length: d.ranks }, () => []);
  let prevKey = -Infinity;
  let ok = true;
  breaks.forEach((b, bi) => {
    const key = noteToMidi(b.from);
    if (key === null) {
      say("breaks", `${at}: break "${b.from}" is not a note name`);
      ok = false;
      return;
    }
    if (b.footages.length !== d.ranks) {
      say("breaks", `${at}: the break at ${b.from} gives ${b.footages.length} footages for ${d.ranks} ranks`);
      ok = false;
    }
    if (key <= prevKey) {
      say("breaks", `${at}: breaks must go upward; ${b.from} comes after a higher or equal note`);
      ok = false;
    }
    if (bi > 0 && (key < d.lowKey || key > d.highKey)) {
      say("breaks", `${at}: break at ${b.from} lies outside the stop's compass`);
      ok = false;
    }
    prevKey = key;
    const fromKey = bi === 0 ? d.lowKey : key; // the first break range starts at the rank's lowest note
    for (let r = 0; r < Math.min(d.ranks, b.footages.length); r++) {
      const f = parseFootage(b.footages[r]);
      if (!f) {
        say("breaks", `${at}: break at ${b.from}, rank ${r + 1}: footage "${footageText(b.footages[r])}" ${MSG_NOT_FOOTAGE}`);
        ok = false;
        continue;
      }
      out[r].push({ fromKey, shift: semitonesAbove8ft(f, tuning), footage: f });
    }
  });
  return ok ? out : plain();
}

function checkAccessories(scheme: Scheme, divisionIds: ReadonlySet<string>, say: Say): void {
  scheme.accessories.couplers.forEach((c, ci) => {
    for (const end of ["from", "to"] as const) if (!divisionIds.has(c[end])) say(["accessories", "couplers", ci, end], `Coupler "${c.id}": division "${c[end]}" does not exist`);
    if (c.from === c.to && c.octave === 0) say(["accessories", "couplers", ci, "to"], `Coupler "${c.id}": a unison coupler from a division to itself does nothing`);
  });
  scheme.accessories.tremulants.forEach((t, ti) => {
    if (!divisionIds.has(t.division)) say(["accessories", "tremulants", ti, "division"], `Tremulant "${t.id}": division "${t.division}" does not exist`);
  });
  const p = scheme.programme;
  if (p?.target && p.target < p.start) say(["programme", "target"], `Programme: the target date ${p.target} is before the start ${p.start}`);
}

/** Pipe counts of every stop, by stop id, without geometry. */
export function countPipes(scheme: Scheme): { byStop: Map<string, PipeCounts>; total: PipeCounts; messages: readonly string[] } {
  const plan = planScheme(scheme);
  const byStop = new Map<string, PipeCounts>();
  let total = NO_PIPES;
  for (const s of plan.stops) {
    byStop.set(s.stop.id, s.pipes);
    total = addCounts(total, s.pipes);
  }
  return { byStop, total, messages: plan.messages };
}
