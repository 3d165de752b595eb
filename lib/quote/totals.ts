/**
 * A quotation's money, in decimal.js only. The rounding rule (docs/quotations.md): every line is
 * rounded half-up to the cent where it is made (quantity × unit price, a percentage discount, tax);
 * every total is the exact sum of the rounded lines shown above it; shares of one amount (the works
 * by division, the payment stages) are rounded down to the cent except the last, which takes the
 * rest, so the shares always add up to the amount to the cent.
 */
import DecimalJs from "decimal.js";
import type { Estimate } from "@/lib/estimate";
import { hundredths, lumpSumCategoryLabels, taxCharged, type Commercial, type LumpSumCategory } from "./commercial";

/** A private Decimal: 40 significant digits, half-up rounding as on an invoice; no global configuration touched. */
const Dec = DecimalJs.clone({ precision: 40, rounding: DecimalJs.ROUND_HALF_UP });
type Dec = InstanceType<typeof Dec>;

const cents = (d: Dec): Dec => d.toDecimalPlaces(2, DecimalJs.ROUND_HALF_UP);
const centsDown = (d: Dec): Dec => d.toDecimalPlaces(2, DecimalJs.ROUND_DOWN);
const s2 = (d: Dec) => d.toFixed(2);

/**
 * Splits an amount into shares by weight: every share but the last is rounded down to the cent, the
 * last takes the rest, so the shares add up to the amount exactly and none is negative. Weights may
 * be any non-negative decimals; all zero gives everything to the last share.
 */
export function splitByWeights(amount: string, weights: readonly string[]): string[] {
  if (!weights.length) return [];
  const total = new Dec(amount);
  const sum = weights.reduce((s, w) => s.plus(w), new Dec(0));
  const out: string[] = [];
  let given = new Dec(0);
  for (let i = 0; i < weights.length - 1; i++) {
    const share = sum.isZero() ? new Dec(0) : centsDown(total.times(weights[i]!).div(sum));
    given = given.plus(share);
    out.push(s2(share));
  }
  out.push(s2(total.minus(given)));
  return out;
}

export interface StageAmount {
  readonly id: string;
  readonly label: string;
  readonly percent: string;
  readonly amount: string;
}

/**
 * Payment stages of a total, as percentages that add up to exactly 100: each stage but the last is
 * its percentage of the total rounded down to the cent, the last takes the rest. 1,000,000.01 at
 * 25/25/25/25 → 250,000.00 three times and 250,000.01.
 */
export function stageAmounts(total: string, stages: readonly { id: string; label: string; percent: string }[]): StageAmount[] {
  const sum = stages.reduce((s, x) => s + hundredths(x.percent), 0);
  if (sum !== 10000) throw new Error(`Payment stages must add up to 100 % (they add up to ${sum / 100} %).`);
  const amounts = splitByWeights(total, stages.map((s) => s.percent));
  return stages.map((s, i) => ({ id: s.id, label: s.label, percent: s.percent, amount: amounts[i]! }));
}

export interface WorksLine {
  readonly id: string;
  readonly label: string;
  readonly amount: string;
}

export interface QuoteTotals {
  readonly currency: string;
  /** The estimate's price before tax, shared over the divisions and the general work by their direct costs. */
  readonly works: readonly WorksLine[];
  readonly worksAmount: string;
  readonly lumpSums: readonly { readonly id: string; readonly category: LumpSumCategory; readonly categoryLabel: string; readonly description: string; readonly quantity: string; readonly unit: string; readonly unitPrice: string; readonly amount: string }[];
  readonly lumpSumsAmount: string;
  readonly provisionalSums: readonly { readonly id: string; readonly description: string; readonly amount: string }[];
  readonly provisionalAmount: string;
  /** works + lump sums + provisional sums. */
  readonly subtotalAmount: string;
  /** On the works and lump sums only: provisional sums are passed on at cost. */
  readonly discount: { readonly kind: "none" | "amount" | "percent"; readonly value: string; readonly amount: string };
  /** subtotal − discount. */
  readonly netAmount: string;
  readonly tax: { readonly treatment: Commercial["tax"]["treatment"]; readonly percent: string; readonly charged: boolean; readonly amount: string };
  /** net + tax. */
  readonly totalAmount: string;
  /** Options the client may add, each apart from the total, with its own tax. */
  readonly options: readonly { readonly id: string; readonly title: string; readonly description: string; readonly price: string; readonly taxAmount: string; readonly totalAmount: string }[];
  readonly stages: readonly StageAmount[];
}

export class QuoteTotalsError extends Error {
  constructor(readonly field: string, message: string) {
    super(message);
    this.name = "QuoteTotalsError";
  }
}

/**
 * Cost centres of the estimate with their direct costs and the labels a client reads: each division,
 * then the organ's own parts of the work (wind system, case and front, console, site, design …), each
 * on its own line. An estimate from before those parts were priced one by one has one general line.
 */
function centres(estimate: Estimate): { id: string; label: string; weight: string }[] {
  const divisions = estimate.divisions.map((d) => ({ id: d.id, label: `${d.name}${/division$/i.test(d.name) ? "" : " division"}`, weight: d.directCostAmount }));
  const organ = (estimate.money.byCentre ?? []).filter((c) => c.division === null);
  if (!organ.length) return [...divisions, { id: "general", label: "Console, wiring, transport and general work", weight: estimate.schemeWide.directCostAmount }];
  // The organ's own "chests and action" centre holds only the coupler machine (organ-work.ts): say so.
  const labels = new Map<string, string>([...(estimate.money.byPackage ?? []).map((p) => [p.package, p.label] as const), ["chests", "Coupler action"]]);
  return [...divisions, ...organ.map((c) => ({ id: `organ-${c.package}`, label: labels.get(c.package) ?? c.package, weight: c.directCostAmount }))];
}

/** The quotation's lines and totals from the frozen estimate and the commercial terms. Pure; throws QuoteTotalsError for a discount larger than what it applies to. */
export function priceQuotation(estimate: Estimate, c: Commercial): QuoteTotals {
  const net = estimate.money.netAmount;
  const cs = centres(estimate);
  const shares = splitByWeights(net, cs.map((x) => x.weight));
  const works = cs.map((x, i) => ({ id: x.id, label: x.label, amount: shares[i]! })).filter((w) => w.amount !== "0.00");
  const worksAmount = new Dec(net);

  let lumpSum = new Dec(0);
  const lumpSums = c.lumpSums.map((l) => {
    const amount = cents(new Dec(l.quantity).times(l.unitPrice));
    lumpSum = lumpSum.plus(amount);
    return { id: l.id, category: l.category, categoryLabel: lumpSumCategoryLabels[l.category], description: l.description, quantity: l.quantity, unit: l.unit, unitPrice: s2(new Dec(l.unitPrice)), amount: s2(amount) };
  });
  let provisional = new Dec(0);
  const provisionalSums = c.provisionalSums.map((p) => {
    const amount = new Dec(p.amount);
    provisional = provisional.plus(amount);
    return { id: p.id, description: p.description, amount: s2(amount) };
  });
  const subtotal = worksAmount.plus(lumpSum).plus(provisional);
  const discountable = worksAmount.plus(lumpSum);
  const discount = c.discount.kind === "none" ? new Dec(0) : c.discount.kind === "amount" ? new Dec(c.discount.value) : cents(discountable.times(c.discount.value).div(100));
  if (discount.gt(discountable)) {
    throw new QuoteTotalsError("discount.value", `The discount (${s2(discount)}) is more than the works and lump sums it applies to (${s2(discountable)}).`);
  }
  const netAmount = subtotal.minus(discount);
  const charged = taxCharged.has(c.tax.treatment);
  const taxOf = (d: Dec) => (charged ? cents(d.times(c.tax.percent).div(100)) : new Dec(0));
  const tax = taxOf(netAmount);
  const total = netAmount.plus(tax);
  const options = c.options.map((o) => {
    const price = new Dec(o.price);
    const t = taxOf(price);
    return { id: o.id, title: o.title, description: o.description, price: s2(price), taxAmount: s2(t), totalAmount: s2(price.plus(t)) };
  });
  return {
    currency: c.currency,
    works,
    worksAmount: s2(worksAmount),
    lumpSums,
    lumpSumsAmount: s2(lumpSum),
    provisionalSums,
    provisionalAmount: s2(provisional),
    subtotalAmount: s2(subtotal),
    discount: { kind: c.discount.kind, value: c.discount.value, amount: s2(discount) },
    netAmount: s2(netAmount),
    tax: { treatment: c.tax.treatment, percent: c.tax.percent, charged, amount: s2(tax) },
    totalAmount: s2(total),
    options,
    stages: stageAmounts(s2(total), c.stages),
  };
}

/** Exact sum of amount strings, for checks and for the documents' column totals. */
export function sumMoney(amounts: readonly string[]): string {
  return s2(amounts.reduce((s, a) => s.plus(a), new Dec(0)));
}

/** The one money formatter (amount-text.ts), here too for the quotation's pages. */
export { formatAmount } from "./amount-text";

/** Exact difference b − a of two amounts. */
export function diffMoney(a: string, b: string): string {
  return s2(new Dec(b).minus(a));
}
