/** The browser's calls to the rate book, firm and quotation API (one fetch helper: components/spec/api.ts). */
import { call } from "@/components/spec/api";
import type { RateSetSummary, RateVersionRead } from "@/db/queries/rate-sets";
import type { QuotationRead, QuotationSummary } from "@/db/queries/quotations";
import type { CsvRow } from "@/lib/rates-book";
import type { RateChange } from "@/lib/rates-book";
import type { Commercial } from "@/lib/quote/commercial";
import type { FirmDetails } from "@/lib/quote/quotation";
import type { SaveFirmInput } from "@/lib/validation/firm";

export type RateSetRead = {
  set: { id: string; name: string; isCurrent: boolean; version: number };
  current: RateVersionRead;
  versions: { version: number; effectiveDate: string; note: string; createdAt: string; authorName: string | null }[];
};
export type ImportPreview = { ok: boolean; rows: CsvRow[]; fileProblems: string[]; effectiveDate: string | null; changedCount: number };

export const quoteApi = {
  saveFirm: (body: SaveFirmInput) => call<{ version: number; details: FirmDetails }>("PUT", "/api/firm", body),
  listRateSets: () => call<{ rateSets: RateSetSummary[] }>("GET", "/api/rate-sets"),
  createRateSet: (body: { name: string; copyFrom?: string | null }) => call<{ rateSet: { id: string; name: string } }>("POST", "/api/rate-sets", body),
  getRateSet: (id: string) => call<RateSetRead>("GET", `/api/rate-sets/${id}`),
  saveRates: (id: string, body: { version: number; effectiveDate: string; note: string; rates: unknown }) => call<RateSetRead & { savedVersion: number }>("PUT", `/api/rate-sets/${id}`, body),
  makeCurrent: (id: string) => call<RateSetRead>("POST", `/api/rate-sets/${id}/current`, {}),
  compare: (id: string, from: number, to: number) => call<{ changes: RateChange[] }>("GET", `/api/rate-sets/${id}/compare?from=${from}&to=${to}`),
  importCsv: (id: string, body: { version: number; csv: string; commit: boolean }) => call<{ preview: ImportPreview; savedVersion?: number }>("POST", `/api/rate-sets/${id}/import`, body),
  listQuotations: (projectId: string) => call<{ quotations: QuotationSummary[] }>("GET", `/api/projects/${projectId}/quotations`),
  createQuotation: (projectId: string, body: { schemeId: string; rateSetId?: string | null }) => call<{ quotation: QuotationRead }>("POST", `/api/projects/${projectId}/quotations`, body),
  getQuotation: (id: string) => call<{ quotation: QuotationRead }>("GET", `/api/quotations/${id}`),
  saveQuotation: (id: string, body: { version: number; commercial: Commercial }) => call<{ quotation: QuotationRead }>("PUT", `/api/quotations/${id}`, body),
  issueQuotation: (id: string, version: number) => call<{ quotation: QuotationRead }>("POST", `/api/quotations/${id}/issue`, { version }),
  sendTender: (id: string) => call<{ quotation: QuotationRead; sentTo: number }>("POST", `/api/quotations/${id}/send`, {}),
  decide: (id: string, outcome: "accepted" | "declined") => call<{ quotation: QuotationRead }>("POST", `/api/quotations/${id}/decision`, { outcome }),
};

/** Query keys, one factory. */
export const quoteKeys = {
  rateSet: (id: string) => ["rate-set", id] as const,
  rateSets: () => ["rate-sets"] as const,
  quotation: (id: string) => ["quotation", id] as const,
  quotations: (projectId: string) => ["quotations", projectId] as const,
};
