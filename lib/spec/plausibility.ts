/**
 * Values that are legal but unusual: the editor's forms warn about them and let the user keep them;
 * the server never refuses them (a chamber organ, a high-pressure tuba or a short-compass pedal are
 * real). Each rule names its source or says it is common practice. Pure.
 */
import { compassNoteCount, noteToMidi, parseFootage, semitonesAbove8ft } from "@/lib/estimate";

/** Wind from this to this many millimetres of water is usual; outside it the form asks. */
export const USUAL_WIND_MM = { low: 40, high: 400 } as const;
/** 1 in of water = 25.4 mm of water (both conventional, NIST SP 811, Appendix B: 249.0889 Pa / 9.80665 Pa). */
const MM_PER_IN = 25.4;
/**
 * The highest sound a rank should reach: the top key (c'''') of a 1′ rank, MIDI 132, about 16.7 kHz
 * (derived: c'''' = MIDI 96 at 8′, three octaves up; equal temperament from A4 = 440 Hz, ISO 16).
 * Pipes above it would be a few millimetres long and above most people's hearing, so mixtures
 * break back before it — common practice, no source.
 */
export const TOP_SOUNDING_MIDI = 132;
/** Pedalboards have 30 or 32 notes (RCO 1881 / AGO 1933 recommendations); older ones 25–29. */
const PEDAL_NOTES = { low: 25, high: 32 } as const;
/** Manuals: C–c'''' = 61 today, C–f''' = 54 on older instruments; chamber organs from 45 (common practice). */
const MANUAL_NOTES = { low: 45, high: 61 } as const;

export type Warning = { field: string; message: string };

type Compass = { readonly low: string; readonly high: string };
type WindIn = { readonly value: number; readonly unit?: "mm" | "in" };
type StopIn = {
  readonly name?: string;
  readonly footage?: string | number | null;
  readonly ranks?: number;
  readonly compass?: Compass;
  readonly breaks?: readonly { readonly from: string; readonly footages: readonly (string | number | null)[] }[];
};
type DivisionIn = {
  readonly name?: string;
  readonly keyboard?: "manual" | "pedal";
  readonly compass?: Compass;
  readonly windPressure?: WindIn;
  readonly stops?: readonly StopIn[];
};

const fmt = (n: number) => (Math.abs(n) >= 100 ? String(Math.round(n)) : String(Math.round(n * 10) / 10));

export function windWarning(wind: WindIn | undefined): string | null {
  if (!wind || !Number.isFinite(wind.value) || wind.value <= 0) return null;
  const mm = wind.unit === "in" ? wind.value * MM_PER_IN : wind.value;
  if (mm >= USUAL_WIND_MM.low && mm <= USUAL_WIND_MM.high) return null;
  const as = wind.unit === "in" ? `${fmt(wind.value)} in (${fmt(mm)} mm)` : `${fmt(mm)} mm (${fmt(mm / MM_PER_IN)} in)`;
  // Hendrickson, "Wind Pressures", The American Organist (1992): 3–4 in usual since the 1980s,
  // 4–10 in in 1910–50, heavy reeds far higher.
  return mm > USUAL_WIND_MM.high
    ? `Wind of ${as} is far above the usual: most organs stand on 50–125 mm (2–5 in), heavy reeds on up to about ${USUAL_WIND_MM.high} mm (16 in). Check the value and its unit.`
    : `Wind of ${as} is very low: even small organs stand on about 45 mm (1¾ in) or more. Check the value and its unit.`;
}

function notesOf(c: Compass | undefined): number | null {
  if (!c) return null;
  const lo = noteToMidi(c.low);
  const hi = noteToMidi(c.high);
  return lo === null || hi === null || hi < lo ? null : compassNoteCount(lo, hi);
}

export function compassWarning(keyboard: "manual" | "pedal" | undefined, compass: Compass | undefined): string | null {
  const n = notesOf(compass);
  if (n === null || !keyboard) return null;
  if (keyboard === "pedal" && n > PEDAL_NOTES.high)
    return `${n} notes is a manual's compass: pedalboards have 30 or 32 notes (C to f′ or g′). Check the compass, or that this division is played from the pedals.`;
  if (keyboard === "pedal" && n < PEDAL_NOTES.low) return `${n} notes is short even for an old pedalboard (usually 30 or 32, at least about 25). Check the compass.`;
  if (keyboard === "manual" && n > MANUAL_NOTES.high) return `${n} notes is more than a usual manual (61, C to c′′′′). Check the compass.`;
  if (keyboard === "manual" && n < MANUAL_NOTES.low) return `${n} notes is short for a manual (usually 54 to 61, C to f′′′ or c′′′′). Check the compass, or that this division is played from the pedals.`;
  return null;
}

/** Semitones above 8′ of a footage, or null when it is not one (the schema reports that). */
function shift(footage: string | number | null | undefined): number | null {
  if (footage === null || footage === undefined || footage === "") return null;
  const f = parseFootage(footage);
  return f ? semitonesAbove8ft(f) : null;
}

/**
 * Ranks whose top pipe would sound above the top of the pitch range. A mixture is followed break by
 * break: each break's footages hold up to the key below the next break.
 */
export function rankTopWarning(stop: StopIn, divisionCompass: Compass | undefined): string | null {
  const compass = stop.compass ?? divisionCompass;
  const low = compass ? noteToMidi(compass.low) : null;
  const high = compass ? noteToMidi(compass.high) : null;
  if (low === null || high === null || high < low) return null;
  const over: { rank: number | null; top: number; at: number }[] = [];
  if (stop.breaks?.length) {
    const starts = stop.breaks.map((b) => noteToMidi(b.from));
    stop.breaks.forEach((b, i) => {
      const from = starts[i];
      if (from === null || from === undefined || from > high) return;
      const next = starts.slice(i + 1).find((s): s is number => s !== null && s !== undefined && s > from);
      const last = Math.min(high, (next ?? high + 1) - 1);
      b.footages.forEach((f, r) => {
        const s = shift(f);
        if (s !== null && last + s > TOP_SOUNDING_MIDI) over.push({ rank: r + 1, top: last + s, at: last });
      });
    });
  } else {
    const s = shift(stop.footage);
    if (s !== null && high + s > TOP_SOUNDING_MIDI) over.push({ rank: null, top: high + s, at: high });
  }
  if (!over.length) return null;
  const worst = over.reduce((a, b) => (b.top > a.top ? b : a));
  const khz = (440 * Math.pow(2, (worst.top - 69) / 12)) / 1000;
  const which = worst.rank === null ? "Its top pipe" : over.length === 1 ? `Rank ${worst.rank}` : `${new Set(over.map((o) => o.rank)).size} ranks; the highest`;
  return `${which} would sound about ${fmt(khz)} kHz, above the highest pipes made (about 16.7 kHz, the top of a 1′ rank) and above most people's hearing. ${stop.breaks?.length ? "Add a break back" : "Give it a shorter compass, or make it a mixture that breaks back"}, or keep it if you mean it.`;
}

/** Warnings for a division's own fields, and for its stops that its compass would push past the top. */
export function divisionWarnings(d: DivisionIn): Warning[] {
  const out: Warning[] = [];
  const wind = windWarning(d.windPressure);
  if (wind) out.push({ field: "windPressure.value", message: wind });
  const compass = compassWarning(d.keyboard, d.compass);
  if (compass) out.push({ field: "compass.high", message: compass });
  for (const s of d.stops ?? []) {
    if (s.compass) continue; // a stop with its own compass does not follow the division's
    const top = rankTopWarning(s, d.compass);
    if (top) out.push({ field: "stops", message: `${s.name ?? "A stop"}: ${top}` });
  }
  return out;
}

/** Warnings for a stop's fields within its division. */
export function stopWarnings(stop: StopIn, divisionCompass: Compass | undefined): Warning[] {
  const top = rankTopWarning(stop, divisionCompass);
  return top ? [{ field: stop.breaks?.length ? "breaks" : "footage", message: top }] : [];
}
