/**
 * Pipe counts and the layout of ranks, from the scheme alone: the first stage of an estimate.
 * Pipes = notes of the rank's compass (the stop's own, else its division's) for every rank, mixture
 * ranks one by one, progressive ranks only where they sound; breaks change pitches, not numbers.
 * An extension adds only the notes its own compass needs beyond the rank it draws on (a 32-note
 * pedal 16′ rank extended to 8′ adds 12 — common practice); borrowed stops add none and must find a
 * pipe for every note they play; prepared stops take chest space but no pipes yet; removed stops
 * leave the organ. New, reused and restored pipes are kept apart.
 *
 * The plan it returns — runs of consecutive pipes built alike (segments), chest rows — is what the
 * per-pipe stage (pipe-aggregates.ts) runs over; it also carries every message about an
 * inconsistent scheme, naming division and stop.
 */
import { UNIT_CHESTS, type Division, type Material, type PipeWork, type Scheme, type Stop } from "./scheme";
import { compassNoteCount, midiToNote, noteToMidi } from "./notes";
import { formatFootage, harmonicOf8ft, MSG_NOT_FOOTAGE, parseFootage, semitonesAbove8ft, type Fraction } from "./pitch";
import { isWood } from "./materials";

export type StopKind = "own" | "extension" | "borrowed" | "prepared" | "removed";

export interface PipeCounts {
  readonly new: number;
  readonly reused: number;
  readonly restored: number;
  /** new + reused + restored: pipes standing in the finished organ. */
  readonly total: number;
  /** Pipes of prepared-for stops (space and wiring now, pipes later); not in total. */
  readonly prepared: number;
  /** Existing pipes that leave the organ (removed stops, surplus of re-scaled ranks); not in total. */
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

export function kindOf(origin: Stop["origin"]): StopKind {
  return origin === "new" || origin === "existing" ? "own" : origin;
}

/** What state a run of pipes is in: made new, existing (with the stop's work), or a prepared position. */
export const NEW = 0;
export const EXISTING = 1;
export const PREPARED = 2;
export type PipeStatus = typeof NEW | typeof EXISTING | typeof PREPARED;

/** How a run of pipes is built: one rank may have up to three (its basses of another material, its flue top). */
export interface PipeForm {
  /** The stop that owns the rank. */
  readonly stop: number;
  readonly construction: Stop["construction"];
  readonly material: Material;
  readonly reed: boolean;
  readonly wood: boolean;
  /** Reeds: resonator length as a fraction of full length; 1 for flues. */
  readonly resonatorFraction: number;
  readonly conicalResonator: boolean;
}

/** A run of consecutive pipes of one rank with one footage and one form: what the per-pipe stage iterates. */
export interface Segment {
  /** Global index of the stop the pipes are counted for. */
  readonly stop: number;
  /** Global index of the stop whose rank they belong to (scale). */
  readonly rank: number;
  /** Index into plan.forms. */
  readonly form: number;
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
  readonly status: PipeStatus;
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
  /** Work on this stop's existing pipes (its own, or an extension's existing added pipes). */
  readonly work: readonly PipeWork[];
  readonly lowKey: number;
  readonly highKey: number;
  readonly notes: number;
  readonly ranks: number;
  /** Fewest and most ranks sounding on one key (they differ in a progressive mixture). */
  readonly ranksFrom: number;
  readonly ranksTo: number;
  readonly footage: Fraction;
  readonly footageText: string;
  readonly harmonic: Fraction;
  /** Semitones above unison, tempered or pure by the scheme's tuning. */
  readonly shift: number;
  /** Stop whose rank supplies the pipes (itself for own and prepared stops; −1 when unresolved). */
  readonly rootIndex: number;
  readonly sourceDivisionIndex: number;
  /** Forms of the rank this stop owns (own and prepared stops), indexes into plan.forms. */
  readonly forms: readonly number[];
  readonly pipes: PipeCounts;
}

export interface DivisionPlan {
  readonly index: number;
  readonly division: Division;
  readonly lowKey: number;
  readonly highKey: number;
  readonly notes: number;
  readonly stops: readonly number[];
  readonly unitChest: boolean;
}

export interface SchemePlan {
  readonly divisions: readonly DivisionPlan[];
  readonly stops: readonly StopPlan[];
  readonly forms: readonly PipeForm[];
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
/** A message about one field of a stop, worded with the division and stop names. */
type SayOfStop = (d: Draft, field: string, message: string) => void;

/** Message prefixes name the division and stop by their names, as the user wrote them. */
export function where(d: { readonly name: string }, s?: { readonly name: string }): string {
  return s ? `Division "${d.name}", stop "${s.name}"` : `Division "${d.name}"`;
}

/** The path of a stop's field, for messages shown in place. */
const stopField = (di: number, si: number, field: string) => ["divisions", di, "stops", si, field];

const footageText = (f: string | number) => (typeof f === "number" ? String(f) : f);
const range = (lo: number, hi: number) => (lo === hi ? midiToNote(lo) : `${midiToNote(lo)}–${midiToNote(hi)}`);

const footageOf = parseFootage;
const keyOf = noteToMidi;
const compassOf = (c: { readonly low: string; readonly high: string }) => {
  const lowMidi = keyOf(c.low);
  const highMidi = keyOf(c.high);
  return lowMidi === null || highMidi === null ? null : { lowMidi, highMidi };
};

/** A key where a run splits, if it lies above key a; else none (Infinity). */
const cutAbove = (a: number, cut: number) => (cut > a ? cut : Infinity);

/** Occupancy of sounding semitones (index = semitones above 8′ C + OCC_BASE) for ranks that carry extensions. */
const OCC_BASE = 96;
const OCC_SIZE = 256;

type Draft = { -readonly [K in keyof StopPlan]: StopPlan[K] };
/** A run of keys of one rank at one footage; footage null where a progressive rank is silent. */
type Run = { fromKey: number; shift: number; footage: Fraction | null };

/** Resolves a scheme into stops, forms, chest rows and segments of pipes, with pipe counts and messages. */
export function planScheme(scheme: Scheme): SchemePlan {
  const issues: PlanIssue[] = [];
  const say: Say = (path, message) => issues.push({ path, message });
  const tuning = scheme.tuning.mutations;
  const divisions: DivisionPlan[] = [];
  const segments: Segment[] = [];
  const rows: ChestRowPlan[] = [];
  const forms: PipeForm[] = [];
  const stopById = new Map<string, number>();
  const divisionIds = new Set<string>();
  const drafts: Draft[] = [];
  const stopPath = (d: Draft, field: string) => ["divisions", d.divisionIndex, "stops", scheme.divisions[d.divisionIndex].stops.indexOf(d.stop), field];
  const atOf = (d: Draft) => where(scheme.divisions[d.divisionIndex], d.stop);
  const sayOfStop: SayOfStop = (d, field, message) => say(stopPath(d, field), `${atOf(d)}: ${message}`);

  for (let di = 0; di < scheme.divisions.length; di++) {
    const division = scheme.divisions[di];
    if (divisionIds.has(division.id)) say(["divisions", di, "id"], `${where(division)}: the id "${division.id}" is used by another division`);
    divisionIds.add(division.id);
    let c = compassOf(division.compass);
    if (!c) {
      say(["divisions", di, "compass"], `${where(division)}: compass ${division.compass.low}–${division.compass.high} is not in note names such as C, c', c''''`);
      c = { lowMidi: 36, highMidi: 96 };
    } else if (c.lowMidi > c.highMidi) {
      say(["divisions", di, "compass"], `${where(division)}: compass runs downward (${division.compass.low} to ${division.compass.high}); give the lowest note first`);
    }
    const stopIndexes: number[] = [];
    // A plain loop with no closures per stop: messages are worded, and their paths built, only when needed.
    for (let si = 0; si < division.stops.length; si++) {
      const stop = division.stops[si];
      const index = drafts.length;
      if (stopById.has(stop.id)) say(stopField(di, si, "id"), `${where(division, stop)}: the id "${stop.id}" is used by another stop`);
      else stopById.set(stop.id, index);
      let lowKey = c.lowMidi;
      let highKey = c.highMidi;
      if (stop.compass) {
        const sc = compassOf(stop.compass);
        if (!sc) say(stopField(di, si, "compass"), `${where(division, stop)}: compass ${stop.compass.low}–${stop.compass.high} is not in note names`);
        else if (sc.lowMidi > sc.highMidi) say(stopField(di, si, "compass"), `${where(division, stop)}: compass runs downward (${stop.compass.low} to ${stop.compass.high}); give the lowest note first`);
        else if (sc.lowMidi < c.lowMidi || sc.highMidi > c.highMidi)
          say(stopField(di, si, "compass"), `${where(division, stop)}: compass ${stop.compass.low}–${stop.compass.high} goes beyond the division's ${division.compass.low}–${division.compass.high}`);
        else [lowKey, highKey] = [sc.lowMidi, sc.highMidi];
      }
      const footage = footageOf(stop.footage);
      if (!footage) say(stopField(di, si, "footage"), `${where(division, stop)}: footage "${footageText(stop.footage)}" ${MSG_NOT_FOOTAGE}`);
      const f = footage ?? { num: 8, den: 1 };
      const notes = compassNoteCount(lowKey, highKey);
      const kind = kindOf(stop.origin);
      if (hasFieldsToCheck(stop)) checkStopFields(stop, kind, notes, lowKey, highKey, division, di, si, say);
      drafts.push({
        index, divisionIndex: di, stop, kind, work: stop.work.length > 1 ? [...new Set(stop.work)] : stop.work,
        lowKey, highKey, notes, ranks: stop.ranks, ranksFrom: stop.ranks, ranksTo: stop.ranks,
        footage: f, footageText: formatFootage(f), harmonic: harmonicOf8ft(f),
        shift: semitonesAbove8ft(f, tuning), rootIndex: kind === "own" || kind === "prepared" ? index : -1,
        sourceDivisionIndex: di, forms: [], pipes: NO_PIPES,
      });
      stopIndexes.push(index);
    }
    divisions.push({
      index: di, division, lowKey: c.lowMidi, highKey: c.highMidi, notes: compassNoteCount(c.lowMidi, c.highMidi), stops: stopIndexes,
      unitChest: UNIT_CHESTS.includes(division.chest),
    });
  }

  // Sources of extensions and borrowings, followed to the stop that owns the rank.
  for (const d of drafts) {
    if (d.kind !== "extension" && d.kind !== "borrowed") continue;
    const at = atOf(d);
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

  // Chest rules: a rank plays from another keyboard or at another pitch only from a unit chest, or
  // (at its own pitch) from a duplexed slider chest (common practice).
  for (const d of drafts) {
    if ((d.kind !== "extension" && d.kind !== "borrowed") || d.rootIndex < 0) continue;
    const root = drafts[d.rootIndex];
    const rootDivision = scheme.divisions[root.divisionIndex];
    if (divisions[root.divisionIndex].unitChest) continue;
    const chest = `the ${rootDivision.name}'s ${rootDivision.chest} chest`;
    const samePitch = semitonesAbove8ft(d.footage) === semitonesAbove8ft(root.footage);
    if (d.kind === "extension") {
      say(stopPath(d, "source"), `${atOf(d)}: an extension needs its rank on a unit chest (pitman or direct-electric), but "${root.stop.name}" stands on ${chest}`);
    } else if (!samePitch) {
      say(stopPath(d, "source"), `${atOf(d)}: borrowing "${root.stop.name}" at another pitch needs its rank on a unit chest (pitman or direct-electric), but it stands on ${chest}`);
    } else if (root.divisionIndex !== d.divisionIndex && !root.stop.duplex) {
      say(stopPath(d, "source"), `${atOf(d)}: "${root.stop.name}" stands on ${chest} and plays only from its own keys; duplex "${root.stop.name}" or put its rank on a unit chest (pitman or direct-electric)`);
    }
  }

  // Own and prepared ranks: forms, one chest row per rank, segments per break range, form and state.
  for (const d of drafts) {
    if (d.kind === "removed") {
      d.pipes = counts(0, 0, 0, 0, d.ranks * d.notes);
      continue;
    }
    if (d.kind !== "own" && d.kind !== "prepared") continue;
    d.forms = formsOf(d, forms);
    const rankRuns = breakPlan(d, tuning, sayOfStop);
    const status: PipeStatus = d.kind === "prepared" ? PREPARED : d.stop.origin === "existing" ? EXISTING : NEW;
    // Re-scaled ranks: the pipes move by rescaleHt keys; the keys they leave empty get new pipes.
    const shiftBy = status === EXISTING && d.work.includes("rescaled") ? d.stop.rescaleHt : 0;
    const newBelow = shiftBy > 0 ? d.lowKey + shiftBy : -Infinity;
    const newAbove = shiftBy < 0 ? d.highKey + shiftBy : Infinity;
    const bassEnd = d.stop.bass ? d.lowKey + d.stop.bass.notes : -Infinity;
    const flueFrom = d.stop.construction === "reed" && d.stop.fluesFrom ? keyOf(d.stop.fluesFrom) ?? Infinity : Infinity;
    let made = 0;
    let fresh = 0;
    for (let r = 0; r < d.ranks; r++) {
      const row = rows.length;
      rows.push({ division: d.divisionIndex, stop: d.index, rank: r });
      const runs = rankRuns[r];
      for (let k = 0; k < runs.length; k++) {
        const run = runs[k];
        const from = run.fromKey;
        const to = k + 1 < runs.length ? runs[k + 1].fromKey - 1 : d.highKey;
        if (to < from || !run.footage) continue; // empty, or a progressive rank silent in this range
        // Split the run where the form or the state changes: basses, flue top, re-scaled ends
        // (each piece ends at the nearest of them above its start; no array to sort per run).
        for (let a = from, b: number; a <= to; a = b) {
          b = Math.min(to + 1, cutAbove(a, bassEnd), cutAbove(a, flueFrom), cutAbove(a, newBelow), cutAbove(a, newAbove + 1));
          const count = b - a;
          const isNew = status === EXISTING && (a < newBelow || a > newAbove);
          const form = a < bassEnd ? d.forms[1] : a >= flueFrom ? d.forms[d.forms.length - 1] : d.forms[0];
          segments.push({
            stop: d.index, rank: d.index, form, row, fromKey: a, count, shift: run.shift, footage: run.footage!, channelOffset: 0,
            offsetCount: Math.max(0, Math.min(count, d.lowKey + d.stop.offsetBassPipes - a)), status: isNew ? NEW : status,
          });
          made += count;
          if (isNew) fresh += count;
        }
      }
    }
    // A progressive mixture sounds fewer ranks in its lower ranges (III–V).
    if (d.stop.breaks?.some((b) => b.footages.includes(null))) {
      const sounding = d.stop.breaks.map((b) => b.footages.filter((f) => f !== null).length);
      d.ranksFrom = Math.min(...sounding);
      d.ranksTo = Math.max(...sounding);
    }
    if (status === PREPARED) d.pipes = counts(0, 0, 0, made, 0);
    else if (status === NEW) d.pipes = counts(made, 0, 0, 0, 0);
    else {
      const old = made - fresh;
      const restored = d.work.includes("restored");
      d.pipes = counts(fresh, restored ? 0 : old, restored ? old : 0, 0, fresh);
    }
  }

  // Extensions, in scheme order: each adds the notes of its compass its rank does not yet sound.
  const occupancy = new Map<number, Uint8Array>();
  const rowOfRank = new Map<number, number>();
  rows.forEach((r, i) => r.rank === 0 && rowOfRank.set(r.stop, i));
  const occupancyOf = (root: Draft) => {
    let occ = occupancy.get(root.index);
    if (!occ) {
      occ = new Uint8Array(OCC_SIZE);
      const rootShiftT = semitonesAbove8ft(root.footage, "tempered");
      for (let k = root.lowKey; k <= root.highKey; k++) occ[k - 36 + rootShiftT + OCC_BASE] = 1;
      occupancy.set(root.index, occ);
    }
    return occ;
  };
  for (const d of drafts) {
    if (d.kind !== "extension" || d.rootIndex < 0) continue;
    const root = drafts[d.rootIndex];
    const rootShiftT = semitonesAbove8ft(root.footage, "tempered");
    const extShiftT = semitonesAbove8ft(d.footage, "tempered");
    const occ = occupancyOf(root);
    const status: PipeStatus = root.kind === "prepared" ? PREPARED : d.stop.addedPipes === "existing" ? EXISTING : NEW;
    const row = rowOfRank.get(root.index)!;
    // The rank's forms hold by sounding pitch: added basses take the basses' form, added trebles the flue top's.
    const bassBelowSounding = root.stop.bass ? root.lowKey + root.stop.bass.notes + rootShiftT : -Infinity;
    const flueKey = root.stop.construction === "reed" && root.stop.fluesFrom ? keyOf(root.stop.fluesFrom) : null;
    const flueFromSounding = flueKey === null ? Infinity : flueKey + rootShiftT;
    const formAt = (sounding: number) =>
      sounding < bassBelowSounding ? root.forms[1] : sounding >= flueFromSounding ? root.forms[root.forms.length - 1] : root.forms[0];
    let added = 0;
    let offsetLeft = d.stop.offsetBassPipes;
    let runFrom = -1;
    let runForm = -1;
    const close = (k: number) => {
      // A run of added notes ends: one segment; its lowest pipes take what is left of the offset basses.
      const count = k - runFrom;
      const offsetCount = Math.min(offsetLeft, count);
      offsetLeft -= offsetCount;
      segments.push({
        stop: d.index, rank: root.index, form: runForm, row, fromKey: runFrom, count, shift: d.shift, footage: d.footage,
        channelOffset: extShiftT - rootShiftT, offsetCount, status,
      });
      runFrom = -1;
    };
    for (let k = d.lowKey; k <= d.highKey + 1; k++) {
      const i = k - 36 + extShiftT + OCC_BASE;
      const free = k <= d.highKey && i >= 0 && i < OCC_SIZE && occ[i] === 0;
      const form = free ? formAt(k + extShiftT) : -1;
      if (runFrom >= 0 && (!free || form !== runForm)) close(k);
      if (free) {
        occ[i] = 1;
        added++;
        if (runFrom < 0) [runFrom, runForm] = [k, form];
      }
    }
    const restored = d.work.includes("restored");
    d.pipes =
      status === PREPARED ? counts(0, 0, 0, added, 0)
      : status === NEW ? counts(added, 0, 0, 0, 0)
      : counts(0, restored ? 0 : added, restored ? added : 0, 0, 0);
  }

  // Borrowings must find a pipe of their rank (with its extensions) for every note they play.
  for (const d of drafts) {
    if (d.kind !== "borrowed" || d.rootIndex < 0) continue;
    const root = drafts[d.rootIndex];
    const rootShiftT = semitonesAbove8ft(root.footage, "tempered");
    const shiftT = semitonesAbove8ft(d.footage, "tempered");
    const occ = occupancy.get(root.index);
    const has = (k: number) => {
      const s = k - 36 + shiftT;
      if (occ) return s + OCC_BASE >= 0 && s + OCC_BASE < OCC_SIZE && occ[s + OCC_BASE] === 1;
      const j = k + shiftT - rootShiftT;
      return j >= root.lowKey && j <= root.highKey;
    };
    const missing: [number, number][] = [];
    for (let k = d.lowKey; k <= d.highKey; k++) {
      if (has(k)) continue;
      const last = missing[missing.length - 1];
      if (last && last[1] === k - 1) last[1] = k;
      else missing.push([k, k]);
    }
    if (missing.length) {
      const rootDivision = scheme.divisions[root.divisionIndex].name;
      say(
        stopPath(d, "source"),
        `${atOf(d)}: "${root.stop.name}" ${root.footageText}′ (${rootDivision}) has no pipe for ${missing.map(([a, b]) => range(a, b)).join(", ")} at ${d.footageText}′; a borrowing must find a pipe for every note it plays — make it an extension, or give it a shorter compass`,
      );
    }
  }

  checkAccessories(scheme, divisionIds, say);
  return { divisions, stops: drafts, forms, segments, rows, messages: issues.map((i) => i.message), issues };
}

/** The forms of a rank: its main form, then its basses' (if another material), then a reed's flue top. */
function formsOf(d: Draft, forms: PipeForm[]): number[] {
  const s = d.stop;
  const reed = s.construction === "reed";
  const resonatorFraction = reed ? RESONATOR[s.resonator?.length ?? "full"] : 1;
  const conical = reed && (s.resonator?.shape ?? "conical") === "conical";
  const out = [forms.push(pipeForm(d.index, s.construction, s.material, reed, resonatorFraction, conical)) - 1];
  if (s.bass) {
    const construction = reed ? "reed" : s.bass.construction ?? s.construction;
    out.push(forms.push(pipeForm(d.index, construction, s.bass.material, reed, resonatorFraction, conical)) - 1);
  }
  if (reed && s.fluesFrom) out.push(forms.push(pipeForm(d.index, "open", s.material, false, 1, false)) - 1);
  return out;
}

/** One form, built field by field (a spread of another form costs several times as much, per rank). */
function pipeForm(
  stop: number, construction: Stop["construction"], material: Material, reed: boolean, resonatorFraction: number, conicalResonator: boolean,
): PipeForm {
  return { stop, construction, material, reed, wood: isWood(material), resonatorFraction, conicalResonator };
}

const RESONATOR = { full: 1, half: 1 / 2, quarter: 1 / 4, eighth: 1 / 8, sixteenth: 1 / 16 } as const;

/** Whether a stop sets any field that checkStopFields has a rule for: most stops set none, and skip the call. */
function hasFieldsToCheck(stop: Stop): boolean {
  return !!(stop.offsetBassPipes || stop.work.length || stop.rescaleHt || stop.fluesFrom || stop.resonator || stop.bass || stop.duplex);
}

/** Field rules a single stop can break on its own (only stops with hasFieldsToCheck can break one). */
function checkStopFields(
  stop: Stop, kind: StopKind, notes: number, lowKey: number, highKey: number, division: Division, di: number, si: number, say: Say,
): void {
  const at = where(division, stop);
  const sp = (field: string) => stopField(di, si, field);
  if (stop.offsetBassPipes > notes) say(sp("offsetBassPipes"), `${at}: ${stop.offsetBassPipes} offset bass pipes, but the stop has only ${notes} notes`);
  const existingPipes = stop.origin === "existing" || (stop.origin === "extension" && stop.addedPipes === "existing");
  if (stop.work.length && !existingPipes)
    say(sp("work"), `${at}: ${stop.work.join(", ")} is work on existing pipes, and this stop has none (it is ${stop.origin})`);
  if (new Set(stop.work).size !== stop.work.length) say(sp("work"), `${at}: each kind of work is given once`);
  if (stop.work.includes("rescaled") && stop.rescaleHt === 0)
    say(sp("rescaleHt"), `${at}: re-scaled, but by how many semitones? Give the semitones the pipes move (+ up, − down)`);
  if (!stop.work.includes("rescaled") && stop.rescaleHt !== 0)
    say(sp("rescaleHt"), `${at}: pipes moved ${stop.rescaleHt} semitones, but the work does not say re-scaled`);
  if (stop.work.includes("rescaled") && Math.abs(stop.rescaleHt) >= notes && notes > 0)
    say(sp("rescaleHt"), `${at}: pipes moved ${stop.rescaleHt} semitones on a rank of ${notes} notes leave none in place`);
  if (stop.construction !== "reed") {
    if (stop.fluesFrom) say(sp("fluesFrom"), `${at}: only a reed breaks to flue pipes at the top`);
    if (stop.resonator) say(sp("resonator"), `${at}: only a reed has a resonator length; a flue is ${stop.construction}`);
  } else if (stop.fluesFrom) {
    const k = noteToMidi(stop.fluesFrom);
    if (k === null || k <= lowKey || k > highKey) say(sp("fluesFrom"), `${at}: flue pipes from ${stop.fluesFrom}, which lies outside the stop's compass above its lowest note`);
  }
  if (stop.bass && stop.bass.notes >= notes && notes > 0)
    say(sp("bass"), `${at}: ${stop.bass.notes} basses of ${stop.bass.material} on a stop of ${notes} notes leave no trebles`);
  if (stop.bass && stop.construction === "reed" && stop.bass.construction) say(sp("bass"), `${at}: a reed's basses are reeds; give only their material`);
  if (stop.duplex && kind !== "own" && kind !== "prepared") say(sp("duplex"), `${at}: only a stop with its own rank can be duplexed`);
}

/**
 * Per rank, the runs of keys with one footage: from the breaks for mixtures, else the stop's
 * footage. A run is null where a progressive mixture's rank is silent.
 */
function breakPlan(d: Draft, tuning: Scheme["tuning"]["mutations"], sayOfStop: SayOfStop): Run[][] {
  const breaks = d.stop.breaks;
  if (!breaks || breaks.length === 0) {
    if (d.ranks > 1 && (d.stop.family === "mixture" || d.stop.family === "mutation"))
      sayOfStop(d, "breaks", `a ${d.stop.family} of ${d.ranks} ranks needs breaks giving each rank's footage`);
    return plainRuns(d);
  }
  // A loop, not Array.from({ length }): that takes the generic iterable path, slow enough to show per stop.
  const out: Run[][] = [];
  for (let r = 0; r < d.ranks; r++) out.push([]);
  let prevKey = -Infinity;
  let ok = true;
  for (let bi = 0; bi < breaks.length; bi++) {
    const b = breaks[bi];
    const key = keyOf(b.from);
    if (key === null) {
      sayOfStop(d, "breaks", `break "${b.from}" is not a note name`);
      ok = false;
      continue;
    }
    if (b.footages.length !== d.ranks) {
      sayOfStop(d, "breaks", `the break at ${b.from} gives ${b.footages.length} footages for ${d.ranks} ranks`);
      ok = false;
    }
    if (key <= prevKey) {
      sayOfStop(d, "breaks", `breaks must go upward; ${b.from} comes after a higher or equal note`);
      ok = false;
    }
    if (bi > 0 && (key < d.lowKey || key > d.highKey)) {
      sayOfStop(d, "breaks", `break at ${b.from} lies outside the stop's compass`);
      ok = false;
    }
    if (b.footages.every((f) => f === null)) {
      sayOfStop(d, "breaks", `the break at ${b.from} leaves every rank silent`);
      ok = false;
    }
    prevKey = key;
    const fromKey = bi === 0 ? d.lowKey : key; // the first break range starts at the rank's lowest note
    for (let r = 0; r < Math.min(d.ranks, b.footages.length); r++) {
      const text = b.footages[r];
      if (text === null) {
        out[r].push({ fromKey, shift: 0, footage: null });
        continue;
      }
      const f = footageOf(text);
      if (!f) {
        sayOfStop(d, "breaks", `break at ${b.from}, rank ${r + 1}: footage "${footageText(text)}" ${MSG_NOT_FOOTAGE}`);
        ok = false;
        continue;
      }
      out[r].push({ fromKey, shift: semitonesAbove8ft(f, tuning), footage: f });
    }
  }
  return ok ? out : plainRuns(d);
}

/** Every rank of the stop at its own footage, over its whole compass. */
function plainRuns(d: Draft): Run[][] {
  const out: Run[][] = [];
  for (let r = 0; r < d.ranks; r++) out.push([{ fromKey: d.lowKey, shift: d.shift, footage: d.footage }]);
  return out;
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
