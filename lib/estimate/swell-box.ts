/**
 * Swell boxes: walls and shutters sized from the box, with their mechanism. The box's inside size is
 * the division's own, or sized round its main chest (plus a clearance each side) and its tallest
 * pipe (plus the chest's height under the feet and a clearance above). Shutters fill the front.
 */
import type { Division } from "./scheme";
import type { Rates } from "./rates";
import { D } from "./departments";
import { ITEM, MATERIAL_LINE, scaleCentre, type CostCentre } from "./cost-centres";

export interface SwellBox {
  readonly widthMm: number;
  readonly depthMm: number;
  readonly heightMm: number;
  /** Walls (back, sides, roof, floor) and shutter front, m². */
  readonly wallM2: number;
  readonly shutterM2: number;
  readonly mechanism: "mechanical" | "electric";
  /** Whether the size was given or worked out from the chest. */
  readonly sized: "given" | "from chest";
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r2 = (x: number) => Math.round(x * 100) / 100;

export function swellBoxOf(division: Division, chest: { readonly lengthMm: number; readonly depthMm: number }, tallestPipeMm: number, rates: Rates): SwellBox {
  const n = rates.swellBox;
  const given = division.swellBox;
  const widthMm = given?.widthMm ?? chest.lengthMm + 2 * n.clearanceMm;
  const depthMm = given?.depthMm ?? chest.depthMm + 2 * n.clearanceMm;
  const heightMm = given?.heightMm ?? rates.chest.heightMm + tallestPipeMm + n.clearanceMm;
  const [w, d, h] = [widthMm / 1000, depthMm / 1000, heightMm / 1000];
  return {
    widthMm: r1(widthMm), depthMm: r1(depthMm), heightMm: r1(heightMm),
    wallM2: r2(2 * w * d + 2 * d * h + w * h), shutterM2: r2(w * h),
    mechanism: division.action === "mechanical" ? "mechanical" : "electric",
    sized: given ? "given" : "from chest",
  };
}

/** Books a swell box into its division's "swellBoxes" centre; a restored or retained chest takes its box along at the chest's share. */
export function bookSwellBox(box: SwellBox, chestWork: Division["chestWork"], rates: Rates, centre: CostCentre): void {
  const n = rates.norms;
  centre.hours[D.casework] += box.wallM2 * n.swellBoxPerM2 + box.shutterM2 * n.shuttersPerM2;
  if (box.mechanism === "mechanical") centre.hours[D.chestAction] += n.swellMechanismMechanical;
  else {
    centre.hours[D.chestAction] += n.swellMechanismElectric;
    centre.items[ITEM.swellMotor] += 1;
  }
  centre.materials[MATERIAL_LINE[rates.swellBox.timber]] += ((box.wallM2 + box.shutterM2) * rates.swellBox.wallMm) / 1000;
  if (chestWork !== "new") scaleCentre(centre, chestWork === "restored" ? n.chestRestoredFactor : n.chestRetainedFactor);
}
