/**
 * The programme: weeks per department = hours ÷ (crew × hours per week × efficiency), in phases in
 * order — design and drawings → dismantle and pack → workshop (departments in parallel, the longest
 * sets the phase) → transport → erection → tonal finishing — from the start date to completion,
 * against the target. Project management runs alongside every phase and sets none.
 */
import type { Rates } from "./rates";
import type { Department } from "./departments";

export const phases = [
  { id: "design", label: "Design and drawings", departments: ["design"] },
  { id: "dismantle", label: "Dismantle and pack", departments: ["dismantling"] },
  { id: "workshop", label: "Workshop", departments: ["metalPipes", "woodPipes", "reeds", "voicing", "chestAction", "casework", "console", "electrics"] },
  { id: "transport", label: "Transport", departments: ["transport"] },
  { id: "erection", label: "Erection", departments: ["erection"] },
  { id: "finishing", label: "Tonal finishing", departments: ["tonalFinishing"] },
] as const satisfies readonly { id: string; label: string; departments: readonly Department[] }[];
export type PhaseId = (typeof phases)[number]["id"];

export interface PhaseWeeks {
  readonly id: PhaseId;
  readonly label: string;
  readonly weeks: number;
  /** The department that sets the phase's length. */
  readonly setBy: Department | null;
  readonly byDepartment: readonly { readonly department: Department; readonly weeks: number }[];
}

export interface Programme {
  readonly phases: readonly PhaseWeeks[];
  readonly totalWeeks: number;
  readonly startDate?: string;
  readonly completionDate?: string;
  readonly targetDate?: string;
  readonly meetsTarget?: boolean;
  /** Weeks to spare (+) or late (−) against the target. */
  readonly slackWeeks?: number;
}

/** Weeks rounded up to tenths: a programme should not promise less than the hours need. */
export function ceilWeeks(w: number): number {
  // "+ 0" turns the −0 that ceil gives for no hours into 0.
  return Math.ceil(w * 10 - 1e-9) / 10 + 0;
}

/** Weeks a department needs for its hours. */
export function departmentWeeks(hours: number, crew: number, p: Rates["programme"]): number {
  return ceilWeeks(hours / (crew * p.hoursPerWeek * p.efficiency));
}

const DAY_MS = 86_400_000;

function addDays(isoDate: string, days: number): string {
  const [y, m, d] = isoDate.split("-").map(Number);
  return new Date(Date.UTC(y, m - 1, d) + days * DAY_MS).toISOString().slice(0, 10);
}

function daysBetween(a: string, b: string): number {
  const t = (s: string) => {
    const [y, m, d] = s.split("-").map(Number);
    return Date.UTC(y, m - 1, d);
  };
  return Math.round((t(b) - t(a)) / DAY_MS);
}

/** Programme from hours by department; dates (yyyy-mm-dd, UTC) when the scheme gives them. */
export function planProgramme(
  hours: Readonly<Record<Department, number>>,
  p: Rates["programme"],
  dates?: { readonly start: string; readonly target?: string },
): Programme {
  const out: PhaseWeeks[] = [];
  let totalTenths = 0;
  for (const ph of phases) {
    let weeks = 0;
    let setBy: Department | null = null;
    const byDepartment = ph.departments.map((department) => {
      const w = departmentWeeks(hours[department], p.crew[department], p);
      if (w > weeks) [weeks, setBy] = [w, department];
      return { department, weeks: w };
    });
    totalTenths += Math.round(weeks * 10);
    out.push({ id: ph.id, label: ph.label, weeks, setBy, byDepartment });
  }
  const totalWeeks = totalTenths / 10;
  if (!dates) return { phases: out, totalWeeks };
  const completionDate = addDays(dates.start, Math.ceil(totalWeeks * 7 - 1e-9));
  if (!dates.target) return { phases: out, totalWeeks, startDate: dates.start, completionDate };
  const slackDays = daysBetween(completionDate, dates.target);
  return {
    phases: out, totalWeeks, startDate: dates.start, completionDate, targetDate: dates.target,
    meetsTarget: slackDays >= 0, slackWeeks: Math.round((slackDays / 7) * 10) / 10,
  };
}
