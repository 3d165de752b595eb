/**
 * The estimate of a saved scheme document under its project's tuning: the one call the server and
 * the editor's live figures share. Pure.
 */
import { estimateScheme, parseScheme, type Estimate, type Rates, type Scheme } from "@/lib/estimate";
import { toEstimatorScheme, type SchemeDocument, type Tuning } from "./document";

export type DocumentEstimate = { ok: true; estimate: Estimate; scheme: Scheme } | { ok: false; messages: readonly string[] };

export function estimateDocument(doc: SchemeDocument, tuning: Tuning, rates: Rates): DocumentEstimate {
  if (!doc.divisions.length) return { ok: false, messages: ["Add a division to see the figures."] };
  // parseScheme runs the same consistency checks estimateScheme needs, so this never throws.
  const parsed = parseScheme(toEstimatorScheme(doc, tuning));
  if (!parsed.ok) return { ok: false, messages: parsed.messages };
  return { ok: true, estimate: estimateScheme(parsed.scheme, rates), scheme: parsed.scheme };
}

/** The rules a chest drawing needs (clearances, board thickness, cut-up): no price, norm or crew among them. */
export type DrawingRules = Pick<Rates, "chest" | "boardThicknessMm" | "cutUpFraction">;
export function drawingRules(rates: Rates): DrawingRules {
  return { chest: rates.chest, boardThicknessMm: rates.boardThicknessMm, cutUpFraction: rates.cutUpFraction };
}

/** An estimate as a reader without money:read holds it: no money lines, no direct costs, no word of the rates used. */
export type EstimateWithoutMoney = Omit<ReturnType<typeof withoutMoney>, "ratesProvenance">;
export function estimateWithoutMoney(e: Estimate): EstimateWithoutMoney {
  const { ratesProvenance: _r, ...rest } = withoutMoney(e);
  return rest;
}

/** What a role without money:read may see: everything but prices, rates and margins. */
export function withoutMoney(e: Estimate) {
  const { money: _money, ...rest } = e;
  return {
    ...rest,
    divisions: rest.divisions.map(({ directCostAmount: _d, ...d }) => d),
    schemeWide: (({ directCostAmount: _s, ...w }) => w)(rest.schemeWide),
  };
}
