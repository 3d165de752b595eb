/**
 * The per-pipe stage: one tight loop over every pipe of the plan, summing what later stages need —
 * pipes per size class, finished metal and timber per stop, longest and widest pipes, wind, and the
 * chest rows. Frequency, diameter, sheet and board thickness and wind step by constant ratios along
 * a run of pipes, so there is no pow per pipe, no object per pipe and no decimal arithmetic.
 * `pipesOfStop` (geometry.ts) computes the same pipes one by one from the plain formulas; the tests
 * hold the two equal.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { MIN_LENGTH_FRACTION, speedOfSoundMPerS } from "./acoustics";
import { NORMAL_SCALE_8FT_C_MM, SQUARE_SIDE_PER_DIAMETER } from "./scale";
import { REFERENCE_DIAMETER_MM, REFERENCE_SIDE_MM, MATERIAL_INDEX, ALL_MATERIALS } from "./materials";
import { FT8_MM, SIZE_CLASS_BOUNDS_MM, sizeClassIndex, sizeClasses } from "./departments";
import { formGeometry, jetSpeedMPerS, REFERENCE_MOUTH_MM, type FormGeometry } from "./geometry";
import { EXISTING, PREPARED, type SchemePlan } from "./pipes";
import { windPressureMm } from "./units";
import { pipeRowWidthMm } from "./chest";

/** Kinds of pipe for the norms: metal flue, wooden flue, reed with a metal resonator, reed with a wooden one. */
export const METAL_FLUE = 0;
export const WOOD_FLUE = 1;
export const METAL_REED = 2;
export const WOOD_REED = 3;
export const KINDS = 4;
/** Per stop: [status new|existing][kind][size class] pipes, by the body's (or resonator's) nominal length. */
export const BODY_STRIDE = 2 * KINDS * 5;
/** Per stop: [status][flue|reed][size class] pipes, by the pitch's nominal length (voicing, reed parts). */
export const PITCH_STRIDE = 2 * 2 * 5;
const MATERIALS = ALL_MATERIALS.length;
/** Per stop: [status][material] finished kg (metals) or m³ (woods). */
export const MATERIAL_STRIDE = 2 * MATERIALS;

export interface PipeAggregates {
  readonly forms: readonly FormGeometry[];
  readonly speedOfSoundMPerS: number;
  readonly bodyCounts: Float64Array;
  readonly pitchCounts: Float64Array;
  readonly materials: Float64Array;
  /** Over the pipes a stop owns or adds, prepared positions included; 0 / Infinity when it has none. */
  readonly maxLengthMm: Float64Array;
  readonly maxDiameterMm: Float64Array;
  readonly minFrequencyHz: Float64Array;
  readonly maxFrequencyHz: Float64Array;
  /** Σ wind (m³/s) of the pipes a stop owns or adds, existing and new. */
  readonly windM3s: Float64Array;
  readonly windPipes: Float64Array;
  /** Chest rows: summed widths on the C and C♯ sides, largest footprint and its diameter; the same for offset chests. */
  readonly rowC: Float64Array;
  readonly rowCs: Float64Array;
  readonly rowFoot: Float64Array;
  readonly rowDia: Float64Array;
  readonly offSum: Float64Array;
  readonly offFoot: Float64Array;
  readonly offDia: Float64Array;
  /** Per division: pipe positions on the main chest, pipes on offset chests, the tallest pipe standing there (mm, foot included). */
  readonly positions: Float64Array;
  readonly offsetPipes: Float64Array;
  readonly tallestMm: Float64Array;
}

// Local copies: imported bindings can compile to property reads, which the per-pipe loop should not pay for.
const SEMITONE = Math.pow(2, 1 / 12);
const MIN_LF = MIN_LENGTH_FRACTION;
const SQ_SIDE = SQUARE_SIDE_PER_DIAMETER;
const PI = Math.PI;
const BOUNDS = SIZE_CLASS_BOUNDS_MM;
const classOf = sizeClassIndex;
const FT8 = FT8_MM;
const D_8FT_C = NORMAL_SCALE_8FT_C_MM;
const REF_SIDE = REFERENCE_SIDE_MM;
const REF_DIAMETER = REFERENCE_DIAMETER_MM;
const MATERIAL_INDEX_ = MATERIAL_INDEX;
const EXISTING_ = EXISTING;
const PREPARED_ = PREPARED;
const jetSpeed = jetSpeedMPerS;
/** The chest rule's width of one pipe along its row (chest.ts), the same function the drawing uses. */
const rowWidth = pipeRowWidthMm;

export function aggregatePipes(scheme: Scheme, plan: SchemePlan, rates: Rates): PipeAggregates {
  const nStops = plan.stops.length;
  const nRows = plan.rows.length;
  const nDiv = plan.divisions.length;
  const c = speedOfSoundMPerS(scheme.tuning.temperatureC);
  const pitchHz = scheme.tuning.pitchHz;
  const forms = plan.forms.map((f) => formGeometry(f, plan.stops[f.stop].stop, rates));

  const pm = rates.pipeMetal;
  const wp = rates.woodPipes;
  const foot = sizeClasses.map((k) => pm.footLengthMm[k]);
  const chestNorms = rates.chest;
  const w = rates.wind;
  const flowPerPa = w.dischargeCoefficient * w.windwayAt8ftCMm * 1e-6 / Math.pow(REFERENCE_MOUTH_MM, w.windwayExponent);
  const pressures = plan.divisions.map((d) => windPressureMm(d.division.windPressure));

  const out: PipeAggregates = {
    forms,
    speedOfSoundMPerS: c,
    bodyCounts: new Float64Array(nStops * BODY_STRIDE),
    pitchCounts: new Float64Array(nStops * PITCH_STRIDE),
    materials: new Float64Array(nStops * MATERIAL_STRIDE),
    maxLengthMm: new Float64Array(nStops),
    maxDiameterMm: new Float64Array(nStops),
    minFrequencyHz: new Float64Array(nStops).fill(Infinity),
    maxFrequencyHz: new Float64Array(nStops),
    windM3s: new Float64Array(nStops),
    windPipes: new Float64Array(nStops),
    rowC: new Float64Array(nRows),
    rowCs: new Float64Array(nRows),
    rowFoot: new Float64Array(nRows),
    rowDia: new Float64Array(nRows),
    offSum: new Float64Array(nRows),
    offFoot: new Float64Array(nRows),
    offDia: new Float64Array(nRows),
    positions: new Float64Array(nDiv),
    offsetPipes: new Float64Array(nDiv),
    tallestMm: new Float64Array(nDiv),
  };
  const { bodyCounts, pitchCounts, materials, rowC, rowCs, rowFoot, rowDia, offSum, offFoot, offDia } = out;

  const segments = plan.segments;
  const rowDivision = plan.rows.map((r) => r.division);
  const windExp = w.windwayExponent;
  const air = w.airDensityKgM3;
  const thickness8 = pm.thicknessAt8ftCMm;
  const thicknessExp = pm.thicknessExponent;
  const minSheet = pm.minimumThicknessMm;
  const board8 = wp.boardAt8ftCMm;
  const boardExp = wp.boardExponent;
  const minBoard = wp.minimumBoardMm;
  const { maxLengthMm, maxDiameterMm, minFrequencyHz, maxFrequencyHz, windM3s, windPipes, positions, offsetPipes, tallestMm } = out;

  for (let sIndex = 0; sIndex < segments.length; sIndex++) {
    const seg = segments[sIndex];
    const g = forms[seg.form];
    const form = plan.forms[seg.form];
    const st = seg.stop;
    const row = seg.row;
    const div = rowDivision[row];
    const made = seg.status !== PREPARED_;
    const status = seg.status === EXISTING_ ? 1 : 0;
    const reed = form.reed;
    const wood = g.wood;
    const kind = reed ? (wood ? WOOD_REED : METAL_REED) : wood ? WOOD_FLUE : METAL_FLUE;
    const bodyBase = st * BODY_STRIDE + status * KINDS * 5 + kind * 5;
    const pitchBase = st * PITCH_STRIDE + status * 10 + (reed ? 5 : 0);
    const s0 = seg.fromKey - 36 + seg.shift;
    let f = pitchHz * Math.pow(2, (s0 - 33) / 12); // MIDI 69 is 33 semitones above 8′ C
    let d = D_8FT_C * Math.pow(2, -(g.referenceSemitones - g.deviationHt) / 16) * Math.pow(2, -(s0 - g.referenceSemitones) / (g.halvingOn - 1));
    const cOverDiv = (1000 * c) / g.divisor;
    const k = g.correctionPerDiameter;
    const ratio = g.ratio;
    const areaF = g.areaFactor;
    // The trade's size class goes by nominal length (8′ C open = 8 ft), not by the corrected speaking length.
    const octaves = Math.pow(2, -s0 / 12);
    let body = FT8 * g.lengthFraction * octaves;
    let pitch = FT8 * octaves;
    let cls = classOf(body);
    let pcls = classOf(pitch);
    // Sheet or board thickness follows the diameter (or inside width) by a power: one multiply per pipe.
    let t: number;
    let tRatio: number;
    let tMin: number;
    if (wood) {
      t = board8 * Math.pow((d * SQ_SIDE) / REF_SIDE, boardExp);
      tRatio = Math.pow(ratio, boardExp);
      tMin = minBoard;
    } else {
      t = thickness8 * g.thicknessFactor * Math.pow(d / REF_DIAMETER, thicknessExp);
      tRatio = Math.pow(ratio, thicknessExp);
      tMin = minSheet;
    }
    // Wind ∝ W^(1+e): a geometric series along the run (a reed's by the mouth of a normal-width round pipe of its diameter).
    const mouth0 = wood && !reed ? d * SQ_SIDE : (reed ? 0.25 : g.mouthWidthFraction) * PI * d;
    const q0 = made ? g.windPerMouth * flowPerPa * Math.pow(mouth0, 1 + windExp) * jetSpeed(pressures[div], air) : 0;
    const qRatio = Math.pow(ratio, 1 + windExp);
    const n = seg.count;
    const wind = q0 === 0 ? 0 : qRatio === 1 ? q0 * n : (q0 * (1 - Math.pow(qRatio, n))) / (1 - qRatio);
    const solid = g.solidPerA3;
    const capH = g.capHeightPerA;
    const top = g.topPerDSq;
    const offN = seg.offsetCount;
    let chanOdd = (seg.fromKey + seg.channelOffset) & 1;
    let vol = 0;
    let cSide = 0;
    let csSide = 0;
    let offSide = 0;
    const f0 = f;
    const d0 = d;
    const len0 = Math.max(cOverDiv / f - k * d, (cOverDiv / f) * MIN_LF);
    let foot0 = 0;
    let footAtMain = 0;
    let diaAtMain = 0;
    for (let i = 0; i < n; i++) {
      const nominal = cOverDiv / f;
      let len = nominal - k * d;
      if (len < nominal * MIN_LF) len = nominal * MIN_LF;
      const th = t > tMin ? t : tMin;
      let footprint: number;
      if (wood) {
        const a = d * SQ_SIDE;
        footprint = a + 2 * th;
        vol += 4 * th * (a + th) * len * areaF + solid * a * a * a + capH * a * (a + 2 * th) * th;
      } else {
        footprint = d;
        vol += (PI * d * (len * areaF + 0.5 * foot[cls]) + top * d * d) * th;
      }
      if (i === 0) foot0 = footprint;
      const wdt = rowWidth(footprint, d, chestNorms);
      if (i < offN) offSide += wdt;
      else {
        if (i === offN) [footAtMain, diaAtMain] = [footprint, d];
        if (chanOdd === 0) cSide += wdt;
        else csSide += wdt;
      }
      if (made) {
        bodyCounts[bodyBase + cls]++;
        pitchCounts[pitchBase + pcls]++;
      }
      chanOdd ^= 1;
      f *= SEMITONE;
      d *= ratio;
      t *= tRatio;
      body /= SEMITONE;
      pitch /= SEMITONE;
      while (cls < 4 && body <= BOUNDS[cls]) cls++;
      while (pcls < 4 && pitch <= BOUNDS[pcls]) pcls++;
    }
    // Pipes get smaller up a run, so its first pipe (on each chest) is its largest and longest.
    rowC[row] += cSide;
    rowCs[row] += csSide;
    if (n > offN && footAtMain > rowFoot[row]) {
      rowFoot[row] = footAtMain;
      rowDia[row] = diaAtMain;
    }
    if (offN > 0) {
      offSum[row] += offSide;
      if (foot0 > offFoot[row]) {
        offFoot[row] = foot0;
        offDia[row] = d0;
      }
    }
    if (made) {
      const m = MATERIAL_INDEX_[form.material];
      // Metal: mm³ × g/cm³ × 1e-6 = kg; timber: mm³ × 1e-9 = m³.
      materials[st * MATERIAL_STRIDE + status * MATERIALS + m] += wood ? vol * 1e-9 : vol * g.densityGCm3 * 1e-6;
      windM3s[st] += wind;
      windPipes[st] += n;
    }
    if (len0 > maxLengthMm[st]) maxLengthMm[st] = len0;
    if (d0 > maxDiameterMm[st]) maxDiameterMm[st] = d0;
    if (f0 < minFrequencyHz[st]) minFrequencyHz[st] = f0;
    const fTop = f / SEMITONE;
    if (fTop > maxFrequencyHz[st]) maxFrequencyHz[st] = fTop;
    positions[div] += n - offN;
    offsetPipes[div] += offN;
    const tallest = wood ? len0 : len0 + foot[classOf(FT8 * g.lengthFraction * octaves)];
    if (tallest > tallestMm[div]) tallestMm[div] = tallest;
  }
  return out;
}

export { MATERIALS as MATERIAL_COUNT };
