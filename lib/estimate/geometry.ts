/**
 * Pipe geometry: for every pipe its note, frequency, speaking length, diameter, mouth width, sheet
 * or board, mass and wind. `formGeometry` gathers the constants of one form of a rank that the
 * per-pipe stage uses; `pipesOfStop` lists the pipes of one stop in full, computed note by note
 * with the plain formulas (for the editor's tables, the chest drawing, and as an independent check
 * of the per-pipe stage's sums).
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { endCorrectionPerDiameter, resonatorOf, speakingLengthM, speedOfSoundMPerS, waveDivisor, type Resonator } from "./acoustics";
import { diameterMm, diameterRatioPerSemitone, mouthWidthMm, normalDiameterMm, SQUARE_SIDE_PER_DIAMETER } from "./scale";
import {
  alloyDensityGCm3, bodyAreaFactor, boardThicknessMm, sheetAreaMm2, sheetMassKg, sheetThicknessMm, topSheetPerDiameterSq,
  metals, woodPartsPerSide, woodPipeVolumeM3, type Metal,
} from "./materials";
import { formatFootage, frequencyHz, parseFootage, semitonesAbove8ft } from "./pitch";
import { midiToNote } from "./notes";
import { EXISTING, NEW, planScheme, type PipeForm, type SchemePlan } from "./pipes";
import { nominalLengthMm, sizeClassIndex, sizeClasses, type SizeClass } from "./departments";
import { windPressureMm, PA_PER_MM_WATER } from "./units";

/**
 * The rules pipe geometry and the chest drawing need: chest clearances, sheet and board thickness,
 * cut-up, alloys and the flue's wind. No price, labour norm, crew or percentage among them, so a
 * reader without money:read may hold them.
 */
export type GeometryRules = {
  readonly chest: Rates["chest"];
  readonly pipeMetal: Pick<Rates["pipeMetal"], "thicknessAt8ftCMm" | "thicknessExponent" | "minimumThicknessMm" | "thicknessFactor" | "footLengthMm" | "capSkirtPerDiameter">;
  readonly woodPipes: Omit<Rates["woodPipes"], "allowancePercent">;
  readonly cutUpByFamily: Rates["cutUpByFamily"];
  readonly alloys: Rates["alloys"];
  readonly wind: WindRules;
};
type WindRules = Pick<Rates["wind"], "windwayAt8ftCMm" | "windwayExponent" | "dischargeCoefficient" | "reedFlowFactor" | "airDensityKgM3" | "chordKeys" | "chordKeysPedal">;

/** The geometry rules out of a firm's rates, and nothing else of them. */
export function geometryRules(rates: Rates): GeometryRules {
  const m = rates.pipeMetal;
  const w = rates.wind;
  const { allowancePercent: _a, ...woodPipes } = rates.woodPipes;
  return {
    chest: rates.chest,
    pipeMetal: {
      thicknessAt8ftCMm: m.thicknessAt8ftCMm, thicknessExponent: m.thicknessExponent, minimumThicknessMm: m.minimumThicknessMm,
      thicknessFactor: m.thicknessFactor, footLengthMm: m.footLengthMm, capSkirtPerDiameter: m.capSkirtPerDiameter,
    },
    woodPipes,
    cutUpByFamily: rates.cutUpByFamily,
    alloys: rates.alloys,
    wind: {
      windwayAt8ftCMm: w.windwayAt8ftCMm, windwayExponent: w.windwayExponent, dischargeCoefficient: w.dischargeCoefficient,
      reedFlowFactor: w.reedFlowFactor, airDensityKgM3: w.airDensityKgM3,
      // The full-organ chord: the drawing board's wind per rank, as wind.ts reckons a division's.
      chordKeys: w.chordKeys, chordKeysPedal: w.chordKeysPedal,
    },
  };
}

export interface FormGeometry {
  readonly resonator: Resonator;
  /** c / (divisor · f) is the uncorrected length. */
  readonly divisor: number;
  /** Nominal length as a fraction of an open pipe's (½ stopped, the resonator's fraction for reeds): size classes. */
  readonly lengthFraction: number;
  /** End correction, mm of length per mm of diameter. */
  readonly correctionPerDiameter: number;
  readonly areaFactor: number;
  /** Metal closing the top, mm² per mm² of D². */
  readonly topPerDSq: number;
  readonly wood: boolean;
  readonly reed: boolean;
  readonly deviationHt: number;
  readonly halvingOn: number;
  /** The rank's reference note (its C), semitones above 8′ C. */
  readonly referenceSemitones: number;
  /** Diameter ratio per semitone. */
  readonly ratio: number;
  readonly mouthWidthFraction: number;
  readonly cutUp: number;
  /** Metal: thickness factor of the alloy and its density (g/cm³); 0 for wood. */
  readonly thicknessFactor: number;
  readonly densityGCm3: number;
  /** Wood: block and stopper per a³, cap height per a. */
  readonly solidPerA3: number;
  readonly capHeightPerA: number;
  /** Wind through the flue per W^(1+e), m³/s per mm^(1+e) at 1 Pa^½ … (see windFlowM3s). */
  readonly windPerMouth: number;
}

/** Alloy densities of the rates, g/cm³, worked out once per set of rates. */
const densityMemo = new WeakMap<Rates["alloys"], Readonly<Record<Metal, number>>>();
function densitiesOf(rates: GeometryRules): Readonly<Record<Metal, number>> {
  let d = densityMemo.get(rates.alloys);
  if (!d) densityMemo.set(rates.alloys, (d = Object.fromEntries(metals.map((m) => [m, alloyDensityGCm3(rates.alloys[m])])) as Record<Metal, number>));
  return d;
}

/** Constants of one form of a rank, with its owner stop's scale, under the firm's rates. */
export function formGeometry(form: PipeForm, owner: Scheme["divisions"][number]["stops"][number], rates: GeometryRules): FormGeometry {
  const resonator = resonatorOf(form.construction);
  const reed = form.reed;
  const f = owner.family === "reed" ? "principal" : owner.family;
  const cutUp = owner.scale.cutUp ?? rates.cutUpByFamily[f];
  // The plan has already refused a footage that does not parse.
  const ref = semitonesAbove8ft(parseFootage(owner.footage) ?? { num: 8, den: 1 });
  const metal = !form.wood;
  const parts = form.wood ? woodPartsPerSide(form.construction, rates.woodPipes) : { solidPerA3: 0, capHeightPerA: 0 };
  return {
    resonator,
    divisor: waveDivisor(resonator, form.resonatorFraction),
    lengthFraction: resonator === "open" ? 1 : resonator === "stopped" ? 0.5 : form.resonatorFraction,
    correctionPerDiameter: endCorrectionPerDiameter(resonator, owner.scale.mouthWidth, cutUp, form.wood),
    areaFactor: bodyAreaFactor(form.construction, form.conicalResonator),
    topPerDSq: metal ? topSheetPerDiameterSq(form.construction, rates.pipeMetal.capSkirtPerDiameter) : 0,
    wood: form.wood,
    reed,
    deviationHt: owner.scale.deviationHt,
    halvingOn: owner.scale.halvingOn,
    referenceSemitones: ref,
    ratio: diameterRatioPerSemitone(owner.scale.halvingOn),
    mouthWidthFraction: owner.scale.mouthWidth,
    cutUp,
    thicknessFactor: metal ? rates.pipeMetal.thicknessFactor[form.material as Metal] : 0,
    densityGCm3: metal ? densitiesOf(rates)[form.material as Metal] : 0,
    solidPerA3: parts.solidPerA3,
    capHeightPerA: parts.capHeightPerA,
    windPerMouth: reed ? rates.wind.reedFlowFactor : 1,
  };
}

/** Mouth width in mm of a pipe of diameter D: round mouths a fraction of the circumference; wooden mouths span the inside width. */
export function formMouthWidthMm(g: FormGeometry, diameter: number): number {
  return g.wood ? diameter * SQUARE_SIDE_PER_DIAMETER : mouthWidthMm(diameter, g.mouthWidthFraction);
}

/** Mouth width of the normal-scale 8′ C (¼ · π · 155.5 mm): the reference of the windway norm. */
export const REFERENCE_MOUTH_MM = 0.25 * Math.PI * 155.5;

/**
 * Jet speed in m/s out of a flue at wind pressure p (mm water): v = √(2p/ρ), Bernoulli (textbook).
 */
export function jetSpeedMPerS(pressureMm: number, airDensityKgM3: number): number {
  return Math.sqrt((2 * pressureMm * PA_PER_MM_WATER) / airDensityKgM3);
}

/**
 * Wind a pipe takes while it speaks, m³/s — a first model: the jet through the flue, Cd · W · δ · v,
 * with W the mouth width, δ the windway depth δ₈ · (W / 122 mm)^e and v the jet speed; a reed takes
 * `reedFlowFactor` times the flue of its scale. Docs: docs/estimating-method.md, "Wind".
 */
export function windFlowM3s(mouthMm: number, pressureMm: number, perMouth: number, w: WindRules): number {
  const delta = w.windwayAt8ftCMm * Math.pow(mouthMm / REFERENCE_MOUTH_MM, w.windwayExponent);
  return perMouth * w.dischargeCoefficient * mouthMm * delta * 1e-6 * jetSpeedMPerS(pressureMm, w.airDensityKgM3);
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
  /** Size class of the body or resonator (making, restoring) and of the pitch (reed parts, voicing). */
  readonly sizeClass: SizeClass;
  readonly pitchClass: SizeClass;
  readonly material: PipeForm["material"];
  readonly construction: PipeForm["construction"];
  /** Sheet thickness (metal) or board thickness (wood), mm. */
  readonly sheetMm: number | null;
  readonly boardMm: number | null;
  /** Finished weight of metal (kg) or volume of timber (m³) of the pipe. */
  readonly metalKg: number;
  readonly woodM3: number;
  /** Footprint across the chest row: diameter, or a wooden pipe's outside width. */
  readonly footprintMm: number;
  /** Wind while it speaks, litres per second. */
  readonly windLPerS: number;
  readonly state: PipeState;
  readonly onOffsetChest: boolean;
  /** The chest channel parity side (0: C side, 1: C♯ side) on a C/C♯ chest. */
  readonly channel: number;
}

const round = (x: number, dp: number) => Math.round(x * 10 ** dp) / 10 ** dp;

export const MSG_NO_SUCH_STOP = "no stop with this id in the scheme";

/**
 * Every pipe of one stop, lowest note first, rank by rank. Extensions list their whole compass:
 * the pipes they add and those they share with their rank ("shared"); borrowed stops list the pipes
 * they play ("borrowed"). Values are computed pipe by pipe from the formulas, not from the
 * estimator's running products. Throws MSG_NO_SUCH_STOP for an unknown id.
 */
export function pipesOfStop(scheme: Scheme, stopId: string, rates: GeometryRules, plan: SchemePlan = planScheme(scheme)): PipeDetail[] {
  const sp = plan.stops.find((s) => s.stop.id === stopId);
  if (!sp) throw new Error(MSG_NO_SUCH_STOP);
  const root = sp.rootIndex >= 0 ? plan.stops[sp.rootIndex] : sp;
  const c = speedOfSoundMPerS(scheme.tuning.temperatureC);
  const pitchHz = scheme.tuning.pitchHz;
  const pressure = windPressureMm(scheme.divisions[root.divisionIndex].windPressure);
  const out: PipeDetail[] = [];
  const geometryOf = new Map<number, FormGeometry>();
  const geo = (form: number) => {
    let g = geometryOf.get(form);
    if (!g) geometryOf.set(form, (g = formGeometry(plan.forms[form], plan.stops[plan.forms[form].stop].stop, rates)));
    return g;
  };

  // Pipes this stop adds or owns, keyed by rank and key.
  type Own = { shift: number; footage: string; offset: boolean; form: number; status: number; channel: number };
  const own = new Map<string, Own>();
  for (const seg of plan.segments) {
    if (seg.stop !== sp.index) continue;
    const rank = plan.rows[seg.row].stop === sp.index ? plan.rows[seg.row].rank : 0;
    const footage = formatFootage(seg.footage);
    for (let i = 0; i < seg.count; i++)
      own.set(`${rank}:${seg.fromKey + i}`, { shift: seg.shift, footage, offset: i < seg.offsetCount, form: seg.form, status: seg.status, channel: (seg.fromKey + i + seg.channelOffset) & 1 });
  }
  const ranks = sp.kind === "extension" || sp.kind === "borrowed" ? 1 : sp.ranks;
  const restored = sp.work.includes("restored");
  for (let r = 0; r < ranks; r++) {
    for (let key = sp.lowKey; key <= sp.highKey; key++) {
      const mine = own.get(`${r}:${key}`);
      // Progressive mixtures: a rank silent on this key has no pipe.
      if (!mine && (sp.kind === "own" || sp.kind === "prepared")) continue;
      let state: PipeState;
      if (sp.kind === "borrowed") state = "borrowed";
      else if (sp.kind === "removed") state = "removed";
      else if (!mine) state = "shared";
      else if (mine.status === NEW) state = "new";
      else if (mine.status === EXISTING) state = restored ? "restored" : "reused";
      else state = "prepared";
      const shift = mine ? mine.shift : sp.shift;
      const form = mine ? mine.form : root.forms[0] ?? -1;
      if (form < 0) continue; // a removed stop: nothing to draw
      const g = geo(form);
      const sounding = key + shift;
      const semis = sounding - 36;
      const fHz = frequencyHz(sounding, pitchHz);
      const d = diameterMm(semis, g);
      const lengthMm = 1000 * speakingLengthM(fHz, d / 1000, g.divisor, g.correctionPerDiameter, c);
      const cls = sizeClassIndex(nominalLengthMm(semis, g.lengthFraction));
      const pitchCls = sizeClassIndex(nominalLengthMm(semis, 1));
      let sheet: number | null = null;
      let board: number | null = null;
      let kg = 0;
      let m3 = 0;
      let footprint = d;
      const side = d * SQUARE_SIDE_PER_DIAMETER;
      if (g.wood) {
        board = boardThicknessMm(side, rates.woodPipes);
        footprint = side + 2 * board;
        m3 = woodPipeVolumeM3(side, lengthMm, board, g.areaFactor, { solidPerA3: g.solidPerA3, capHeightPerA: g.capHeightPerA });
      } else {
        const material = plan.forms[form].material as Metal;
        sheet = sheetThicknessMm(d, material, rates.pipeMetal);
        const area = sheetAreaMm2(g.areaFactor, g.topPerDSq, d, lengthMm, rates.pipeMetal.footLengthMm[sizeClasses[cls]]);
        kg = sheetMassKg(area, sheet, g.densityGCm3);
      }
      const mouth = formMouthWidthMm(g, d);
      out.push({
        rank: r + 1,
        key: midiToNote(key),
        keyMidi: key,
        sounds: midiToNote(Math.round(sounding)),
        footage: mine ? mine.footage : sp.footageText,
        frequencyHz: round(fHz, 3),
        speakingLengthMm: round(lengthMm, 1),
        diameterMm: round(d, 2),
        sideMm: g.wood ? round(side, 2) : null,
        mouthWidthMm: g.reed ? null : round(mouth, 2),
        sizeClass: sizeClasses[cls],
        pitchClass: sizeClasses[pitchCls],
        material: plan.forms[form].material,
        construction: plan.forms[form].construction,
        sheetMm: sheet === null ? null : round(sheet, 3),
        boardMm: board === null ? null : round(board, 1),
        metalKg: kg,
        woodM3: m3,
        footprintMm: footprint,
        windLPerS: 1000 * windFlowM3s(g.reed ? mouthWidthMm(d, 0.25) : mouth, pressure, g.windPerMouth, rates.wind),
        state,
        onOffsetChest: mine ? mine.offset : false,
        channel: mine ? mine.channel : key & 1,
      });
    }
  }
  return out;
}

/** Normal-scale diameter of a display pipe of nominal length L mm (an open principal): for dummy front pipes. */
export function displayPipeDiameterMm(nominalLengthMm: number): number {
  const semis = -12 * Math.log2(nominalLengthMm / (8 * 304.8));
  return normalDiameterMm(semis);
}
