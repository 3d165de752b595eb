/**
 * Pipe work of one stop: making new pipes, and for existing pipes the work the scheme gives —
 * kept as they are (cleaned), restored (by the survey's findings), revoiced (flue or reed),
 * relocated, re-scaled — with the material bought: new metal with its casting and offcut
 * allowance, new timber with its sawing allowance, and metal to repair restored pipes.
 * Existing metal and timber are not bought (their weight still counts for loads).
 */
import type { Finding, PipeWork } from "./scheme";
import type { Norms, Rates } from "./rates";
import { D } from "./departments";
import { dotBySize, sumBySize } from "./labour";
import { ALL_MATERIALS } from "./materials";
import { BODY_STRIDE, KINDS, MATERIAL_COUNT, MATERIAL_STRIDE, METAL_FLUE, METAL_REED, PITCH_STRIDE, WOOD_FLUE, WOOD_REED } from "./pipe-aggregates";
import { MATERIAL_LINE, type CostCentre } from "./cost-centres";

/** Which findings apply to which part: metal bodies and resonators, wooden pipes and resonators, reed parts. */
const METAL_FINDINGS: readonly Finding[] = ["feet-collapsing", "split-seams", "mouths-damaged", "tops-torn"];
const METAL_RESONATOR_FINDINGS: readonly Finding[] = ["split-seams", "tops-torn", "resonators-damaged"];
const WOOD_FINDINGS: readonly Finding[] = ["wood-split", "woodworm"];
const WOOD_RESONATOR_FINDINGS: readonly Finding[] = ["wood-split", "woodworm", "resonators-damaged"];
const REED_PART_FINDINGS: readonly Finding[] = ["tongues-worn"];
const FINDINGS_BY_KIND = [METAL_FINDINGS, WOOD_FINDINGS, METAL_RESONATOR_FINDINGS, WOOD_RESONATOR_FINDINGS];

export interface StopPipeWork {
  readonly stop: number;
  readonly work: readonly PipeWork[];
  readonly condition: readonly Finding[];
}

/** What one stop's pipe work booked: its hours, and the metal (kg) and timber (m³) bought for it. */
export interface PipeWorkBooked {
  readonly hours: number;
  readonly metalBoughtKg: number;
  readonly woodBoughtM3: number;
}

/**
 * Books one stop's pipe hours into `pipes` (making, restoring, voicing) and `installation`
 * (relocating), and its bought metal and timber into `pipes`.
 */
export function bookPipeWork(
  s: StopPipeWork, bodyCounts: Float64Array, pitchCounts: Float64Array, finished: Float64Array,
  rates: Rates, pipes: CostCentre, installation: CostCentre,
): PipeWorkBooked {
  const n = rates.norms;
  // Called once per stop: no closures, and each kind of work looked up once.
  const restored = s.work.includes("restored");
  const rescaled = s.work.includes("rescaled");
  let booked = 0;

  // New pipes: the body or resonator by its size, reed parts and voicing by pitch.
  const newBody = s.stop * BODY_STRIDE;
  for (let kind = 0; kind < KINDS; kind++) {
    const at = newBody + kind * 5;
    if (sumBySize(bodyCounts, at) === 0) continue;
    const norm = kind === METAL_FLUE ? n.newMetalPipe : kind === METAL_REED ? n.reedResonator : n.newWoodPipe;
    booked += book(pipes, shopOf(kind), dotBySize(bodyCounts, at, norm));
  }
  const newPitch = s.stop * PITCH_STRIDE;
  booked += book(pipes, D.voicing, dotBySize(pitchCounts, newPitch, n.voiceNewFluePipe));
  booked += book(pipes, D.reeds, dotBySize(pitchCounts, newPitch + 5, n.reedParts));
  booked += book(pipes, D.voicing, dotBySize(pitchCounts, newPitch + 5, n.voiceNewReedPipe));

  // Existing pipes: the work on them.
  const oldBody = s.stop * BODY_STRIDE + KINDS * 5;
  const oldPitch = s.stop * PITCH_STRIDE + 10;
  const flues = sumBySize(pitchCounts, oldPitch);
  const reeds = sumBySize(pitchCounts, oldPitch + 5);
  if (flues + reeds > 0) {
    for (let kind = 0; kind < KINDS; kind++) {
      const at = oldBody + kind * 5;
      if (sumBySize(bodyCounts, at) === 0) continue;
      const wood = kind === WOOD_FLUE || kind === WOOD_REED;
      const shop = shopOf(kind);
      if (restored) {
        booked += book(pipes, shop, dotBySize(bodyCounts, at, wood ? n.restoreWoodPipe : n.restoreMetalPipe));
        for (const f of s.condition) if (FINDINGS_BY_KIND[kind].includes(f)) booked += book(pipes, shop, dotBySize(bodyCounts, at, n.finding[f]));
      } else {
        booked += book(pipes, shop, dotBySize(bodyCounts, at, n.cleanPipe));
      }
      if (rescaled) booked += book(pipes, shop, dotBySize(bodyCounts, at, n.rescalePipe));
    }
    if (restored) {
      booked += book(pipes, D.reeds, dotBySize(pitchCounts, oldPitch + 5, n.restoreReedParts));
      for (const f of s.condition) if (REED_PART_FINDINGS.includes(f)) booked += book(pipes, D.reeds, dotBySize(pitchCounts, oldPitch + 5, n.finding[f]));
      booked += book(pipes, D.voicing, (flues + reeds) * n.regulateRestoredPipe);
    }
    if (s.work.includes("revoiced")) booked += book(pipes, D.voicing, flues * n.revoiceFluePipe + reeds * n.revoiceReedPipe);
    if (s.work.includes("relocated")) booked += book(installation, D.erection, (flues + reeds) * n.relocatePipe);
  }

  // Material bought: new metal and timber with their allowances; a share of restored pipes' metal for repairs.
  const restoredShare = restored ? rates.pipeMetal.repairPercent / 100 : 0;
  let metalBoughtKg = 0;
  let woodBoughtM3 = 0;
  for (let m = 0; m < MATERIAL_COUNT; m++) {
    const fresh = finished[s.stop * MATERIAL_STRIDE + m];
    const old = finished[s.stop * MATERIAL_STRIDE + MATERIAL_COUNT + m];
    if (fresh === 0 && old === 0) continue;
    const material = ALL_MATERIALS[m];
    const wood = m >= 5;
    const allowance = wood ? rates.woodPipes.allowancePercent : rates.pipeMetal.allowancePercent[material as "spotted"];
    const bought = fresh * (1 + allowance / 100) + (wood ? 0 : old * restoredShare);
    pipes.materials[LINE_OF_MATERIAL[m]] += bought;
    if (wood) woodBoughtM3 += bought;
    else metalBoughtKg += bought;
  }
  return { hours: booked, metalBoughtKg, woodBoughtM3 };
}

/** Books hours into a centre's department; returns them, for the stop's own total. */
function book(centre: CostCentre, dep: number, hours: number): number {
  if (hours !== 0) centre.hours[dep] += hours;
  return hours;
}

function shopOf(kind: number): number {
  return kind === WOOD_FLUE || kind === WOOD_REED ? D.woodPipes : D.metalPipes;
}

/** Each material's line in a centre (cost-centres.ts), by material index. */
const LINE_OF_MATERIAL: readonly number[] = ALL_MATERIALS.map((m) => MATERIAL_LINE[m]);

/** Tonal finishing on site, per stop and per pipe. */
export function finishingHours(w: { readonly fullStops: number; readonly existingStops: number; readonly derivedStops: number; readonly pipes: number }, n: Norms): number {
  return w.fullStops * n.finishPerNewStop + w.existingStops * n.finishPerExistingStop + w.derivedStops * n.finishPerDerivedStop + w.pipes * n.finishPerPipe;
}
