/**
 * A quotation as one pure object: the scheme document, the rates, the estimate, the commercial terms
 * and their totals, the programme with dates, and the firm's and client's details. A draft is built
 * afresh from the current rows whenever it is read; an issued quotation keeps the object it was
 * issued with (its snapshot), and its documents are written from that alone.
 */
import { estimateScheme, fromTreatment, parseScheme, type Estimate, type Rates } from "@/lib/estimate";
import { schemeDocumentSchema, toEstimatorScheme, type SchemeDocument, type Tuning } from "@/lib/spec/document";
import type { Commercial } from "./commercial";
import { priceQuotation, type QuoteTotals } from "./totals";

export const quoteStatuses = ["draft", "issued", "accepted", "declined"] as const;
export type StoredQuoteStatus = (typeof quoteStatuses)[number];
/** As people read it: an issued quotation past its validity date has lapsed. */
export type QuoteStatus = StoredQuoteStatus | "lapsed";

export const quoteStatusLabels: Readonly<Record<QuoteStatus, string>> = {
  draft: "Draft",
  issued: "Issued",
  accepted: "Accepted",
  declined: "Declined",
  lapsed: "Lapsed",
};

/** The status as of `today` (yyyy-mm-dd): valid through the last day of validity, lapsed after it. */
export function effectiveStatus(status: StoredQuoteStatus, validUntil: string | null, today: string): QuoteStatus {
  if (status === "issued" && validUntil && today > validUntil) return "lapsed";
  return status;
}

/** Quotation numbers of our own: Q-2027-0042, the year it was made and its place in that year. */
export function formatQuoteNumber(year: number, sequence: number): string {
  return `Q-${year}-${String(sequence).padStart(4, "0")}`;
}

export const QUOTE_NUMBER = /^Q-(\d{4})-(\d{4,})$/;

export function addDays(isoDate: string, days: number): string {
  const [y, m, d] = isoDate.split("-").map(Number);
  return new Date(Date.UTC(y!, m! - 1, d!) + days * 86_400_000).toISOString().slice(0, 10);
}

export interface FirmDetails {
  readonly name: string;
  readonly address: string;
  readonly email: string;
  readonly phone: string;
  readonly website: string;
  readonly registration: string;
  /** PNG, base64, with its size in pixels. */
  readonly logo: { readonly png: string; readonly width: number; readonly height: number } | null;
}

export interface ClientDetails {
  readonly projectName: string;
  readonly clientName: string;
  readonly venue: string;
  readonly location: string;
  readonly instrument: string;
  readonly targetDate: string | null;
}

export interface Quotation {
  readonly format: 1;
  readonly number: string;
  readonly status: StoredQuoteStatus;
  /** yyyy-mm-dd; null while a draft. */
  readonly issuedOn: string | null;
  readonly validUntil: string | null;
  readonly preparedBy: { readonly name: string; readonly email: string };
  readonly firm: FirmDetails;
  readonly client: ClientDetails;
  readonly scheme: { readonly id: string; readonly name: string; readonly description: string; readonly version: number; readonly tuning: Tuning; readonly document: SchemeDocument };
  readonly rateSet: { readonly name: string; readonly version: number; readonly effectiveDate: string; readonly rates: Rates };
  readonly estimate: Estimate;
  readonly commercial: Commercial;
  readonly totals: QuoteTotals;
}

export type QuotationInput = Omit<Quotation, "format" | "estimate" | "totals">;

export class QuotationError extends Error {
  constructor(readonly fields: Record<string, string[]>, message: string) {
    super(message);
    this.name = "QuotationError";
  }
}

/**
 * Estimates the scheme against the rate-set version, with the programme dated from the start date
 * to the client's target, and prices the commercial terms. Throws QuotationError with field paths
 * when the scheme cannot be estimated or the terms do not add up.
 */
export function buildQuotation(input: QuotationInput): Quotation {
  const s = input.scheme;
  const scheme = {
    ...toEstimatorScheme(s.document, s.tuning),
    ...(input.commercial.startDate
      ? { programme: { start: input.commercial.startDate, ...(input.client.targetDate ? { target: input.client.targetDate } : {}) } }
      : {}),
  };
  if (!s.document.divisions.length) throw new QuotationError({ scheme: ["The scheme has no divisions yet, so there is nothing to price."] }, "The scheme cannot be priced yet.");
  const parsed = parseScheme(scheme);
  if (!parsed.ok) throw new QuotationError({ scheme: parsed.messages }, "The scheme cannot be priced yet.");
  const estimate = estimateScheme(parsed.scheme, input.rateSet.rates);
  let totals: QuoteTotals;
  try {
    totals = priceQuotation(estimate, input.commercial);
  } catch (err) {
    if (err instanceof Error && "field" in err) throw new QuotationError({ [`commercial.${String((err as { field: string }).field)}`]: [err.message] }, err.message);
    throw err;
  }
  return { format: 1, ...input, estimate, totals };
}

/**
 * An issued quotation as stored, read in today's shapes without changing a figure. A snapshot
 * frozen before stops had an origin and a work (one `treatment` word) gets them from that word,
 * its scheme document is read through the scheme model (which upgrades first-format stops), and
 * the parts of the estimate it did not yet have (cost centres, parts of the work, bought-in items)
 * read as empty: its money, totals and programme are the ones it was issued with.
 */
export function readQuotationSnapshot(raw: unknown): Quotation {
  const q = raw as Quotation;
  const doc = schemeDocumentSchema.safeParse(q.scheme?.document);
  const e = q.estimate as Estimate & Record<string, unknown>;
  const divisions = e.divisions.map((d) => ({
    ...d,
    stops: d.stops.map((s) => {
      const stored = s as typeof s & { treatment?: string };
      if (stored.origin !== undefined) return s;
      const t = fromTreatment(stored.treatment) ?? { origin: "new" as const, work: [] };
      return { ...s, origin: t.origin, work: t.work };
    }),
  }));
  const money = e.money as Estimate["money"] & Partial<Record<string, unknown>>;
  const estimate = {
    ...e,
    packages: Array.isArray(e.packages) ? e.packages : [],
    divisions,
    money: {
      ...money,
      items: Array.isArray(money.items) ? money.items : [],
      itemsAmount: typeof money.itemsAmount === "string" ? money.itemsAmount : "0.00",
      byCentre: Array.isArray(money.byCentre) ? money.byCentre : [],
      byDivision: Array.isArray(money.byDivision) ? money.byDivision : [],
      byPackage: Array.isArray(money.byPackage) ? money.byPackage : [],
    },
  } as Estimate;
  return { ...q, scheme: { ...q.scheme, document: doc.success ? doc.data : q.scheme.document }, estimate };
}

/** Whether a stored estimate priced the organ's parts of the work one by one (case, wind, site …), as estimates since the corrected model do. */
export function hasWorkParts(e: Estimate): boolean {
  return e.money.byPackage.length > 0;
}
