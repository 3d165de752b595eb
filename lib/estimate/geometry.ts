/**
 * Pipe geometry: for every pipe its note, frequency, speaking length, diameter and mouth width.
 * `rankGeometry` gathers the constants of one rank that the estimator's per-pipe loop uses;
 * `pipesOfStop` lists the pipes of one stop in full, computed note by note (for the editor's pipe
 * table and as an independent check of the loop's aggregates).
 */
import type { Scheme, Stop } from "./scheme";
import type { Rates } from "./rates";
import { endCorrectionPerDiameter, resonatorOf, speakingLengthM, speedOfSoundMPerS, waveDivisor, type Resonator } from "./acoustics";
import { diameterMm, diameterRatioPerSemitone, mouthWidthMm, SQUARE_SIDE_PER_DIAMETER } from "./scale";
import { bodyAreaFactor, isWood } from "./materials";
import { formatFootage, frequencyHz } from "./pitch";
import { midiToNote } from "./notes";
import { planScheme, type SchemePlan } from "./pipes";
import { nominalLengthMm, sizeClassOf, type SizeClass } from "./labour";

export interface RankGeometry {
  readonly resonator: Resonator;
  readonly divisor: number;
  /** End correction, mm of length per mm of diameter. */
  readonly correctionPerDiameter: number;
  readonly areaFactor: number;
  /** Stopped and capped pipes carry a cap (metal) or stopper. */
  readonly capped: boolean;
  readonly wood: boolean;
  readonly reed: boolean;
  readonly offsetHt: number;
  readonly halvingOn: number;
  /** Diameter ratio per semitone. */
  readonly ratio: number;
  readonly mouthWidthFraction: number;
}

/** Constants of one rank's pipes. */
export function rankGeometry(stop: Stop, rates: Pick<Rates, "cutUpFraction">): RankGeometry {
  const resonator = resonatorOf(stop.construction);
  const reed = resonator === "reed-full" || resonator === "reed-half";
  return {
    resonator,
    divisor: waveDivisor(resonator),
    correctionPerDiameter: endCorrectionPerDiameter(resonator, stop.scale.mouthWidth, rates.cutUpFraction),
    areaFactor: bodyAreaFactor(stop.construction),
    capped: stop.construction === "stopped" || stop.construction === "capped",
    wood: isWood(stop.material),
    reed,
    offsetHt: stop.scale.offsetHt,
    halvingOn: stop.scale.halvingOn,
    ratio: diameterRatioPerSemitone(stop.scale.halvingOn),
    mouthWidthFraction: stop.scale.mouthWidth,
  };
}

export type PipeState = "new" | "reused" | "restored" | "prepared" | "removed" | "shared" | "borrowed";

export interface PipeDetail {
  /** Rank of the stop, from 1 (mixtures). */
  readonly rank: number;
  /** The key that plays it (Helmholtz) and its MIDI number. */
  readonly key: string;
  readonly keyMidi: number;
  /** The nearest tempered note it sounds. */
  readonly sounds: string;
  /** The footage it speaks at, as the trade writes it: "2⅔". */
  readonly footage: string;
  readonly frequencyHz: number;
  readonly speakingLengthMm: number;
  /** Diameter from the scale (for a square wooden pipe, of the circle of equal area). */
  readonly diameterMm: number;
  /** Inside side of a square wooden pipe; null for metal. */
  readonly sideMm: number | null;
  /** Null for reeds. */
  readonly mouthWidthMm: number | null;
  readonly sizeClass: SizeClass;
  readonly state: PipeState;
  readonly onOffsetChest: boolean;
}

const round = (x: number, dp: number) => Math.round(x * 10 ** dp) / 10 ** dp;

export const MSG_NO_SUCH_STOP = "no stop with this id in the scheme";

/**
 * Every pipe of one stop, lowest note first, rank by rank. Extensions list their whole compass:
 * the pipes they add ("new") and those they share with their rank ("shared"); borrowed stops list
 * the pipes they play ("borrowed"). Throws MSG_NO_SUCH_STOP for an unknown id.
 */
export function pipesOfStop(scheme: Scheme, stopId: string, rates: Pick<Rates, "cutUpFraction">, plan: SchemePlan = planScheme(scheme)): PipeDetail[] {
  const sp = plan.stops.find((s) => s.stop.id === stopId);
  if (!sp) throw new Error(MSG_NO_SUCH_STOP);
  const root = sp.rootIndex >= 0 ? plan.stops[sp.rootIndex] : sp;
  const g = rankGeometry(root.stop, rates);
  const c = speedOfSoundMPerS(scheme.tuning.temperatureC);
  const pitchHz = scheme.tuning.pitchHz;
  const out: PipeDetail[] = [];

  // Pipes this stop adds or owns, with their offset-chest flag, keyed by rank and key.
  const own = new Map<string, { shift: number; footage: string; offset: boolean }>();
  for (const seg of plan.segments) {
    if (seg.stop !== sp.index) continue;
    const rank = plan.rows[seg.row].stop === sp.index ? plan.rows[seg.row].rank : 0;
    const footage = formatFootage(seg.footage);
    for (let i = 0; i < seg.count; i++) own.set(`${rank}:${seg.fromKey + i}`, { shift: seg.shift, footage, offset: i < seg.offsetCount });
  }
  const ranks = sp.kind === "extension" || sp.kind === "borrowed" ? 1 : sp.ranks;
  for (let r = 0; r < ranks; r++) {
    for (let key = sp.lowKey; key <= sp.highKey; key++) {
      const mine = own.get(`${r}:${key}`);
      let state: PipeState;
      if (sp.kind === "extension") state = mine ? (root.kind === "prepared" ? "prepared" : "new") : "shared";
      else if (sp.kind === "borrowed") state = "borrowed";
      else if (sp.kind === "prepared") state = "prepared";
      else if (sp.kind === "removed") state = "removed";
      else state = sp.work === "new" ? "new" : sp.work === "restored" ? "restored" : "reused";
      const shift = mine ? mine.shift : sp.shift;
      const sounding = key + shift;
      const f = frequencyHz(sounding, pitchHz);
      const d = diameterMm(sounding - 36, g);
      const lengthMm = 1000 * speakingLengthM(f, d / 1000, g.divisor, g.correctionPerDiameter, c);
      out.push({
        rank: r + 1,
        key: midiToNote(key),
        keyMidi: key,
        sounds: midiToNote(Math.round(sounding)),
        footage: mine ? mine.footage : sp.footageText,
        frequencyHz: round(f, 3),
        speakingLengthMm: round(lengthMm, 1),
        diameterMm: round(d, 2),
        sideMm: g.wood ? round(d * SQUARE_SIDE_PER_DIAMETER, 2) : null,
        mouthWidthMm: g.reed ? null : round(mouthWidthMm(d, g.mouthWidthFraction), 2),
        sizeClass: sizeClassOf(nominalLengthMm(sounding - 36, g.divisor)),
        state,
        onOffsetChest: mine ? mine.offset : false,
      });
    }
  }
  return out;
}
