/**
 * The firm's rate book, generated from the estimator's ratesSchema: fields, values as text, CSV and
 * comparison of versions. Pure.
 */
import { ratesSchema, upgradeRates, type Rates } from "@/lib/estimate";
import { fieldsOf, rateTree } from "./fields";
import { ratesFromCsv, type CsvImport } from "./csv";
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

/**
 * A CSV file read against the estimator's rate book; `previous` is the version it would replace. A file
 * exported before rates were renamed is read through the same upgrade as stored versions.
 */
export function rateBookFromCsv(text: string, previous: unknown): CsvImport<Rates> {
  return ratesFromCsv(ratesSchema, rateBookFields, text, previous, { upgrade: (old) => upgradeRates(old) });
}
