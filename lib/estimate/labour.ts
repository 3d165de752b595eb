/**
 * Labour hours by department from the firm's norms (rates.ts). Norms per pipe are given by size
 * class of speaking length (over 8′, 4–8′, 2–4′, 1–2′, under 1′), as estimators already reckon
 * ("hours per new metal pipe of 2–4 ft"); the class of a pipe is that of its computed speaking length.
 */
import type { Norms } from "./rates";
import { M_PER_FT } from "./units";

export const departments = [
  "metalPipes", "woodPipes", "reeds", "voicing", "chestAction", "console", "electrics",
  "dismantling", "transport", "erection", "tonalFinishing",
] as const;
export type Department = (typeof departments)[number];

export const departmentLabels: Readonly<Record<Department, string>> = {
  metalPipes: "Metal pipe shop",
  woodPipes: "Wood shop",
  reeds: "Reed making",
  voicing: "Voicing",
  chestAction: "Chests and action",
  console: "Console",
  electrics: "Electrics",
  dismantling: "Dismantling and packing",
  transport: "Transport",
  erection: "Erection",
  tonalFinishing: "Tonal finishing on site",
};

/** Department positions in the Float64Array accumulators the estimator uses. */
export const D = Object.fromEntries(departments.map((d, i) => [d, i])) as Readonly<Record<Department, number>>;
export const DEPARTMENT_COUNT = departments.length;

export const sizeClasses = ["over8", "4to8", "2to4", "1to2", "under1"] as const;
export type SizeClass = (typeof sizeClasses)[number];
export const sizeClassLabels: Readonly<Record<SizeClass, string>> = {
  over8: "over 8 ft", "4to8": "4–8 ft", "2to4": "2–4 ft", "1to2": "1–2 ft", under1: "under 1 ft",
};

const FT8_MM = 8 * M_PER_FT * 1000;
const FT4_MM = 4 * M_PER_FT * 1000;
const FT2_MM = 2 * M_PER_FT * 1000;
const FT1_MM = M_PER_FT * 1000;

// A hair above each footage, so a C that reaches a boundary by repeated stepping stays in the shorter class.
const B8 = FT8_MM * (1 + 1e-9);
const B4 = FT4_MM * (1 + 1e-9);
const B2 = FT2_MM * (1 + 1e-9);
const B1 = FT1_MM * (1 + 1e-9);

/**
 * Size class index (0 = over 8′ … 4 = under 1′) of a pipe's nominal length in mm (nominalLengthMm);
 * boundaries belong to the shorter class, so an 8′ C is a 4–8′ pipe.
 */
export function sizeClassIndex(lengthMm: number): number {
  return lengthMm > B8 ? 0 : lengthMm > B4 ? 1 : lengthMm > B2 ? 2 : lengthMm > B1 ? 3 : 4;
}

/**
 * A pipe's nominal length as the trade reckons size (8 ft at 8′ C for an open pipe or full-length
 * resonator, half that when stopped or half-length), from its pitch in semitones above 8′ C.
 * Independent of pitch standard and temperature, unlike the speaking length, so norms priced
 * "per pipe of 4–8 ft" do not jump when the pitch or the design temperature changes.
 */
export function nominalLengthMm(semitonesAbove8ftC: number, divisor: number): number {
  return ((2 * FT8_MM) / divisor) * Math.pow(2, -semitonesAbove8ftC / 12);
}

export function sizeClassOf(lengthMm: number): SizeClass {
  return sizeClasses[sizeClassIndex(lengthMm)];
}

/** A by-size norm as an array in class order. */
export function bySizeArray(v: Readonly<Record<SizeClass, number>>): number[] {
  return sizeClasses.map((c) => v[c]);
}

function dot(counts: ArrayLike<number>, offset: number, norm: Readonly<Record<SizeClass, number>>): number {
  return (
    counts[offset] * norm.over8 + counts[offset + 1] * norm["4to8"] + counts[offset + 2] * norm["2to4"] +
    counts[offset + 3] * norm["1to2"] + counts[offset + 4] * norm.under1
  );
}

export type PipeWork = "new" | "retained" | "restored" | "revoiced" | "relocated";

/**
 * Adds the hours for one stop's pipes to `out` (indexed by department, see D). `counts` holds the
 * pipes per size class at counts[offset … offset+4].
 */
export function addPipeHours(
  work: PipeWork, wood: boolean, reed: boolean,
  counts: ArrayLike<number>, offset: number, norms: Norms, out: Float64Array,
): void {
  const n = counts[offset] + counts[offset + 1] + counts[offset + 2] + counts[offset + 3] + counts[offset + 4];
  if (n === 0) return;
  const shop = wood ? D.woodPipes : D.metalPipes;
  switch (work) {
    case "new":
      if (reed) {
        out[shop] += dot(counts, offset, wood ? norms.newWoodPipe : norms.reedResonator);
        out[D.reeds] += dot(counts, offset, norms.reedParts);
        out[D.voicing] += n * norms.voiceNewReedPipe;
      } else {
        out[shop] += dot(counts, offset, wood ? norms.newWoodPipe : norms.newMetalPipe);
        out[D.voicing] += n * norms.voiceNewFluePipe;
      }
      return;
    case "restored":
      out[shop] += dot(counts, offset, wood ? norms.restoreWoodPipe : norms.restoreMetalPipe);
      if (reed) out[D.reeds] += dot(counts, offset, norms.restoreReedParts);
      out[D.voicing] += n * norms.regulateRestoredPipe;
      return;
    case "revoiced":
      out[shop] += n * norms.cleanRetainedPipe;
      out[D.voicing] += n * norms.revoicePipe;
      return;
    case "relocated":
      out[shop] += n * norms.cleanRetainedPipe;
      out[D.erection] += n * norms.relocatePipe;
      return;
    case "retained":
      out[shop] += n * norms.cleanRetainedPipe;
      return;
  }
}

export type WorkOnExisting = "new" | "restored" | "retained";

function workFactor(work: WorkOnExisting, restored: number, retained: number): number {
  return work === "new" ? 1 : work === "restored" ? restored : retained;
}

export interface DivisionWork {
  /** Keys of the division's compass. */
  readonly notes: number;
  /** Whether the division has a chest of its own (any rank or prepared rank stands on it). */
  readonly hasChest: boolean;
  readonly chestWork: WorkOnExisting;
  /** Stops with a row on the chest (sliders / stop actions), prepared ones included. */
  readonly chestStops: number;
  /** Direct-electric chests: one magnet per pipe position. */
  readonly pipeMagnets: number;
  readonly offsetPipes: number;
  readonly enclosed: boolean;
  /** Conductors terminated for this division (0 with mechanical action). */
  readonly conductors: number;
  readonly electric: boolean;
  /** Stop controls (drawn stops, prepared ones included; removed excluded). */
  readonly stopControls: number;
  /** Pipes standing in the finished organ for this division. */
  readonly pipesInOrgan: number;
  /** Existing pipes taken down (reused, restored and removed). */
  readonly existingPipes: number;
  readonly existing: boolean;
  readonly newStops: number;
  readonly existingStops: number;
  /** Extensions and borrowings: finished, not made. */
  readonly derivedStops: number;
}

/** Adds the hours of work done per division — chests, winding, electrics, dismantling, erection, finishing — to `out`. */
export function addDivisionHours(w: DivisionWork, norms: Norms, out: Float64Array): void {
  if (w.hasChest) {
    const f = workFactor(w.chestWork, norms.chestRestoredFactor, norms.chestRetainedFactor);
    out[D.chestAction] +=
      f * (w.notes * norms.chestPerNoteChannel + w.chestStops * norms.chestPerStop + w.pipeMagnets * norms.chestPerPipeMagnet +
        w.offsetPipes * norms.offsetChestPerPipe + norms.windingPerDivision + (w.enclosed ? norms.swellBoxPerDivision : 0));
  }
  if (w.electric) {
    out[D.electrics] += w.conductors * norms.electricsPerConductor + w.stopControls * norms.electricsPerStop + norms.electricsPerDivision;
  }
  if (w.existing) out[D.dismantling] += norms.dismantlePerDivision + w.existingPipes * norms.dismantlePerPipe;
  if (w.pipesInOrgan > 0 || w.hasChest) out[D.erection] += norms.erectPerDivision + w.pipesInOrgan * norms.erectPerPipe;
  out[D.tonalFinishing] +=
    w.newStops * norms.finishPerNewStop + w.existingStops * norms.finishPerExistingStop +
    w.derivedStops * norms.finishPerDerivedStop + w.pipesInOrgan * norms.finishPerPipe;
}

export interface ConsoleWork {
  readonly work: WorkOnExisting;
  readonly keyboards: number;
  readonly stopControls: number;
  readonly couplers: number;
  readonly tremulants: number;
  readonly pistons: number;
  readonly memoryLevels: number;
  /** Conductors inside the console (couplers, combination system). */
  readonly conductors: number;
  readonly electric: boolean;
}

/** Adds the console's hours (and its internal wiring, under electrics) to `out`. */
export function addConsoleHours(c: ConsoleWork, norms: Norms, out: Float64Array): void {
  const f = workFactor(c.work, norms.consoleRestoredFactor, norms.consoleRetainedFactor);
  const combination = c.pistons > 0 || c.memoryLevels > 0 ? norms.combinationSystem : 0;
  out[D.console] +=
    f * (c.keyboards * norms.consolePerKeyboard + c.stopControls * norms.consolePerStopControl + c.couplers * norms.consolePerCoupler +
      c.tremulants * norms.consolePerTremulant + c.pistons * norms.consolePerPiston + combination);
  if (c.electric) out[D.electrics] += c.conductors * norms.electricsPerConductor;
}

/** Transport: one trip to deliver, one more to fetch existing material to the workshop. */
export function addTransportHours(pipesMoved: number, hasExisting: boolean, norms: Norms, out: Float64Array): void {
  const trips = hasExisting ? 2 : 1;
  out[D.transport] += trips * norms.transportPerTrip + (pipesMoved / 1000) * norms.transportPerThousandPipes;
}

/** Rounds hours to tenths, as they are shown; sums of shown hours are taken in tenths to stay exact. */
export function roundHours(h: number): number {
  return Math.round(h * 10) / 10;
}

/** Float64Array of department hours → record, rounded to tenths. */
export function hoursRecord(a: ArrayLike<number>): Record<Department, number> {
  const out = {} as Record<Department, number>;
  for (let i = 0; i < DEPARTMENT_COUNT; i++) out[departments[i]] = roundHours(a[i]);
  return out;
}

/** Sum of hour records in tenths (exact), back in hours. */
export function sumHours(records: readonly Readonly<Record<Department, number>>[]): Record<Department, number> {
  const out = {} as Record<Department, number>;
  for (const d of departments) {
    let tenths = 0;
    for (const r of records) tenths += Math.round(r[d] * 10);
    out[d] = tenths / 10;
  }
  return out;
}

export function totalHours(r: Readonly<Record<Department, number>>): number {
  let tenths = 0;
  for (const d of departments) tenths += Math.round(r[d] * 10);
  return tenths / 10;
}
