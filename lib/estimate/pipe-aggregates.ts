/**
 * The per-pipe stage: one tight loop over every pipe of the plan, summing what later stages need —
 * pipes per size class, finished metal and timber per stop, longest and widest pipes, wind, and the
 * chest rows. Frequency, diameter, sheet and board thickness and wind step by constant ratios along
 * a run of pipes, so there is no pow per pipe, no object per pipe and no decimal arithmetic; a run
 * goes in pieces of one size class (bounds found by logarithms) and one chest, so the loop tests neither.
 * `pipesOfStop` (geometry.ts) computes the same pipes one by one from the plain formulas; the tests
 * hold the two equal.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { MIN_LENGTH_FRACTION, speedOfSoundMPerS } from "./acoustics";
import { NORMAL_SCALE_8FT_C_MM, SQUARE_SIDE_PER_DIAMETER } from "./scale";
import { REFERENCE_DIAMETER_MM, REFERENCE_SIDE_MM, MATERIAL_INDEX, ALL_MATERIALS } from "./materials";
import { FT8_MM, pipesLongerThanBound, sizeClassIndex, sizeClasses, splitBySizeClassFrom } from "./departments";
import { formGeometry, jetSpeedMPerS, REFERENCE_MOUTH_MM, type FormGeometry } from "./geometry";
import { EXISTING, PREPARED, type SchemePlan } from "./pipes";
import { windPressureMm } from "./units";
import { rowWidthMm } from "./chest";

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
const INV_SEMITONE = 1 / SEMITONE;
/** 2^(k/12) for whole semitones k in −120 … 120 by table (tempered pitches), by pow otherwise (pure mutations). */
const EXP2_TABLE = Float64Array.from({ length: 241 }, (_, i) => Math.pow(2, (i - 120) / 12));
function exp2Semitones(k: number): number {
  return Number.isInteger(k) && k >= -120 && k <= 120 ? EXP2_TABLE[k + 120] : Math.pow(2, k / 12);
}
const EXP2_33 = Math.pow(2, 33 / 12);
/**
 * 2^(−k/16) for whole k in −256 … 256 by table, by pow otherwise: a scale's reference diameter halves
 * every 16 semitones of deviation. Filled by the same pow, so equal to the last bit; a pow per form
 * cost about 2 % of an estimate.
 */
const EXP2_NEG_SIXTEENTHS = Float64Array.from({ length: 513 }, (_, i) => Math.pow(2, -(i - 256) / 16));
function exp2NegSixteenths(k: number): number {
  return Number.isInteger(k) && k >= -256 && k <= 256 ? EXP2_NEG_SIXTEENTHS[k + 256] : Math.pow(2, -k / 16);
}
const MIN_LF = MIN_LENGTH_FRACTION;
const SQ_SIDE = SQUARE_SIDE_PER_DIAMETER;
const PI = Math.PI;
const classOf = sizeClassIndex;
const FT8 = FT8_MM;
const SEMITONES_8FT = 12 * Math.log2(FT8_MM);
const D_8FT_C = NORMAL_SCALE_8FT_C_MM;
const LN_SQ_PER_REF_SIDE = Math.log(SQUARE_SIDE_PER_DIAMETER / REFERENCE_SIDE_MM);
const LN_REF_DIAMETER = Math.log(REFERENCE_DIAMETER_MM);
const MATERIAL_INDEX_ = MATERIAL_INDEX;
const EXISTING_ = EXISTING;
const PREPARED_ = PREPARED;
const jetSpeed = jetSpeedMPerS;
/** The chest rule's width of one pipe along its row (chest.ts, pipeRowWidthMm: the rule the drawing uses). */
const rowWidth = rowWidthMm;

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

  // All the sums in one zeroed buffer: one allocation per estimate instead of twenty-one.
  const buffer = new Float64Array(nStops * (BODY_STRIDE + PITCH_STRIDE + MATERIAL_STRIDE + 6) + nRows * 7 + nDiv * 3);
  let used = 0;
  const take = (length: number) => buffer.subarray(used, (used += length));
  const out: PipeAggregates = {
    forms,
    speedOfSoundMPerS: c,
    bodyCounts: take(nStops * BODY_STRIDE),
    pitchCounts: take(nStops * PITCH_STRIDE),
    materials: take(nStops * MATERIAL_STRIDE),
    maxLengthMm: take(nStops),
    maxDiameterMm: take(nStops),
    minFrequencyHz: take(nStops).fill(Infinity),
    maxFrequencyHz: take(nStops),
    windM3s: take(nStops),
    windPipes: take(nStops),
    rowC: take(nRows),
    rowCs: take(nRows),
    rowFoot: take(nRows),
    rowDia: take(nRows),
    offSum: take(nRows),
    offFoot: take(nRows),
    offDia: take(nRows),
    positions: take(nDiv),
    offsetPipes: take(nDiv),
    tallestMm: take(nDiv),
  };
  const { bodyCounts, pitchCounts, materials, rowC, rowCs, rowFoot, rowDia, offSum, offFoot, offDia } = out;

  const segments = plan.segments;
  const rowDivision = plan.rows.map((r) => r.division);
  const windExp = w.windwayExponent;
  const jet = pressures.map((p) => jetSpeed(p, w.airDensityKgM3));
  const { maxLengthMm, maxDiameterMm, minFrequencyHz, maxFrequencyHz, windM3s, windPipes, positions, offsetPipes, tallestMm } = out;

  // Per form, the values at its reference note and their logarithmic steps: a run of pipes then costs
  // three exponentials to start, and a multiply per pipe for each quantity. Powers are taken as
  // exponentials of logarithms (Math.pow costs several times Math.exp), from ln D at the reference.
  const runs = plan.forms.map((form, i) => {
    const g = forms[i];
    // By pow (or its table), so a whole number of halvings gives the exact diameter (77.75 mm is half of 155.5 mm, and rounds up).
    const dRef = D_8FT_C * exp2NegSixteenths(g.referenceSemitones - g.deviationHt);
    const lnDRef = Math.log(dRef);
    const lnRatio = -Math.LN2 / (g.halvingOn - 1); // ln of diameterRatioPerSemitone
    const tExp = g.wood ? wp.boardExponent : pm.thicknessExponent;
    const tRef = g.wood
      ? wp.boardAt8ftCMm * Math.exp(wp.boardExponent * (lnDRef + LN_SQ_PER_REF_SIDE))
      : pm.thicknessAt8ftCMm * g.thicknessFactor * Math.exp(pm.thicknessExponent * (lnDRef - LN_REF_DIAMETER));
    // Wind ∝ W^(1+e): a reed's by the mouth of a normal-width round pipe of its diameter.
    const mouthPerD = g.wood && !form.reed ? SQ_SIDE : (form.reed ? 0.25 : g.mouthWidthFraction) * PI;
    return {
      g, dRef, lnRatio, tRef, tExp, tRatio: Math.exp(lnRatio * tExp), tMin: g.wood ? wp.minimumBoardMm : pm.minimumThicknessMm,
      qRef: g.windPerMouth * flowPerPa * Math.exp((1 + windExp) * (Math.log(mouthPerD) + lnDRef)), qRatio: Math.exp(lnRatio * (1 + windExp)),
      lengthSemitones: 12 * Math.log2(g.lengthFraction),
      kind: form.reed ? (g.wood ? WOOD_REED : METAL_REED) : g.wood ? WOOD_FLUE : METAL_FLUE,
      material: MATERIAL_INDEX_[form.material], reed: form.reed,
    };
  });

  // Module constants as locals: the per-pipe loop reads them without a context load each time.
  const minLf = MIN_LF;
  const sqSide = SQ_SIDE;
  const pi = PI;
  const invSemitone = INV_SEMITONE;
  // The chest rule's clearances, read once rather than from the norms object per pipe.
  const clearMin = chestNorms.clearanceMinMm;
  const clearFrac = chestNorms.clearanceFractionOfDiameter;
  for (let sIndex = 0; sIndex < segments.length; sIndex++) {
    const seg = segments[sIndex];
    const run = runs[seg.form];
    const g = run.g;
    const st = seg.stop;
    const row = seg.row;
    const div = rowDivision[row];
    const made = seg.status !== PREPARED_;
    const status = seg.status === EXISTING_ ? 1 : 0;
    const wood = g.wood;
    const bodyBase = st * BODY_STRIDE + status * KINDS * 5 + run.kind * 5;
    const pitchBase = st * PITCH_STRIDE + status * 10 + (run.reed ? 5 : 0);
    const s0 = seg.fromKey - 36 + seg.shift;
    const octaves = exp2Semitones(-s0); // 2^(−s0/12)
    const f0 = pitchHz / (octaves * EXP2_33); // 440 · 2^((s0 − 33)/12): MIDI 69 is 33 semitones above 8′ C
    const fromRef = s0 - g.referenceSemitones;
    const ratio = g.ratio;
    let d = run.dRef * Math.exp(fromRef * run.lnRatio);
    let t = run.tRef * Math.exp(fromRef * run.lnRatio * run.tExp);
    let q = made ? run.qRef * Math.exp(fromRef * run.lnRatio * (1 + windExp)) * jet[div] : 0;
    const tRatio = run.tRatio;
    const tMin = run.tMin;
    const qRatio = run.qRatio;
    const k = g.correctionPerDiameter;
    const areaF = g.areaFactor;
    // The trade's size class goes by nominal length (8′ C open = 8 ft), not by the corrected speaking length.
    // As 12·log2(mm) for the class bounds: 12·log2(8 ft) − s0, plus 12·log2 of the form's length fraction.
    const pitchTop = SEMITONES_8FT - s0;
    const bodyTop = pitchTop + run.lengthSemitones;
    let nominal = (1000 * c) / g.divisor / f0; // c / (divisor · f) in mm
    const solid = g.solidPerA3;
    const capH = g.capHeightPerA;
    const top = g.topPerDSq;
    const n = seg.count;
    const offN = seg.offsetCount;
    let odd = (seg.fromKey + seg.channelOffset) & 1;
    let vol = 0;
    let wind = 0;
    let cSide = 0;
    let csSide = 0;
    let offSide = 0;
    const d0 = d;
    const len0 = Math.max(nominal - k * d, nominal * MIN_LF);
    const foot0 = wood ? d * SQ_SIDE + 2 * (t > tMin ? t : tMin) : d;
    let footAtMain = 0;
    let diaAtMain = 0;
    // Size classes change at most four times along a run: the pipes go in pieces of one class
    // (one foot length), counted by logarithms as splitBySizeClass does, not pipe by pipe.
    // An open flue's body is as long as its pitch: its pipes by pitch are the same pieces, not split again.
    const pitchAsBody = made && run.lengthSemitones === 0;
    let i = 0;
    for (let cls = 0; cls <= 4; cls++) {
      const end = cls < 4 ? pipesLongerThanBound(bodyTop, cls, n) : n;
      if (end <= i) continue;
      if (made) bodyCounts[bodyBase + cls] += end - i;
      if (pitchAsBody) pitchCounts[pitchBase + cls] += end - i;
      const halfFoot = 0.5 * foot[cls];
      // Stretches on the offset chest and on the main chest, so no pipe asks which chest it stands on.
      while (i < end) {
        const onOffset = i < offN;
        const stretchEnd = onOffset && offN < end ? offN : end;
        if (i === offN) {
          footAtMain = wood ? d * SQ_SIDE + 2 * (t > tMin ? t : tMin) : d;
          diaAtMain = d;
        }
        for (; i < stretchEnd; i++) {
          let len = nominal - k * d;
          const shortest = nominal * minLf;
          if (len < shortest) len = shortest;
          const th = t > tMin ? t : tMin;
          let footprint: number;
          if (wood) {
            const a = d * sqSide;
            footprint = a + 2 * th;
            vol += 4 * th * (a + th) * len * areaF + solid * a * a * a + capH * a * (a + 2 * th) * th;
          } else {
            footprint = d;
            vol += (pi * d * (len * areaF + halfFoot) + top * d * d) * th;
          }
          const wdt = rowWidth(footprint, d, clearMin, clearFrac);
          if (onOffset) offSide += wdt;
          else if (odd === 0) cSide += wdt;
          else csSide += wdt;
          wind += q;
          odd ^= 1;
          nominal *= invSemitone;
          d *= ratio;
          t *= tRatio;
          q *= qRatio;
        }
      }
    }
    if (made && !pitchAsBody) splitBySizeClassFrom(pitchTop, n, pitchCounts, pitchBase);
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
      // Metal: mm³ × g/cm³ × 1e-6 = kg; timber: mm³ × 1e-9 = m³.
      materials[st * MATERIAL_STRIDE + status * MATERIALS + run.material] += wood ? vol * 1e-9 : vol * g.densityGCm3 * 1e-6;
      windM3s[st] += wind;
      windPipes[st] += n;
    }
    if (len0 > maxLengthMm[st]) maxLengthMm[st] = len0;
    if (d0 > maxDiameterMm[st]) maxDiameterMm[st] = d0;
    if (f0 < minFrequencyHz[st]) minFrequencyHz[st] = f0;
    const fTop = f0 * exp2Semitones(n - 1);
    if (fTop > maxFrequencyHz[st]) maxFrequencyHz[st] = fTop;
    positions[div] += n - offN;
    offsetPipes[div] += offN;
    const tallest = wood ? len0 : len0 + foot[classOf(FT8 * g.lengthFraction * octaves)];
    if (tallest > tallestMm[div]) tallestMm[div] = tallest;
  }
  return out;
}

export { MATERIALS as MATERIAL_COUNT };
