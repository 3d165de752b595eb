/**
 * Cost centres: where an estimate's quantities are booked before pricing. A centre is one part of
 * the work (a package: pipes, chests and action, wind, …) of one division, or of the organ as a
 * whole; it holds hours by department, materials by kind and bought-in items by kind. Pricing
 * (money.ts) rounds each centre's lines to the cent, so the divisions' and the packages' direct
 * costs both add up exactly to the subtotal.
 */
import { DEPARTMENT_COUNT } from "./departments";
import { metals, woods } from "./materials";
import { itemsSchema, type Items } from "./rates";

export const packages = ["pipes", "chests", "wind", "swellBoxes", "case", "console", "electrics", "installation", "site", "design"] as const;
export type PackageId = (typeof packages)[number];

export const packageLabels: Readonly<Record<PackageId, string>> = {
  pipes: "Pipes and voicing",
  chests: "Chests and action",
  wind: "Wind system",
  swellBoxes: "Swell boxes",
  case: "Case and front",
  console: "Console",
  electrics: "Electrics and cable",
  installation: "Dismantling and erection",
  site: "Site, transport and travel",
  design: "Design and management",
};

export const materialLines = [...metals, ...woods, "cable"] as const;
export type MaterialLine = (typeof materialLines)[number];
export const MATERIAL_LINE = Object.fromEntries(materialLines.map((m, i) => [m, i])) as Readonly<Record<MaterialLine, number>>;
export const MATERIAL_LINE_COUNT = materialLines.length;

export type ItemKey = keyof Items;
export const itemKeys = Object.keys(itemsSchema.shape) as ItemKey[];
export const ITEM = Object.fromEntries(itemKeys.map((k, i) => [k, i])) as Readonly<Record<ItemKey, number>>;
export const ITEM_COUNT = itemKeys.length;

export interface CostCentre {
  /** "division-id:package" or "organ:package". */
  readonly id: string;
  readonly division: string | null;
  readonly package: PackageId;
  /** Hours by department (departments.ts order). */
  readonly hours: number[];
  /** Quantities by material line: kg of metal bought, m³ of timber bought, m of conductor. */
  readonly materials: number[];
  /** Quantities of bought-in items and site costs, in each item's unit. */
  readonly items: number[];
}

export function costCentre(division: string | null, pkg: PackageId): CostCentre {
  return {
    id: `${division ?? "organ"}:${pkg}`,
    division,
    package: pkg,
    hours: new Array<number>(DEPARTMENT_COUNT).fill(0),
    materials: new Array<number>(MATERIAL_LINE_COUNT).fill(0),
    items: new Array<number>(ITEM_COUNT).fill(0),
  };
}

/** Total hours of a centre. */
export function centreHours(c: CostCentre): number {
  let h = 0;
  for (let i = 0; i < c.hours.length; i++) h += c.hours[i];
  return h;
}

/** Multiplies every quantity of a centre (work restored or retained: a share of new). */
export function scaleCentre(c: CostCentre, factor: number): void {
  for (const a of [c.hours, c.materials, c.items]) for (let i = 0; i < a.length; i++) a[i] *= factor;
}
