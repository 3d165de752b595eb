import "server-only";
import { checkRates, type RateProblems } from "@/lib/rates-book";
import type { Rates } from "@/lib/estimate";
import { flattenForm, rateBookFields } from "@/lib/rates-book";
import { AppError } from "./errors";

/** Field problems of the rate book as a 422's fields, keyed by the request's own path ("rates.hourlyRate.voicing"). */
export function rateProblemsToFields(problems: RateProblems, prefix = "rates."): Record<string, string[]> {
  return Object.fromEntries(Object.entries(problems).map(([k, v]) => [`${prefix}${k}`, v]));
}

/** A posted rates form to the estimator's rates, or 422 naming every bad field; nothing is saved on a 422. */
export function ratesFromForm(form: unknown): Rates {
  const checked = checkRates(flattenForm(rateBookFields, form));
  if (!checked.ok) {
    const n = Object.keys(checked.problems).length;
    throw new AppError("invalid", `${n} ${n === 1 ? "rate is" : "rates are"} not valid; nothing was saved.`, rateProblemsToFields(checked.problems));
  }
  return checked.rates;
}
