import "server-only";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { withoutPrices, type Rates } from "@/lib/estimate";
import { can } from "@/lib/roles";
import type { SessionUser } from "./guard";

/**
 * The firm's rates and norms. Until the firm keeps its own (the estimator's rate tables), these are
 * the invented demo values; every caller goes through here so that change lands in one place.
 */
export function firmRates(): Rates {
  return DEFAULT_RATES;
}

/** What a user's browser may be given: prices only for roles that may see money. */
export function ratesForUser(user: SessionUser): Rates {
  const rates = firmRates();
  return can(user.role, "money:read") ? rates : withoutPrices(rates);
}
