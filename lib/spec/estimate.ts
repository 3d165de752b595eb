/**
 * The estimate of a saved scheme document under its project's tuning: the one call the server and
 * the editor's live figures share. Pure.
 */
import { estimateScheme, geometryRules, planScheme, schemeSchema, type Estimate, type Rates, type Scheme } from "@/lib/estimate";
import { toEstimatorScheme, type SchemeDocument, type Tuning } from "./document";
import { describeDocumentIssue } from "./validate";
import type { PlantingRules } from "@/lib/drawing/chest-planting";

export type DocumentEstimate = { ok: true; estimate: Estimate; scheme: Scheme } | { ok: false; messages: readonly string[] };

export function estimateDocument(doc: SchemeDocument, tuning: Tuning, rates: Rates): DocumentEstimate {
  if (!doc.divisions.length) return { ok: false, messages: ["Add a division to see the figures."] };
  // The checks parseScheme makes, with the plan kept for the estimate (it is the estimate's first
  // stage): the live figures plan a scheme once per edit, not twice. This never throws.
  const input = toEstimatorScheme(doc, tuning);
  const parsed = schemeSchema.safeParse(input);
  if (!parsed.success) return { ok: false, messages: parsed.error.issues.map((i) => describeDocumentIssue(i, input)) };
  const plan = planScheme(parsed.data);
  if (plan.messages.length) return { ok: false, messages: [...plan.messages] };
  return { ok: true, estimate: estimateScheme(parsed.data, rates, plan), scheme: parsed.data };
}

/**
 * The rules the drawings need (clearances, sheet and board thickness, cut-up, alloys, timber
 * densities, the keys of the full-organ chord, the firm's units): no price, norm or crew among them.
 * The firm's whole rates satisfy it too (the editor's live figures pass them as they are).
 */
export type DrawingRules = PlantingRules & { readonly drawingUnits: Rates["drawingUnits"] };
export function drawingRules(rates: Rates): DrawingRules {
  return { ...geometryRules(rates), woodDensityKgM3: rates.woodDensityKgM3, drawingUnits: rates.drawingUnits };
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
