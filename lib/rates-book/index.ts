/**
 * The firm's rate book, generated from the estimator's ratesSchema: fields, values as text, CSV and
 * comparison of versions. Pure.
 */
import { ratesSchema, type Rates } from "@/lib/estimate";
import { fieldsOf, rateTree } from "./fields";
import { checkRateValues, type CheckedRates, type RateValues } from "./values";

export * from "./fields";
export * from "./values";
export * from "./csv";
export * from "./compare";

/** The estimator's rate book, laid out once. */
export const rateBookTree = rateTree(ratesSchema);
export const rateBookFields = fieldsOf(rateBookTree);

export function checkRates(values: RateValues): CheckedRates<Rates> {
  return checkRateValues(ratesSchema, rateBookFields, values);
}
