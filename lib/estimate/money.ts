/**
 * Money, in exact decimal arithmetic (decimal.js only, never floats): labour × rates and materials ×
 * prices per cost centre (a division, or the scheme as a whole), each rounded to the cent; lines are
 * sums of those cents; then overhead, contingency, margin and tax, each rounded to the cent. Every
 * shown total is the sum of the shown lines above it, exactly. Amounts are serialised as strings.
 */
import DecimalJs from "decimal.js";
import type { Rates } from "./rates";
import { departments, departmentLabels, type Department } from "./labour";
import { metals, woods, type Metal, type Wood } from "./materials";

/** A private Decimal: 40 significant digits, half-up rounding as on an invoice; no global configuration touched. */
const Dec = DecimalJs.clone({ precision: 40, rounding: DecimalJs.ROUND_HALF_UP });
type Dec = InstanceType<typeof Dec>;

export const materialLines = [...metals, ...woods, "cable"] as const;
export type MaterialLine = Metal | Wood | "cable";
export type MaterialUnit = "kg" | "m3" | "m";

export const materialLineLabels: Readonly<Record<MaterialLine, string>> = {
  "high-tin": "High-tin pipe metal", spotted: "Spotted metal", common: "Common metal", zinc: "Zinc", copper: "Copper",
  pine: "Pine", oak: "Oak", mahogany: "Mahogany", cable: "Action cable",
};

export function materialUnit(m: MaterialLine): MaterialUnit {
  return m === "cable" ? "m" : (woods as readonly string[]).includes(m) ? "m3" : "kg";
}

/** Quantities one cost centre takes: hours by department, materials in kg (metals), m³ (woods), m (cable). */
export interface CostCentre {
  readonly id: string;
  readonly hours: Readonly<Record<Department, number>>;
  readonly materials: Readonly<Partial<Record<MaterialLine, number>>>;
}

export interface LabourLine {
  readonly department: Department;
  readonly label: string;
  readonly hours: number;
  readonly rateAmount: string;
  readonly amount: string;
}

export interface MaterialMoneyLine {
  readonly material: MaterialLine;
  readonly label: string;
  readonly quantity: number;
  readonly unit: MaterialUnit;
  readonly priceAmount: string;
  readonly amount: string;
}

export interface PercentLine {
  readonly percent: string;
  readonly amount: string;
}

export interface Money {
  readonly currency: string;
  readonly labour: readonly LabourLine[];
  readonly labourAmount: string;
  readonly materials: readonly MaterialMoneyLine[];
  readonly materialsAmount: string;
  /** labourAmount + materialsAmount. */
  readonly subtotalAmount: string;
  /** Percent of the subtotal. */
  readonly overhead: PercentLine;
  /** Percent of subtotal + overhead. */
  readonly contingency: PercentLine;
  /** Percent of subtotal + overhead + contingency. */
  readonly margin: PercentLine;
  /** subtotal + overhead + contingency + margin. */
  readonly netAmount: string;
  readonly tax: PercentLine;
  /** net + tax. */
  readonly totalAmount: string;
  /** Direct cost (labour + materials) of each cost centre; they add up to the subtotal. */
  readonly byCentre: readonly { readonly id: string; readonly directCostAmount: string }[];
}

const cents = (d: Dec): Dec => d.toDecimalPlaces(2);
const HUNDRED = new Dec(100);

function priceOf(m: MaterialLine, rates: Rates): string {
  if (m === "cable") return rates.cablePricePerM;
  if ((woods as readonly string[]).includes(m)) return rates.woodPricePerM3[m as Wood];
  return rates.metalPricePerKg[m as Metal];
}

function percentOf(base: Dec, percent: string): PercentLine & { value: Dec } {
  const value = cents(base.times(percent).div(HUNDRED));
  return { percent, amount: value.toFixed(2), value };
}

/** Prices the cost centres with the firm's rates. Quantities should already be rounded as they are shown. */
export function priceCentres(centres: readonly CostCentre[], rates: Rates): Money {
  const centreTotals = centres.map(() => new Dec(0));
  const labour: LabourLine[] = [];
  let labourSum = new Dec(0);
  for (const dep of departments) {
    const rate = new Dec(rates.hourlyRate[dep]);
    let line = new Dec(0);
    let tenths = 0;
    for (let i = 0; i < centres.length; i++) {
      const h = centres[i].hours[dep];
      if (!h) continue;
      tenths += Math.round(h * 10);
      const a = cents(rate.times(h));
      line = line.plus(a);
      centreTotals[i] = centreTotals[i].plus(a);
    }
    if (tenths === 0) continue;
    labourSum = labourSum.plus(line);
    labour.push({ department: dep, label: departmentLabels[dep], hours: tenths / 10, rateAmount: rate.toFixed(2), amount: line.toFixed(2) });
  }
  const materials: MaterialMoneyLine[] = [];
  let materialSum = new Dec(0);
  for (const m of materialLines) {
    let line = new Dec(0);
    let quantity = new Dec(0);
    let any = false;
    const price = new Dec(priceOf(m, rates));
    for (let i = 0; i < centres.length; i++) {
      const q = centres[i].materials[m];
      if (!q) continue;
      any = true;
      quantity = quantity.plus(q);
      const a = cents(price.times(q));
      line = line.plus(a);
      centreTotals[i] = centreTotals[i].plus(a);
    }
    if (!any) continue;
    materialSum = materialSum.plus(line);
    materials.push({
      material: m, label: materialLineLabels[m], quantity: quantity.toNumber(), unit: materialUnit(m),
      priceAmount: price.toFixed(2), amount: line.toFixed(2),
    });
  }
  const subtotal = labourSum.plus(materialSum);
  const overhead = percentOf(subtotal, rates.overheadPercent);
  const contingency = percentOf(subtotal.plus(overhead.value), rates.contingencyPercent);
  const margin = percentOf(subtotal.plus(overhead.value).plus(contingency.value), rates.marginPercent);
  const net = subtotal.plus(overhead.value).plus(contingency.value).plus(margin.value);
  const tax = percentOf(net, rates.taxPercent);
  const strip = ({ percent, amount }: PercentLine): PercentLine => ({ percent, amount });
  return {
    currency: rates.currency,
    labour,
    labourAmount: labourSum.toFixed(2),
    materials,
    materialsAmount: materialSum.toFixed(2),
    subtotalAmount: subtotal.toFixed(2),
    overhead: strip(overhead),
    contingency: strip(contingency),
    margin: strip(margin),
    netAmount: net.toFixed(2),
    tax: strip(tax),
    totalAmount: net.plus(tax.value).toFixed(2),
    byCentre: centres.map((c, i) => ({ id: c.id, directCostAmount: centreTotals[i].toFixed(2) })),
  };
}

/** Exact sum of amount strings. */
export function sumAmounts(amounts: readonly string[]): string {
  let s = new Dec(0);
  for (const a of amounts) s = s.plus(a);
  return s.toFixed(2);
}

/** Exact difference b − a of two amount strings. */
export function diffAmount(a: string, b: string): string {
  return new Dec(b).minus(a).toFixed(2);
}
