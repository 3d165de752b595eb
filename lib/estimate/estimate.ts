/**
 * The estimate of a whole scheme: one entry point, estimateScheme(scheme, rates). It plans the ranks
 * (pipes.ts), runs one tight loop over every pipe for geometry, metal, wood, size classes and chest
 * rows (no object per pipe, no decimal arithmetic), then works out per stop, per division and per
 * scheme the labour, wiring, money and programme from the aggregates.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { planScheme, addCounts, NO_PIPES, type PipeCounts, type SchemePlan, type StopKind } from "./pipes";
import { rankGeometry, type RankGeometry } from "./geometry";
import { MIN_LENGTH_FRACTION, speedOfSoundMPerS } from "./acoustics";
import { NORMAL_SCALE_8FT_C_MM, SQUARE_SIDE_PER_DIAMETER } from "./scale";
import { alloyDensityGCm3, containsLead, isWood, metals, woods, type Metal, type Wood } from "./materials";
import {
  addConsoleHours, addDivisionHours, addPipeHours, addTransportHours, bySizeArray, DEPARTMENT_COUNT, hoursRecord, nominalLengthMm, sizeClassIndex,
  sumHours, totalHours, type Department,
} from "./labour";
import { chestFit, chestSize, type ChestFit, type ChestRow, type ChestSize } from "./chest";
import { consoleWiring, divisionWiring, isElectricAction, type KeyFeed, type Wiring } from "./wiring";
import { priceCentres, type CostCentre, type MaterialLine, type Money } from "./money";
import { planProgramme, type Programme } from "./programme";
import { cautionsFor, type Caution } from "./cautions";
import { midiToNote } from "./notes";
import { mmWaterToPa, windPressureMm } from "./units";

export interface StopEstimate {
  readonly id: string;
  readonly name: string;
  /** As the trade writes it, without the prime: "8", "2⅔". */
  readonly footage: string;
  /** Harmonic of 8′ pitch: "1", "3", "1/2". */
  readonly harmonic: string;
  readonly treatment: Scheme["divisions"][number]["stops"][number]["treatment"];
  readonly kind: StopKind;
  readonly ranks: number;
  readonly compass: { readonly low: string; readonly high: string };
  readonly notes: number;
  readonly sourceId: string | null;
  readonly pipes: PipeCounts;
  /** Over the pipes this stop owns or adds (and prepared positions); null when it has none. */
  readonly lowestFrequencyHz: number | null;
  readonly highestFrequencyHz: number | null;
  readonly longestSpeakingLengthMm: number | null;
  readonly largestDiameterMm: number | null;
  readonly metalKg: number;
  readonly woodM3: number;
  /** Hours of pipe work (making, restoring, voicing) for this stop. */
  readonly pipeHours: number;
}

export interface DivisionChest {
  readonly main: ChestSize;
  readonly offset: ChestSize | null;
  readonly space: { readonly lengthMm: number; readonly depthMm: number } | null;
  /** Null when no space is given. */
  readonly fit: ChestFit | null;
}

export interface DivisionEstimate {
  readonly id: string;
  readonly name: string;
  readonly keyboard: "manual" | "pedal";
  readonly compass: { readonly low: string; readonly high: string };
  readonly notes: number;
  readonly windPressureMm: number;
  readonly windPressurePa: number;
  readonly stops: readonly StopEstimate[];
  readonly pipes: PipeCounts;
  readonly hours: Readonly<Record<Department, number>>;
  readonly hoursTotal: number;
  readonly metalKg: Readonly<Record<Metal, number>>;
  readonly woodM3: Readonly<Record<Wood, number>>;
  readonly woodKg: Readonly<Record<Wood, number>>;
  readonly chest: DivisionChest;
  readonly wiring: Wiring;
  /** Labour and materials of this division before overheads (a share of money.subtotalAmount). */
  readonly directCostAmount: string;
}

export interface Estimate {
  readonly schemeName: string;
  readonly tuning: {
    readonly pitchHz: number;
    readonly temperatureC: number;
    readonly mutations: "tempered" | "pure";
    readonly speedOfSoundMPerS: number;
  };
  readonly ratesProvenance: string;
  readonly divisions: readonly DivisionEstimate[];
  /** Work not tied to one division: console, its internal wiring, transport. */
  readonly schemeWide: {
    readonly hours: Readonly<Record<Department, number>>;
    readonly hoursTotal: number;
    readonly wiring: Wiring;
    readonly directCostAmount: string;
  };
  readonly totals: {
    /** Stop controls (prepared included, removed excluded). */
    readonly stops: number;
    /** Ranks of pipes standing in the finished organ. */
    readonly ranks: number;
    readonly pipes: PipeCounts;
    readonly hours: Readonly<Record<Department, number>>;
    readonly hoursTotal: number;
    readonly metalKg: Readonly<Record<Metal, number>>;
    readonly metalTotalKg: number;
    readonly woodM3: Readonly<Record<Wood, number>>;
    readonly woodKg: Readonly<Record<Wood, number>>;
    readonly wiring: Wiring & { readonly conductorLengthKm: number };
  };
  readonly money: Money;
  readonly programme: Programme;
  readonly cautions: readonly Caution[];
}

/** Thrown by estimateScheme for a scheme that parseScheme would have refused; carries the messages. */
export class SchemeError extends Error {
  constructor(readonly messages: readonly string[]) {
    super(`The scheme is not consistent: ${messages.join("; ")}`);
    this.name = "SchemeError";
  }
}

// Local copies: imported bindings can compile to property reads, which the per-pipe loop should not pay for.
const SEMITONE = Math.pow(2, 1 / 12);
const MIN_LF = MIN_LENGTH_FRACTION;
const SQ_SIDE = SQUARE_SIDE_PER_DIAMETER;
const D_8FT_C = NORMAL_SCALE_8FT_C_MM;
const PI = Math.PI;

const r1 = (x: number) => Math.round(x * 10) / 10;
const r3 = (x: number) => Math.round(x * 1000) / 1000;

/** Sums rounded figures exactly, in units of 10^-dp. */
function sumRounded(values: readonly number[], dp: number): number {
  const k = 10 ** dp;
  let s = 0;
  for (const v of values) s += Math.round(v * k);
  return s / k;
}

function recordOf<K extends string>(keys: readonly K[], f: (k: K) => number): Record<K, number> {
  const o = {} as Record<K, number>;
  for (const k of keys) o[k] = f(k);
  return o;
}

/**
 * Estimates a scheme with the firm's rates and norms (demo-rates.ts holds invented defaults).
 * Pure and deterministic. The scheme must be one parseScheme accepted; otherwise throws SchemeError.
 */
export function estimateScheme(scheme: Scheme, rates: Rates, plan: SchemePlan = planScheme(scheme)): Estimate {
  if (plan.messages.length) throw new SchemeError(plan.messages);
  const nStops = plan.stops.length;
  const nRows = plan.rows.length;
  const nDiv = plan.divisions.length;
  const c = speedOfSoundMPerS(scheme.tuning.temperatureC);
  const pitchHz = scheme.tuning.pitchHz;

  const geoms: (RankGeometry | undefined)[] = new Array(nStops);
  for (const s of plan.stops) if (s.rootIndex === s.index) geoms[s.index] = rankGeometry(s.stop, rates);

  const thick = bySizeArray(rates.sheetThicknessMm);
  const board = bySizeArray(rates.boardThicknessMm);
  const footLen = bySizeArray(rates.footLengthMm);
  const clrMin = rates.chest.clearanceMinMm;
  const clrFrac = rates.chest.clearanceFractionOfDiameter;

  const classCounts = new Float64Array(nStops * 5);
  const metalVol = new Float64Array(nStops); // mm³ of sheet
  const woodVol = new Float64Array(nStops); // mm³ of board
  const maxLen = new Float64Array(nStops);
  const maxDia = new Float64Array(nStops);
  const minF = new Float64Array(nStops).fill(Infinity);
  const maxF = new Float64Array(nStops);
  const rowC = new Float64Array(nRows);
  const rowCs = new Float64Array(nRows);
  const rowFoot = new Float64Array(nRows);
  const rowDia = new Float64Array(nRows);
  const offSum = new Float64Array(nRows);
  const offFoot = new Float64Array(nRows);
  const offDia = new Float64Array(nRows);
  const magnets = new Float64Array(nDiv);
  const offsetPipes = new Float64Array(nDiv);

  // The per-pipe loop: frequency and diameter step by constant ratios along a segment, so no pow per pipe.
  for (const seg of plan.segments) {
    const g = geoms[seg.rank]!;
    const s0 = seg.fromKey - 36 + seg.shift;
    let f = pitchHz * Math.pow(2, (s0 - 33) / 12); // MIDI 69 is 33 semitones above 8′ C
    let d = D_8FT_C * Math.pow(2, -(s0 - g.offsetHt) / (g.halvingOn - 1));
    const cOverDiv = (1000 * c) / g.divisor;
    const k = g.correctionPerDiameter;
    const wood = g.wood;
    const areaF = g.areaFactor;
    const cap = g.capped ? 0.25 * PI : 0;
    const made = seg.made;
    const ratio = g.ratio;
    const st = seg.stop;
    const base = st * 5;
    const row = seg.row;
    const offN = seg.offsetCount;
    // The trade's size class goes by the pipe's nominal length (8′ C open = 8 ft; stopped half that),
    // not the corrected speaking length, so a pipe keeps its class whatever the pitch or temperature.
    let tradeLen = nominalLengthMm(s0, g.divisor);
    let chan = seg.fromKey + seg.channelOffset;
    let mv = 0;
    let wv = 0;
    let ml = 0;
    let md = 0;
    const f0 = f;
    for (let i = 0; i < seg.count; i++, chan++) {
      const nominal = cOverDiv / f;
      let len = nominal - k * d;
      if (len < nominal * MIN_LF) len = nominal * MIN_LF;
      const cls = sizeClassIndex(tradeLen);
      let foot: number;
      if (wood) {
        const t = board[cls];
        const side = d * SQ_SIDE;
        foot = side + 2 * t;
        if (made) wv += 4 * t * (side + t) * len * areaF;
      } else {
        foot = d;
        if (made) mv += (PI * d * (len * areaF + 0.5 * footLen[cls]) + cap * d * d) * thick[cls];
      }
      if (made) classCounts[base + cls]++;
      const w = foot + clrMin + clrFrac * d;
      if (i < offN) {
        offSum[row] += w;
        if (foot > offFoot[row]) [offFoot[row], offDia[row]] = [foot, d];
      } else {
        if ((chan & 1) === 0) rowC[row] += w;
        else rowCs[row] += w;
        if (foot > rowFoot[row]) [rowFoot[row], rowDia[row]] = [foot, d];
      }
      if (len > ml) ml = len;
      if (d > md) md = d;
      f *= SEMITONE;
      tradeLen /= SEMITONE;
      d *= ratio;
    }
    metalVol[st] += mv;
    woodVol[st] += wv;
    if (ml > maxLen[st]) maxLen[st] = ml;
    if (md > maxDia[st]) maxDia[st] = md;
    if (f0 < minF[st]) minF[st] = f0;
    const fTop = f / SEMITONE;
    if (fTop > maxF[st]) maxF[st] = fTop;
    const div = plan.rows[row].division;
    magnets[div] += seg.count - offN;
    offsetPipes[div] += offN;
  }

  const density: Record<Metal, number> = recordOf(metals, (m) => alloyDensityGCm3(rates.alloys[m]));
  const norms = rates.norms;

  // Chest rows per division.
  const mainRows: ChestRow[][] = Array.from({ length: nDiv }, () => []);
  const offRows: ChestRow[][] = Array.from({ length: nDiv }, () => []);
  const chestStops = new Float64Array(nDiv);
  for (let r = 0; r < nRows; r++) {
    const dv = plan.rows[r].division;
    if (rowC[r] + rowCs[r] > 0) mainRows[dv].push({ cSideMm: rowC[r], cSharpSideMm: rowCs[r], largestFootprintMm: rowFoot[r], largestDiameterMm: rowDia[r] });
    if (offSum[r] > 0) offRows[dv].push({ cSideMm: offSum[r], cSharpSideMm: 0, largestFootprintMm: offFoot[r], largestDiameterMm: offDia[r] });
    if (plan.rows[r].rank === 0) chestStops[dv]++;
  }

  const stopHours = new Float64Array(DEPARTMENT_COUNT);
  const divisionEstimates: Omit<DivisionEstimate, "directCostAmount">[] = [];
  const centres: CostCentre[] = [];
  let anyElectric = false;
  let anyExisting = false;
  let leadBearing = false;
  let stopControlsTotal = 0;
  let ranksTotal = 0;
  let pipesTotal: PipeCounts = NO_PIPES;

  for (const dp of plan.divisions) {
    const division = dp.division;
    const hours = new Float64Array(DEPARTMENT_COUNT);
    const metalKg = recordOf(metals, () => 0);
    const woodM3 = recordOf(woods, () => 0);
    const stops: StopEstimate[] = [];
    let pipes: PipeCounts = NO_PIPES;
    let stopControls = 0;
    let newStops = 0;
    let existingStops = 0;
    let derivedStops = 0;
    const keyFeeds: KeyFeed[] = [];
    const borrowedFrom = new Set<number>();
    for (const si of dp.stops) {
      const sp = plan.stops[si];
      const stop = sp.stop;
      const root = plan.stops[sp.rootIndex] ?? sp;
      const g = geoms[root.index];
      stopHours.fill(0);
      if (g && (sp.kind === "own" || sp.kind === "extension")) {
        addPipeHours(sp.kind === "own" ? sp.work! : "new", g.wood, g.reed, classCounts, si * 5, norms, stopHours);
      }
      let pipeHours = 0;
      for (let i = 0; i < DEPARTMENT_COUNT; i++) {
        hours[i] += stopHours[i];
        pipeHours += stopHours[i];
      }
      const material = root.stop.material;
      let kg = 0;
      let m3 = 0;
      if (g && !g.wood && metalVol[si] > 0) {
        kg = metalVol[si] * density[material as Metal] * 1e-6;
        metalKg[material as Metal] += kg;
        if (containsLead(rates.alloys[material as Metal])) leadBearing = true;
      }
      if (g && g.wood && woodVol[si] > 0) {
        m3 = woodVol[si] * 1e-9;
        woodM3[material as Wood] += m3;
      }
      if (sp.kind !== "removed") stopControls++;
      if (sp.kind === "own") {
        ranksTotal += sp.ranks;
        if (sp.work === "new" || sp.work === "restored" || sp.work === "revoiced") newStops++;
        else existingStops++;
      }
      if (sp.kind === "extension" || sp.kind === "borrowed") {
        derivedStops++;
        const srcDiv = plan.stops[sp.rootIndex].divisionIndex;
        // A unit rank on a direct-electric chest is switched in its relay: no extra key run unless another division plays it.
        const viaRelay = scheme.divisions[srcDiv].chest === "direct-electric";
        if (sp.kind === "extension" && (!viaRelay || srcDiv !== dp.index)) {
          keyFeeds.push({ keys: sp.notes, runM: scheme.divisions[srcDiv].consoleDistanceM });
        } else if (sp.kind === "borrowed" && srcDiv !== dp.index) borrowedFrom.add(srcDiv);
      }
      if ((sp.pipes.reused > 0 || sp.pipes.restored > 0 || sp.pipes.removed > 0) && !isWood(root.stop.material)) leadBearing = true;
      pipes = addCounts(pipes, sp.pipes);
      const has = maxLen[si] > 0;
      stops.push({
        id: stop.id, name: stop.name, footage: sp.footageText,
        harmonic: sp.harmonic.den === 1 ? String(sp.harmonic.num) : `${sp.harmonic.num}/${sp.harmonic.den}`,
        treatment: stop.treatment, kind: sp.kind, ranks: sp.ranks,
        compass: { low: midiToNote(sp.lowKey), high: midiToNote(sp.highKey) }, notes: sp.notes,
        sourceId: stop.source && (sp.kind === "extension" || sp.kind === "borrowed") ? stop.source : null,
        pipes: sp.pipes,
        lowestFrequencyHz: has ? r3(minF[si]) : null,
        highestFrequencyHz: has ? r3(maxF[si]) : null,
        longestSpeakingLengthMm: has ? r1(maxLen[si]) : null,
        largestDiameterMm: has ? r1(maxDia[si]) : null,
        metalKg: r1(kg), woodM3: r3(m3), pipeHours: r1(pipeHours),
      });
    }
    for (const src of borrowedFrom) keyFeeds.push({ keys: dp.notes, runM: scheme.divisions[src].consoleDistanceM });
    const hasChest = mainRows[dp.index].length > 0 || offRows[dp.index].length > 0;
    if (hasChest) keyFeeds.unshift({ keys: dp.notes, runM: division.consoleDistanceM });
    const directElectric = division.chest === "direct-electric";
    const electric = isElectricAction(division.action) || directElectric;
    if (electric) anyElectric = true;
    const wiring = divisionWiring(
      {
        electric, directElectric, consoleDistanceM: division.consoleDistanceM, keyFeeds, stopControls,
        pipeMagnets: magnets[dp.index], offsetPipes: offsetPipes[dp.index],
      },
      rates.wiring,
    );
    const existingPipes = pipes.reused + pipes.restored + pipes.removed;
    const existing = existingPipes > 0 || division.chestWork !== "new";
    if (existing) anyExisting = true;
    addDivisionHours(
      {
        notes: dp.notes, hasChest, chestWork: division.chestWork, chestStops: chestStops[dp.index],
        pipeMagnets: directElectric ? magnets[dp.index] : 0, offsetPipes: offsetPipes[dp.index], enclosed: division.enclosed,
        conductors: wiring.conductors, electric, stopControls, pipesInOrgan: pipes.total, existingPipes, existing,
        newStops, existingStops, derivedStops,
      },
      norms,
      hours,
    );
    stopControlsTotal += stopControls;
    pipesTotal = addCounts(pipesTotal, pipes);
    const main = chestSize(mainRows[dp.index], division.chestLayout, division.passageBoard, rates.chest);
    const offset = offRows[dp.index].length ? chestSize(offRows[dp.index], "chromatic", false, rates.chest) : null;
    const hoursRec = hoursRecord(hours);
    const metalRounded = recordOf(metals, (m) => r1(metalKg[m]));
    const woodRounded = recordOf(woods, (w) => r3(woodM3[w]));
    const windMm = windPressureMm(division.windPressure);
    divisionEstimates.push({
      id: division.id, name: division.name, keyboard: division.keyboard,
      compass: { low: division.compass.low, high: division.compass.high }, notes: dp.notes,
      windPressureMm: r1(windMm), windPressurePa: Math.round(mmWaterToPa(windMm)),
      stops, pipes, hours: hoursRec, hoursTotal: totalHours(hoursRec),
      metalKg: metalRounded, woodM3: woodRounded,
      woodKg: recordOf(woods, (w) => r1(woodRounded[w] * rates.woodDensityKgM3[w])),
      chest: { main, offset, space: division.space ?? null, fit: division.space ? chestFit(main, division.space) : null },
      wiring,
    });
    const materials: Partial<Record<MaterialLine, number>> = { ...metalRounded, ...woodRounded, cable: wiring.conductorLengthM };
    centres.push({ id: division.id, hours: hoursRec, materials });
  }

  // Scheme-wide: console and its internal wiring, transport.
  const acc = scheme.accessories;
  const wide = new Float64Array(DEPARTMENT_COUNT);
  const couplerKeys = acc.couplers.reduce((s, cp) => s + (plan.divisions.find((d) => d.division.id === cp.from)?.notes ?? 0), 0);
  const pistons = acc.combination.generalPistons + acc.combination.divisionalPistons * nDiv;
  const consoleW = consoleWiring({ electric: anyElectric, couplerKeys, stopControls: stopControlsTotal, pistons }, rates.wiring);
  addConsoleHours(
    {
      work: acc.consoleWork, keyboards: nDiv, stopControls: stopControlsTotal, couplers: acc.couplers.length,
      tremulants: acc.tremulants.length, pistons, memoryLevels: acc.combination.memoryLevels, conductors: consoleW.conductors,
      electric: anyElectric,
    },
    norms,
    wide,
  );
  addTransportHours(pipesTotal.total, anyExisting, norms, wide);
  const wideHours = hoursRecord(wide);
  centres.push({ id: "scheme", hours: wideHours, materials: { cable: consoleW.conductorLengthM } });

  const money = priceCentres(centres, rates);
  const divisions: DivisionEstimate[] = divisionEstimates.map((d, i) => ({ ...d, directCostAmount: money.byCentre[i].directCostAmount }));
  const allHours = sumHours([...divisions.map((d) => d.hours), wideHours]);
  const metalTotals = recordOf(metals, (m) => sumRounded(divisions.map((d) => d.metalKg[m]), 1));
  const woodTotals = recordOf(woods, (w) => sumRounded(divisions.map((d) => d.woodM3[w]), 3));
  const conductors = divisions.reduce((s, d) => s + d.wiring.conductors, consoleW.conductors);
  const conductorLengthM = divisions.reduce((s, d) => s + d.wiring.conductorLengthM, consoleW.conductorLengthM);

  return {
    schemeName: scheme.name,
    tuning: { pitchHz, temperatureC: scheme.tuning.temperatureC, mutations: scheme.tuning.mutations, speedOfSoundMPerS: r3(c) },
    ratesProvenance: rates.provenance,
    divisions,
    schemeWide: { hours: wideHours, hoursTotal: totalHours(wideHours), wiring: consoleW, directCostAmount: money.byCentre[nDiv].directCostAmount },
    totals: {
      stops: stopControlsTotal,
      ranks: ranksTotal,
      pipes: pipesTotal,
      hours: allHours,
      hoursTotal: totalHours(allHours),
      metalKg: metalTotals,
      metalTotalKg: sumRounded(metals.map((m) => metalTotals[m]), 1),
      woodM3: woodTotals,
      woodKg: recordOf(woods, (w) => sumRounded(divisions.map((d) => d.woodKg[w]), 1)),
      wiring: { conductors, conductorLengthM, conductorLengthKm: Math.round(conductorLengthM / 10) / 100 },
    },
    money,
    programme: planProgramme(allHours, rates.programme, scheme.programme),
    cautions: cautionsFor({ leadBearing, electric: anyElectric, siteWork: true }),
  };
}
