/**
 * Hours, as the estimate shows them: records by department rounded to tenths, and exact sums of
 * shown tenths. The norms themselves live in the rates (rates.ts); each part of the work books its
 * hours in its own module (pipe-work.ts, chests-action.ts, wind.ts …).
 */
import { departments, DEPARTMENT_COUNT, sizeClasses, type Department, type SizeClass } from "./departments";

/** Rounds hours to tenths, as they are shown; sums of shown hours are taken in tenths to stay exact. */
export function roundHours(h: number): number {
  return Math.round(h * 10) / 10;
}

/**
 * A record by department of values in department order (departments.ts). Written as one literal, so
 * every hours record an estimate builds has one shape instead of growing key by key; the test holds
 * its keys equal to `departments`, in order.
 */
export function departmentRecord(v: ArrayLike<number>): Record<Department, number> {
  return {
    design: v[0], metalPipes: v[1], woodPipes: v[2], reeds: v[3], voicing: v[4], chestAction: v[5], casework: v[6], console: v[7],
    electrics: v[8], dismantling: v[9], transport: v[10], erection: v[11], tonalFinishing: v[12], management: v[13],
  };
}

/** Float64Array of department hours → record, rounded to tenths. */
export function hoursRecord(a: ArrayLike<number>): Record<Department, number> {
  const rounded = new Float64Array(DEPARTMENT_COUNT);
  for (let i = 0; i < DEPARTMENT_COUNT; i++) rounded[i] = roundHours(a[i]);
  return departmentRecord(rounded);
}

/** Sum of hour records in tenths (exact), back in hours. */
export function sumHours(records: readonly Readonly<Record<Department, number>>[]): Record<Department, number> {
  const sums = new Float64Array(DEPARTMENT_COUNT);
  for (let i = 0; i < DEPARTMENT_COUNT; i++) {
    const d = departments[i];
    let tenths = 0;
    for (const r of records) tenths += Math.round(r[d] * 10);
    sums[i] = tenths / 10;
  }
  return departmentRecord(sums);
}

export function totalHours(r: Readonly<Record<Department, number>>): number {
  let tenths = 0;
  for (const d of departments) tenths += Math.round(r[d] * 10);
  return tenths / 10;
}

/** Σ counts[at + i] × norm[class i] over the five size classes. */
export function dotBySize(counts: ArrayLike<number>, at: number, norm: Readonly<Record<SizeClass, number>>): number {
  return (
    counts[at] * norm.over8 + counts[at + 1] * norm["4to8"] + counts[at + 2] * norm["2to4"] + counts[at + 3] * norm["1to2"] + counts[at + 4] * norm.under1
  );
}

/** Pipes in counts[at … at+4]. */
export function sumBySize(counts: ArrayLike<number>, at: number): number {
  return counts[at] + counts[at + 1] + counts[at + 2] + counts[at + 3] + counts[at + 4];
}

/** A by-size norm as an array in class order. */
export function bySizeArray(v: Readonly<Record<SizeClass, number>>): number[] {
  return sizeClasses.map((c) => v[c]);
}
