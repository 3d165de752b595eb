/**
 * Money, exact: each cost centre's hours × rates, materials × prices and items × prices, each
 * rounded half-up to the cent; shown lines are sums of those cents; then overhead, contingency,
 * margin and tax, each rounded to the cent. Every shown total is the sum of the shown lines above
 * it, and the divisions' and the packages' direct costs each add up to the subtotal.
 *
 * The arithmetic is on whole numbers in BigInt (amounts in ten-thousandths, quantities in their
 * shown steps), so nothing passes through binary fractions; a Decimal operation costs about a
 * microsecond and an estimate prices some hundreds of centre lines on every edit. Amounts leave as
 * decimal strings; decimal.js adds and subtracts them for comparisons.
 */
import DecimalJs from "decimal.js";
import type { Rates } from "./rates";
import { departments, departmentLabels, DEPARTMENT_COUNT, type Department } from "./departments";
import { woods, type Metal, type Wood } from "./materials";
import {
  ITEM_COUNT, itemKeys, MATERIAL_LINE_COUNT, materialLines, packageLabels, packages, type CostCentre, type ItemKey, type MaterialLine, type PackageId,
} from "./cost-centres";
import { itemsSchema } from "./rates";

/** A private Decimal: 40 significant digits, half-up rounding as on an invoice; no global configuration touched. */
const Dec = DecimalJs.clone({ precision: 40, rounding: DecimalJs.ROUND_HALF_UP });

export type MaterialUnit = "kg" | "m3" | "m";

export const materialLineLabels: Readonly<Record<MaterialLine, string>> = {
  "high-tin": "High-tin pipe metal", spotted: "Spotted metal", common: "Common metal", zinc: "Zinc", copper: "Copper",
  pine: "Pine", oak: "Oak", mahogany: "Mahogany", cable: "Action cable",
};

export function materialUnit(m: MaterialLine): MaterialUnit {
  return m === "cable" ? "m" : (woods as readonly string[]).includes(m) ? "m3" : "kg";
}

/** Item labels and units, from the rates schema's own descriptions (one place for the words). */
export const itemLabels: Readonly<Record<ItemKey, { label: string; unit: string }>> = Object.fromEntries(
  itemKeys.map((k) => {
    const meta = itemsSchema.shape[k].meta() as { title?: string; unit?: string } | undefined;
    return [k, { label: meta?.title ?? k, unit: meta?.unit ?? "" }];
  }),
) as Record<ItemKey, { label: string; unit: string }>;

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

export interface ItemLine {
  readonly item: ItemKey;
  readonly label: string;
  readonly quantity: number;
  /** What the price is per, e.g. "each", "per km driven". */
  readonly unit: string;
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
  /** Bought-in items (blower, magnets, keyboards, gold leaf …) and site costs (scaffolding, vehicles, travel). */
  readonly items: readonly ItemLine[];
  readonly itemsAmount: string;
  /** labourAmount + materialsAmount + itemsAmount. */
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
  /** Direct cost (labour + materials + items) of each cost centre; they add up to the subtotal. */
  readonly byCentre: readonly { readonly id: string; readonly division: string | null; readonly package: PackageId; readonly directCostAmount: string }[];
  /** Direct cost of each division (null: the organ as a whole), the sum of its centres; they add up to the subtotal. */
  readonly byDivision: readonly { readonly division: string | null; readonly directCostAmount: string }[];
  /** Direct cost of each part of the work, the sum of its centres; they add up to the subtotal. */
  readonly byPackage: readonly { readonly package: PackageId; readonly label: string; readonly directCostAmount: string }[];
}

/** "62.5" → 625000n (ten-thousandths). Amount strings are validated by the rates schema: digits, up to 4 decimals. */
function tenThousandths(amount: string): bigint {
  const [whole, frac = ""] = amount.split(".");
  return BigInt(whole) * 10000n + BigInt((frac + "0000").slice(0, 4));
}

/** Cents (bigint) as "1234.56". */
function centsText(c: bigint): string {
  const neg = c < 0n;
  const a = neg ? -c : c;
  const s = a.toString().padStart(3, "0");
  return `${neg ? "-" : ""}${s.slice(0, -2)}.${s.slice(-2)}`;
}

/** x / d rounded half up, for x ≥ 0. */
const divHalfUp = (x: bigint, d: bigint) => (x + d / 2n) / d;

/** A price in ten-thousandths and as shown, to the cent (half up, as decimal.js's toFixed(2) gives it). */
type Price = { readonly e4: bigint; readonly shown: string };
const priceOfAmount = (amount: string): Price => {
  const e4 = tenThousandths(amount);
  return { e4, shown: centsText(divHalfUp(e4, 100n)) };
};

/** The rates' prices parsed once per set of rates (the editor prices every edit with the same rates). */
const pricesMemo = new WeakMap<Rates, { hourly: Price[]; materials: Price[]; items: Price[] }>();
function pricesOf(rates: Rates) {
  let p = pricesMemo.get(rates);
  if (!p) {
    p = {
      hourly: departments.map((d) => priceOfAmount(rates.hourlyRate[d])),
      materials: materialLines.map((m) => priceOfAmount(priceOf(m, rates))),
      items: itemKeys.map((k) => priceOfAmount(rates.items[k])),
    };
    pricesMemo.set(rates, p);
  }
  return p;
}

/** Quantity steps as shown: hours to 0.1 h, metal to 0.1 kg, timber to 0.001 m³, cable to 1 m, items to 0.01. */
const HOUR_STEPS = 10;
const ITEM_STEPS = 100;
function materialSteps(m: MaterialLine): number {
  return m === "cable" ? 1 : (woods as readonly string[]).includes(m) ? 1000 : 10;
}

function priceOf(m: MaterialLine, rates: Rates): string {
  if (m === "cable") return rates.cablePricePerM;
  if ((woods as readonly string[]).includes(m)) return rates.woodPricePerM3[m as Wood];
  return rates.metalPricePerKg[m as Metal];
}

function percentOf(base: bigint, percent: string): { line: PercentLine; cents: bigint } {
  // base (cents) × percent (ten-thousandths of a per cent) / 1 000 000 = cents.
  const cents = divHalfUp(base * tenThousandths(percent), 1_000_000n);
  return { line: { percent, amount: centsText(cents) }, cents };
}

/** Rounds hours, as shown, to tenths. */
export function roundHours(h: number): number {
  return Math.round(h * 10) / 10;
}

/**
 * Prices the cost centres with the firm's rates. Each quantity is first rounded to the step it is
 * shown in, so a line's amount is its shown quantity × price within half a cent per centre.
 */
export function priceCentres(centres: readonly CostCentre[], rates: Rates): Money {
  const n = centres.length;
  const centreCents: bigint[] = new Array(n).fill(0n);
  const prices = pricesOf(rates);
  const labour: LabourLine[] = [];
  let labourSum = 0n;
  for (let d = 0; d < DEPARTMENT_COUNT; d++) {
    const dep = departments[d];
    const rate = prices.hourly[d].e4;
    let line = 0n;
    let tenths = 0;
    for (let i = 0; i < n; i++) {
      const t = Math.round(centres[i].hours[d] * HOUR_STEPS);
      if (t === 0) continue;
      tenths += t;
      const a = divHalfUp(BigInt(t) * rate, 1000n); // tenths × 1/10000 → cents: / (10 × 10000 / 100)
      line += a;
      centreCents[i] += a;
    }
    if (tenths === 0) continue;
    labourSum += line;
    labour.push({ department: dep, label: departmentLabels[dep], hours: tenths / 10, rateAmount: prices.hourly[d].shown, amount: centsText(line) });
  }
  const materials: MaterialMoneyLine[] = [];
  let materialSum = 0n;
  for (let m = 0; m < MATERIAL_LINE_COUNT; m++) {
    const key = materialLines[m];
    const steps = materialSteps(key);
    const price = prices.materials[m].e4;
    const divisor = BigInt(steps) * 100n; // q/steps × price/10000 → cents
    let line = 0n;
    let q = 0;
    for (let i = 0; i < n; i++) {
      const s = Math.round(centres[i].materials[m] * steps);
      if (s === 0) continue;
      q += s;
      const a = divHalfUp(BigInt(s) * price, divisor);
      line += a;
      centreCents[i] += a;
    }
    if (q === 0) continue;
    materialSum += line;
    materials.push({
      material: key, label: materialLineLabels[key], quantity: q / steps, unit: materialUnit(key),
      priceAmount: prices.materials[m].shown, amount: centsText(line),
    });
  }
  const items: ItemLine[] = [];
  let itemSum = 0n;
  for (let k = 0; k < ITEM_COUNT; k++) {
    const key = itemKeys[k];
    const price = prices.items[k].e4;
    let line = 0n;
    let q = 0;
    for (let i = 0; i < n; i++) {
      const s = Math.round(centres[i].items[k] * ITEM_STEPS);
      if (s === 0) continue;
      q += s;
      const a = divHalfUp(BigInt(s) * price, 10000n);
      line += a;
      centreCents[i] += a;
    }
    if (q === 0) continue;
    itemSum += line;
    items.push({ item: key, label: itemLabels[key].label, quantity: q / ITEM_STEPS, unit: itemLabels[key].unit, priceAmount: prices.items[k].shown, amount: centsText(line) });
  }
  const subtotal = labourSum + materialSum + itemSum;
  const overhead = percentOf(subtotal, rates.overheadPercent);
  const contingency = percentOf(subtotal + overhead.cents, rates.contingencyPercent);
  const margin = percentOf(subtotal + overhead.cents + contingency.cents, rates.marginPercent);
  const net = subtotal + overhead.cents + contingency.cents + margin.cents;
  const tax = percentOf(net, rates.taxPercent);
  const byPackage = packages
    .map((p) => {
      let c = 0n;
      let any = false;
      for (let i = 0; i < n; i++) if (centres[i].package === p) [c, any] = [c + centreCents[i], true];
      return { package: p, label: packageLabels[p], directCostAmount: centsText(c), any };
    })
    .filter((p) => p.any)
    .map(({ any: _any, ...p }) => p);
  const divisionCents = new Map<string | null, bigint>();
  for (let i = 0; i < n; i++) divisionCents.set(centres[i].division, (divisionCents.get(centres[i].division) ?? 0n) + centreCents[i]);
  return {
    currency: rates.currency,
    labour,
    labourAmount: centsText(labourSum),
    materials,
    materialsAmount: centsText(materialSum),
    items,
    itemsAmount: centsText(itemSum),
    subtotalAmount: centsText(subtotal),
    overhead: overhead.line,
    contingency: contingency.line,
    margin: margin.line,
    netAmount: centsText(net),
    tax: tax.line,
    totalAmount: centsText(net + tax.cents),
    byCentre: centres.map((c, i) => ({ id: c.id, division: c.division, package: c.package, directCostAmount: centsText(centreCents[i]) })),
    byDivision: [...divisionCents].map(([division, c]) => ({ division, directCostAmount: centsText(c) })),
    byPackage,
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
