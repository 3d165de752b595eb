/**
 * The work of each division, from the plan and the per-pipe sums: every stop's pipes, hours and
 * materials; the division's chests and action, winding, swell box, wiring, dismantling, erection and
 * tonal finishing — each booked in the division's own cost centres — with its chest sizes and fit,
 * its weights and its wind.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { addCounts, NO_PIPES, type PipeCounts, type SchemePlan, type StopKind } from "./pipes";
import { MATERIAL_COUNT, MATERIAL_STRIDE, type PipeAggregates } from "./pipe-aggregates";
import { bookPipeWork, finishingHours } from "./pipe-work";
import { chestFit, chestSize, type ChestFit, type ChestRow, type ChestSize } from "./chest";
import { bookChestsAndAction } from "./chests-action";
import { windingHours } from "./wind";
import { bookSwellBox, swellBoxOf, type SwellBox } from "./swell-box";
import { bookElectrics, divisionWiring, isElectricAction, type KeyFeed, type Wiring } from "./wiring";
import { bookInstallation } from "./installation";
import { costCentre, type CostCentre } from "./cost-centres";
import { D } from "./departments";
import { ALL_MATERIALS, containsLead, isWood, MATERIAL_INDEX, type Metal, type Wood } from "./materials";
import { midiToNote } from "./notes";
import { mmWaterToPa, windPressureMm } from "./units";

export interface StopEstimate {
  readonly id: string;
  readonly name: string;
  /** As the trade writes it, without the prime: "8", "2⅔". */
  readonly footage: string;
  /** Harmonic of 8′ pitch: "1", "3", "1/2". */
  readonly harmonic: string;
  readonly origin: Scheme["divisions"][number]["stops"][number]["origin"];
  readonly work: readonly Scheme["divisions"][number]["stops"][number]["work"][number][];
  readonly kind: StopKind;
  readonly ranks: number;
  /** A progressive mixture's fewest and most ranks on one key (III–V); equal to ranks otherwise. */
  readonly ranksFrom: number;
  readonly ranksTo: number;
  readonly compass: { readonly low: string; readonly high: string };
  readonly notes: number;
  readonly sourceId: string | null;
  readonly pipes: PipeCounts;
  /** Over the pipes this stop owns or adds (and prepared positions); null when it has none. */
  readonly lowestFrequencyHz: number | null;
  readonly highestFrequencyHz: number | null;
  readonly longestSpeakingLengthMm: number | null;
  readonly largestDiameterMm: number | null;
  /** Finished metal and timber of the stop's pipes standing in the organ, new and existing (weights). */
  readonly metalKg: number;
  readonly woodM3: number;
  /** Metal and timber bought for it: new pipes with their allowances, repairs of restored ones. */
  readonly metalBoughtKg: number;
  readonly woodBoughtM3: number;
  /** Hours of pipe work (making, restoring, voicing, relocating) for this stop. */
  readonly pipeHours: number;
}

export interface DivisionChest {
  readonly main: ChestSize;
  readonly offset: ChestSize | null;
  readonly space: { readonly lengthMm: number; readonly depthMm: number; readonly heightMm?: number } | null;
  /** Null when no space is given. */
  readonly fit: ChestFit | null;
}

export interface DivisionDraft {
  readonly id: string;
  readonly name: string;
  readonly keyboard: "manual" | "pedal";
  readonly compass: { readonly low: string; readonly high: string };
  readonly notes: number;
  readonly windPressureMm: number;
  readonly windPressurePa: number;
  readonly stops: readonly StopEstimate[];
  readonly pipes: PipeCounts;
  readonly metalKg: Readonly<Record<Metal, number>>;
  readonly woodM3: Readonly<Record<Wood, number>>;
  readonly woodKg: Readonly<Record<Wood, number>>;
  readonly chest: DivisionChest;
  readonly swellBox: SwellBox | null;
  readonly wiring: Wiring;
  /** Σ over its stops of the mean wind per key of their ranks, m³/s (wind.ts). */
  readonly windPerKeyM3s: number;
  readonly hasChest: boolean;
  /** Tallest pipe on its chests, mm (foot included). */
  readonly tallestPipeMm: number;
  /** Pipes standing in the organ (kg), chests (kg), and existing material taken to the workshop (kg). */
  readonly pipesKg: number;
  readonly chestsKg: number;
  readonly existingToWorkshopKg: number;
}

export interface DivisionWorkResult {
  readonly divisions: readonly DivisionDraft[];
  /** Every division's cost centres, division by division. */
  readonly centres: readonly CostCentre[];
  readonly stopControls: number;
  readonly ranks: number;
  readonly pipes: PipeCounts;
  readonly anyElectric: boolean;
  readonly anyExisting: boolean;
  readonly leadBearing: boolean;
  readonly electricStopAction: boolean;
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r3 = (x: number) => Math.round(x * 1000) / 1000;

function recordOf<K extends string>(keys: readonly K[], f: (k: K) => number): Record<K, number> {
  const o = {} as Record<K, number>;
  for (const k of keys) o[k] = f(k);
  return o;
}

/** Whether each material (by index) is timber. */
const WOOD_AT: readonly boolean[] = ALL_MATERIALS.map(isWood);

const METALS = ["high-tin", "spotted", "common", "zinc", "copper"] as const;
const WOODS = ["pine", "oak", "mahogany"] as const;

export function divisionWork(scheme: Scheme, plan: SchemePlan, agg: PipeAggregates, rates: Rates): DivisionWorkResult {
  const nDiv = plan.divisions.length;
  const norms = rates.norms;
  const combination = scheme.accessories.combination.generalPistons + scheme.accessories.combination.divisionalPistons + scheme.accessories.combination.memoryLevels > 0;

  // Chest rows per division, and the stops with a row (sliders).
  const mainRows: ChestRow[][] = [];
  const offRows: ChestRow[][] = [];
  for (let i = 0; i < nDiv; i++) {
    mainRows.push([]);
    offRows.push([]);
  }
  const chestStops = new Float64Array(nDiv);
  for (let r = 0; r < plan.rows.length; r++) {
    const dv = plan.rows[r].division;
    if (agg.rowC[r] + agg.rowCs[r] > 0) mainRows[dv].push({ cSideMm: agg.rowC[r], cSharpSideMm: agg.rowCs[r], largestFootprintMm: agg.rowFoot[r], largestDiameterMm: agg.rowDia[r] });
    if (agg.offSum[r] > 0) offRows[dv].push({ cSideMm: agg.offSum[r], cSharpSideMm: 0, largestFootprintMm: agg.offFoot[r], largestDiameterMm: agg.offDia[r] });
    if (plan.rows[r].rank === 0) chestStops[dv]++;
  }
  const duplexStops = new Float64Array(nDiv);
  for (const sp of plan.stops) if (sp.stop.duplex && (sp.kind === "own" || sp.kind === "prepared")) duplexStops[sp.divisionIndex]++;

  // Per material index, once per estimate rather than per stop: lead in the alloy, timber density.
  const leadAt = ALL_MATERIALS.map((m) => !isWood(m) && containsLead(rates.alloys[m]));
  const woodKgPerM3 = ALL_MATERIALS.map((m) => (isWood(m) ? rates.woodDensityKgM3[m] : 0));

  const meanWindPerKey = (i: number) => {
    const sp = plan.stops[i];
    return sp.notes > 0 ? agg.windM3s[i] / sp.notes : 0;
  };

  const centres: CostCentre[] = [];
  const divisions: DivisionDraft[] = [];
  let anyElectric = false;
  let anyExisting = false;
  let leadBearing = false;
  let electricStopActionAny = false;
  let stopControlsTotal = 0;
  let ranksTotal = 0;
  let pipesTotal: PipeCounts = NO_PIPES;

  for (const dp of plan.divisions) {
    const division = dp.division;
    const id = division.id;
    const pipesC = costCentre(id, "pipes");
    const chestsC = costCentre(id, "chests");
    const windC = costCentre(id, "wind");
    const swellC = costCentre(id, "swellBoxes");
    const electricsC = costCentre(id, "electrics");
    const installC = costCentre(id, "installation");
    // By material index (materials.ts ALL_MATERIALS): metals kg, woods m³.
    const byMaterial = new Array<number>(MATERIAL_COUNT).fill(0);
    const stops: StopEstimate[] = [];
    let pipes: PipeCounts = NO_PIPES;
    let stopControls = 0;
    let fullStops = 0;
    let existingStops = 0;
    let derivedStops = 0;
    let windPerKey = 0;
    let existingKg = 0;
    const keyFeeds: KeyFeed[] = [];
    const borrowedFrom = new Set<number>();

    for (const si of dp.stops) {
      const sp = plan.stops[si];
      const stop = sp.stop;
      const root = sp.rootIndex >= 0 ? plan.stops[sp.rootIndex] : sp;
      let hours = 0;
      let metalBought = 0;
      let woodBought = 0;
      if (sp.kind === "own" || sp.kind === "extension") {
        const booked = bookPipeWork({ stop: si, work: sp.work, condition: stop.condition }, agg.bodyCounts, agg.pitchCounts, agg.materials, rates, pipesC, installC);
        hours = booked.hours;
        metalBought = booked.metalBoughtKg;
        woodBought = booked.woodBoughtM3;
      }
      let kg = 0;
      let m3 = 0;
      for (let m = 0; m < MATERIAL_COUNT; m++) {
        const old = agg.materials[si * MATERIAL_STRIDE + MATERIAL_COUNT + m];
        const v = agg.materials[si * MATERIAL_STRIDE + m] + old;
        if (v === 0) continue;
        byMaterial[m] += v;
        if (WOOD_AT[m]) m3 += v;
        else {
          kg += v;
          if (leadAt[m]) leadBearing = true;
        }
        // Existing pipes go to the workshop and back: their weight is carried, their material not bought.
        if (old > 0) existingKg += WOOD_AT[m] ? old * woodKgPerM3[m] : old;
      }
      if (sp.kind !== "removed") stopControls++;
      if (sp.kind === "own") {
        ranksTotal += sp.ranks;
        if (stop.origin === "new" || sp.work.includes("restored") || sp.work.includes("revoiced")) fullStops++;
        else existingStops++;
      }
      if (sp.kind === "own" || sp.kind === "extension" || sp.kind === "borrowed") windPerKey += meanWindPerKey(sp.kind === "own" ? si : root.index);
      if (sp.kind === "extension" || sp.kind === "borrowed") {
        derivedStops++;
        const srcDiv = root.divisionIndex;
        // A unit rank on a direct-electric chest is switched in its relay: no extra key run unless another division plays it.
        const viaRelay = scheme.divisions[srcDiv].chest === "direct-electric";
        if (sp.kind === "extension" && (!viaRelay || srcDiv !== dp.index)) keyFeeds.push({ keys: sp.notes, runM: scheme.divisions[srcDiv].consoleDistanceM });
        else if (sp.kind === "borrowed" && srcDiv !== dp.index) borrowedFrom.add(srcDiv);
      }
      // Existing pipe metal may hold lead whatever is recorded.
      if ((sp.pipes.reused > 0 || sp.pipes.restored > 0 || sp.pipes.removed > 0) && !isWood(root.stop.material)) leadBearing = true;
      pipes = addCounts(pipes, sp.pipes);
      const has = agg.maxLengthMm[si] > 0;
      stops.push({
        id: stop.id, name: stop.name, footage: sp.footageText,
        harmonic: sp.harmonic.den === 1 ? String(sp.harmonic.num) : `${sp.harmonic.num}/${sp.harmonic.den}`,
        origin: stop.origin, work: sp.work, kind: sp.kind, ranks: sp.ranks, ranksFrom: sp.ranksFrom, ranksTo: sp.ranksTo,
        compass: { low: midiToNote(sp.lowKey), high: midiToNote(sp.highKey) }, notes: sp.notes,
        sourceId: stop.source && (sp.kind === "extension" || sp.kind === "borrowed") ? stop.source : null,
        pipes: sp.pipes,
        lowestFrequencyHz: has ? r3(agg.minFrequencyHz[si]) : null,
        highestFrequencyHz: has ? r3(agg.maxFrequencyHz[si]) : null,
        longestSpeakingLengthMm: has ? r1(agg.maxLengthMm[si]) : null,
        largestDiameterMm: has ? r1(agg.maxDiameterMm[si]) : null,
        metalKg: r1(kg), woodM3: r3(m3), metalBoughtKg: r1(metalBought), woodBoughtM3: r3(woodBought), pipeHours: r1(hours),
      });
    }

    for (const src of borrowedFrom) keyFeeds.push({ keys: dp.notes, runM: scheme.divisions[src].consoleDistanceM });
    const hasChest = mainRows[dp.index].length > 0 || offRows[dp.index].length > 0;
    if (hasChest) keyFeeds.unshift({ keys: dp.notes, runM: division.consoleDistanceM });
    const directElectric = division.chest === "direct-electric";
    const electric = isElectricAction(division.action) || directElectric;
    if (electric) anyElectric = true;
    const electricStopAction = electric || combination;
    if (electricStopAction && hasChest) electricStopActionAny = true;

    const main = chestSize(mainRows[dp.index], division.chestLayout, division.passageBoard, rates.chest);
    const offset = offRows[dp.index].length ? chestSize(offRows[dp.index], "chromatic", false, rates.chest) : null;

    if (hasChest) {
      bookChestsAndAction(
        {
          chest: division.chest, action: division.action, chestWork: division.chestWork, notes: dp.notes, chestStops: chestStops[dp.index],
          positions: agg.positions[dp.index], offsetPipes: agg.offsetPipes[dp.index], duplexStops: duplexStops[dp.index], electricStopAction,
        },
        rates,
        chestsC,
      );
      windC.hours[D.chestAction] += windingHours(scheme.wind, norms);
    }
    const tallest = agg.tallestMm[dp.index];
    let swellBox: SwellBox | null = null;
    if (division.enclosed && hasChest) {
      swellBox = swellBoxOf(division, main, tallest, rates);
      bookSwellBox(swellBox, division.chestWork, rates, swellC);
    }
    const wiring = divisionWiring(
      {
        electric, directElectric, consoleDistanceM: division.consoleDistanceM, keyFeeds, stopControls,
        pipeMagnets: agg.positions[dp.index], offsetPipes: agg.offsetPipes[dp.index],
      },
      rates.wiring,
    );
    bookElectrics(wiring, stopControls, true, rates, electricsC);
    const existingPipes = pipes.reused + pipes.restored + pipes.removed;
    const existing = existingPipes > 0 || division.chestWork !== "new";
    if (existing) anyExisting = true;
    bookInstallation({ existingPipes, existing, pipesInOrgan: pipes.total, hasChest }, rates, installC);
    pipesC.hours[D.tonalFinishing] += finishingHours({ fullStops, existingStops, derivedStops, pipes: pipes.total }, norms);

    stopControlsTotal += stopControls;
    pipesTotal = addCounts(pipesTotal, pipes);
    const windMm = windPressureMm(division.windPressure);
    const metalKg = recordOf(METALS, (m) => byMaterial[MATERIAL_INDEX[m]]);
    const woodRounded = recordOf(WOODS, (w) => r3(byMaterial[MATERIAL_INDEX[w]]));
    const pipesKg = METALS.reduce((s, m) => s + metalKg[m], 0) + WOODS.reduce((s, w) => s + byMaterial[MATERIAL_INDEX[w]] * rates.woodDensityKgM3[w], 0);
    const chestArea = (main.lengthMm * main.depthMm + (offset ? offset.lengthMm * offset.depthMm : 0)) / 1e6;
    const chestsKg = chestArea * rates.chest.kgPerM2;
    if (division.chestWork === "restored") existingKg += chestsKg;
    divisions.push({
      id, name: division.name, keyboard: division.keyboard,
      compass: { low: division.compass.low, high: division.compass.high }, notes: dp.notes,
      windPressureMm: r1(windMm), windPressurePa: Math.round(mmWaterToPa(windMm)),
      stops, pipes,
      metalKg: recordOf(METALS, (m) => r1(metalKg[m])), woodM3: woodRounded,
      woodKg: recordOf(WOODS, (w) => r1(woodRounded[w] * rates.woodDensityKgM3[w])),
      chest: { main, offset, space: division.space ?? null, fit: division.space ? chestFit(main, division.space) : null },
      swellBox, wiring, windPerKeyM3s: windPerKey, hasChest, tallestPipeMm: r1(tallest),
      pipesKg, chestsKg, existingToWorkshopKg: existingKg,
    });
    centres.push(pipesC, chestsC, windC, swellC, electricsC, installC);
  }
  return {
    divisions, centres, stopControls: stopControlsTotal, ranks: ranksTotal, pipes: pipesTotal, anyElectric, anyExisting, leadBearing,
    electricStopAction: electricStopActionAny,
  };
}
