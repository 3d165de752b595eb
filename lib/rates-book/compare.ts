/** Which figures changed between two versions of a rate set: every field, in the rate book's order. */
import { fullLabel, unitText, type RateField } from "./fields";
import { flattenRates } from "./values";

export interface RateChange {
  readonly key: string;
  readonly label: string;
  readonly unit: string;
  readonly from: string;
  readonly to: string;
}

function same(f: RateField, a: string, b: string): boolean {
  if (a === b) return true;
  // 62.5 and 62.50 are the same rate; a text that differs only in case is not.
  if ((f.kind === "number" || f.kind === "integer" || f.kind === "decimal") && a !== "" && b !== "") return Number(a) === Number(b);
  return false;
}

export function compareRates(fields: readonly RateField[], older: unknown, newer: unknown): RateChange[] {
  const a = flattenRates(fields, older);
  const b = flattenRates(fields, newer);
  const currency = b.currency ?? a.currency ?? "";
  return fields
    .filter((f) => !same(f, a[f.key] ?? "", b[f.key] ?? ""))
    .map((f) => ({ key: f.key, label: fullLabel(f), unit: unitText(f, currency), from: a[f.key] ?? "", to: b[f.key] ?? "" }));
}
