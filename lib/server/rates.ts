import "server-only";
import { getPricingRates } from "@/db/queries/rate-sets";
import type { Rates } from "@/lib/estimate";
import type { FigureSource } from "@/components/spec/use-figures";
import { can } from "@/lib/roles";
import { drawingRules, estimateDocument, estimateWithoutMoney } from "@/lib/spec/estimate";
import type { SchemeRead } from "@/lib/spec/document";
import type { SessionUser } from "./guard";

/**
 * The firm's rates and norms from its rate book (PostgreSQL): the current set's latest version, or
 * the set chosen. Every caller goes through here, so pricing follows the rate book everywhere.
 */
export async function firmRates({ rateSetId }: { rateSetId?: string | null } = {}): Promise<Rates> {
  return (await getPricingRates({ rateSetId })).rates;
}

/**
 * Where a scheme page's figures come from. Only roles with money:read (who alone edit schemes) hold
 * the firm's rates in the browser and recompute as they edit. Everyone else reads a saved scheme, so
 * its figures are worked out here once and sent without money, and the browser gets only the rules a
 * chest drawing needs — no labour norm, crew size, price or percentage.
 */
export async function figureSourceFor(user: SessionUser, scheme: SchemeRead): Promise<FigureSource> {
  const rates = await firmRates();
  if (can(user.role, "money:read")) return { kind: "live", rates };
  const r = estimateDocument(scheme.document, scheme.tuning, rates);
  const figures = r.ok ? { ok: true as const, estimate: estimateWithoutMoney(r.estimate), ms: 0 } : r;
  return { kind: "fixed", figures, rules: drawingRules(rates) };
}
