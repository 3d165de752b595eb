/**
 * The case and its front: casework by the case's surface (front, two sides and roof), new,
 * restored or retained; carved decoration and gilding by area; dummy display pipes made new in the
 * front metal; speaking front pipes polished. Without a given size the case is sized round the
 * longest and deepest chest and the tallest pipe, with a clearance each side.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { D, sizeClassIndex, sizeClasses } from "./departments";
import { ITEM, MATERIAL_LINE, type CostCentre } from "./cost-centres";
import { alloyDensityGCm3, sheetAreaMm2, sheetMassKg, sheetThicknessMm } from "./materials";
import { displayPipeDiameterMm } from "./geometry";
import { dotBySize } from "./labour";

export interface CaseFigures {
  readonly work: Scheme["case"]["work"];
  readonly widthMm: number;
  readonly depthMm: number;
  readonly heightMm: number;
  readonly sized: "given" | "from chests";
  /** Front, two sides and roof, m². */
  readonly surfaceM2: number;
  readonly timberM3: number;
  readonly dummyPipes: number;
  /** Finished weight of the dummy pipes, kg. */
  readonly dummyMetalKg: number;
  readonly frontPipes: number;
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r2 = (x: number) => Math.round(x * 100) / 100;

export function caseOf(c: Scheme["case"], chests: { readonly lengthMm: number; readonly depthMm: number }, tallestPipeMm: number, rates: Rates): CaseFigures {
  const clr = rates.case.clearanceMm;
  const sized = c.widthMm && c.depthMm && c.heightMm ? "given" : "from chests";
  const widthMm = c.widthMm ?? chests.lengthMm + 2 * clr;
  const depthMm = c.depthMm ?? chests.depthMm + 2 * clr;
  const heightMm = c.heightMm ?? rates.chest.heightMm + tallestPipeMm + 2 * clr;
  const [w, d, h] = [widthMm / 1000, depthMm / 1000, heightMm / 1000];
  const surfaceM2 = c.work === "none" ? 0 : w * h + 2 * d * h + w * d;
  const timberM3 = c.work === "new" ? (surfaceM2 * rates.case.panelMm * rates.case.framingFactor) / 1000 : 0;
  // A dummy pipe: an open normal-scale principal of its nominal length, with its foot.
  const L = c.dummyPipeLengthMm;
  const dia = displayPipeDiameterMm(L);
  const cls = sizeClassIndex(L);
  const sheet = sheetThicknessMm(dia, c.frontMetal, rates.pipeMetal);
  const each = sheetMassKg(sheetAreaMm2(1, 0, dia, L, rates.pipeMetal.footLengthMm[sizeClasses[cls]]), sheet, alloyDensityGCm3(rates.alloys[c.frontMetal]));
  return {
    work: c.work, widthMm: r1(widthMm), depthMm: r1(depthMm), heightMm: r1(heightMm), sized,
    surfaceM2: r2(surfaceM2), timberM3: Math.round(timberM3 * 1000) / 1000,
    dummyPipes: c.dummyPipes, dummyMetalKg: r1(each * c.dummyPipes), frontPipes: c.speakingFrontPipes + c.dummyPipes,
  };
}

/** Books the case into `centre`: casework and its erection, decoration, gilding, dummy pipes and front polishing; case design goes to `design`. */
export function bookCase(f: CaseFigures, c: Scheme["case"], rates: Rates, centre: CostCentre, design: CostCentre): void {
  const n = rates.norms;
  const h = centre.hours;
  if (f.work === "new") {
    h[D.casework] += f.surfaceM2 * n.caseNewPerM2;
    h[D.erection] += f.surfaceM2 * n.caseErectPerM2;
    centre.materials[MATERIAL_LINE[c.timber]] += f.timberM3;
    design.hours[D.design] += f.surfaceM2 * n.designCasePerM2;
  } else if (f.work === "restored") h[D.casework] += f.surfaceM2 * n.caseRestoredPerM2;
  else if (f.work === "retained") h[D.casework] += f.surfaceM2 * n.caseRetainedPerM2;
  h[D.casework] += c.decorationM2 * n.decorationPerM2 + c.gildingM2 * n.gildingPerM2;
  centre.items[ITEM.gildingPerM2] += c.gildingM2;
  if (c.dummyPipes > 0) {
    const counts = new Float64Array(5);
    counts[sizeClassIndex(c.dummyPipeLengthMm)] = c.dummyPipes;
    h[D.metalPipes] += dotBySize(counts, 0, n.newMetalPipe);
    centre.materials[MATERIAL_LINE[c.frontMetal]] += f.dummyMetalKg * (1 + rates.pipeMetal.allowancePercent[c.frontMetal] / 100);
  }
  h[D.metalPipes] += f.frontPipes * n.polishFrontPipe;
}
