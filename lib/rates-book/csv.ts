/**
 * A rate set as CSV, for a spreadsheet: one row per rate with its label, key, value and unit. Reading a
 * file back checks every row (unknown or repeated keys, missing rates, values the estimator refuses)
 * and names each bad row by its spreadsheet row number; a file with any problem gives no rates at all.
 */
import Papa from "papaparse";
import type { z } from "zod";
import { fullLabel, unitText, type RateField } from "./fields";
import { checkRateValues, flattenRates, getAt, type RateValues } from "./values";

export const EFFECTIVE_DATE_KEY = "effectiveDate";
const HEADER = ["label", "key", "value", "unit"] as const;

// A cell starting with one of these is run as a formula by spreadsheets; a leading apostrophe keeps it text.
const FORMULA_START = /^[=+\-@\t\r]/;

export function ratesToCsv(fields: readonly RateField[], rates: unknown, effectiveDate: string): string {
  const values = flattenRates(fields, rates);
  const currency = values.currency ?? "";
  const rows: string[][] = [[...HEADER], ["Effective date", EFFECTIVE_DATE_KEY, effectiveDate, "yyyy-mm-dd"]];
  for (const f of fields) {
    const v = values[f.key] ?? "";
    rows.push([fullLabel(f), f.key, f.kind === "text" && FORMULA_START.test(v) ? `'${v}` : v, unitText(f, currency)]);
  }
  // CRLF line ends, as RFC 4180 and spreadsheets expect.
  return Papa.unparse(rows, { newline: "\r\n" });
}

export interface CsvRow {
  /** The row's number as a spreadsheet shows it (the header is row 1). */
  readonly row: number;
  readonly key: string;
  readonly label: string;
  readonly unit: string;
  readonly value: string;
  /** The value in the version the import would replace; null for a key that is not a rate. */
  readonly previous: string | null;
  readonly changed: boolean;
  readonly problems: readonly string[];
}

export type CsvImport<T> = {
  readonly rows: readonly CsvRow[];
  /** Problems of the file as a whole (no key column, rates missing from the file). */
  readonly fileProblems: readonly string[];
  readonly effectiveDate: string | null;
  readonly changedCount: number;
} & ({ readonly ok: true; readonly rates: T } | { readonly ok: false });

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function validDate(s: string): boolean {
  if (!ISO_DATE.test(s)) return false;
  const d = new Date(`${s}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
}

export interface CsvOptions {
  /**
   * Rates of an older format in today's (the estimator's `upgradeRates`, which stored versions also
   * pass through on reading). With it, a file written before rates were renamed still imports: a row
   * under an old name gives the rates it now lives in, and rates the old format lacked keep the
   * values of the version the import replaces.
   */
  readonly upgrade?: (old: Record<string, unknown>) => unknown;
}

const NUMBER_TEXT = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** One old-named row through the upgrade: the fields it now fills (with their values), or null for a name the upgrade does not know. */
function upgradedRow(fields: readonly RateField[], upgrade: NonNullable<CsvOptions["upgrade"]>, key: string, value: string): RateValues | null {
  const path = key.split(".");
  const old: Record<string, unknown> = {};
  let cur = old;
  for (const p of path.slice(0, -1)) cur = (cur[p] = {}) as Record<string, unknown>;
  // The upgrade works on the stored form, where measures are numbers.
  cur[path[path.length - 1]!] = NUMBER_TEXT.test(value) ? Number(value) : value;
  const upgraded = upgrade(old);
  // A name the upgrade leaves in place is not an old name.
  if (getAt(upgraded, path) !== undefined) return null;
  const out: RateValues = {};
  for (const [k, v] of Object.entries(flattenRates(fields, upgraded))) if (v !== "") out[k] = v;
  return out;
}

/** Reads a CSV file against the rate book's fields; `previous` is the version it would replace. */
export function ratesFromCsv<S extends z.ZodType>(
  schema: S,
  fields: readonly RateField[],
  text: string,
  previous: unknown,
  options: CsvOptions = {},
): CsvImport<z.output<S>> {
  const fileProblems: string[] = [];
  const fail = (): CsvImport<z.output<S>> => ({ ok: false, rows: [], fileProblems, effectiveDate: null, changedCount: 0 });
  const body = text.replace(/^\uFEFF/, "");
  if (!body.trim()) {
    fileProblems.push("The file is empty.");
    return fail();
  }
  const parsed = Papa.parse<Record<string, string>>(body, { header: true, skipEmptyLines: "greedy", transformHeader: (h) => h.trim().toLowerCase() });
  const headers = parsed.meta.fields ?? [];
  if (!headers.includes("key") || !headers.includes("value")) {
    fileProblems.push(`The first row must name the columns, with at least "key" and "value" (found: ${headers.slice(0, 6).map((h) => `"${h}"`).join(", ") || "nothing"}).`);
    return fail();
  }
  const rowProblems = new Map<number, string[]>();
  const addRow = (i: number, m: string) => rowProblems.set(i, [...(rowProblems.get(i) ?? []), m]);
  for (const e of parsed.errors) {
    if (e.row === undefined) fileProblems.push("The file could not be read as CSV (check the quotation marks).");
    else if (e.code === "TooManyFields" || e.code === "TooFewFields") addRow(e.row, `Row ${e.row + 2} has ${e.code === "TooManyFields" ? "more" : "fewer"} cells than the header.`);
    else addRow(e.row, `Row ${e.row + 2} could not be read (check its quotation marks).`);
  }

  const byKey = new Map(fields.map((f) => [f.key, f]));
  const values: RateValues = {};
  const rowOfKey = new Map<string, number>();
  /** Rows under an old name, by row index: the fields each now fills. */
  const oldRows = new Map<number, RateValues>();
  let effectiveDate: string | null = null;
  parsed.data.forEach((r, i) => {
    const rowNo = i + 2;
    const key = (r.key ?? "").trim();
    let value = (r.value ?? "").trim();
    if (!key) return addRow(i, `Row ${rowNo} has no key: copy it from an exported file.`);
    if (rowOfKey.has(key)) return addRow(i, `Row ${rowNo} repeats "${key}" (first on row ${rowOfKey.get(key)! + 2}).`);
    rowOfKey.set(key, i);
    if (key === EFFECTIVE_DATE_KEY) {
      if (validDate(value)) effectiveDate = value;
      else addRow(i, `Row ${rowNo}: the effective date "${value.slice(0, 20)}" is not a date like 2027-01-31.`);
      return;
    }
    const f = byKey.get(key);
    if (!f) {
      const moved = options.upgrade ? upgradedRow(fields, options.upgrade, key, value) : null;
      if (moved) return void oldRows.set(i, moved);
      return addRow(i, `Row ${rowNo}: no rate is called "${key.slice(0, 60)}".`);
    }
    if (f.kind === "text" && value.startsWith("'")) value = value.slice(1);
    values[key] = value;
  });
  // Old names fill the rates they became, unless the file also has the rate under its new name.
  for (const [i, moved] of oldRows) {
    for (const [key, value] of Object.entries(moved)) {
      if (rowOfKey.has(key)) continue;
      rowOfKey.set(key, i);
      values[key] = value;
    }
  }
  const previousValues = flattenRates(fields, previous);
  if (oldRows.size) {
    // A file of the old format has no rows for rates added since: they keep the current version's values.
    for (const f of fields) if (!rowOfKey.has(f.key) && (previousValues[f.key] ?? "") !== "") values[f.key] = previousValues[f.key]!;
  }
  const missing = fields.filter((f) => !rowOfKey.has(f.key) && !f.optional && values[f.key] === undefined);
  for (const f of missing.slice(0, 20)) fileProblems.push(`The file has no row for "${f.key}" (${fullLabel(f)}).`);
  if (missing.length > 20) fileProblems.push(`…and ${missing.length - 20} more rates are missing.`);

  const merged: RateValues = { ...values };
  // A missing optional value stays empty rather than borrowing the old one: the file says what the set is.
  const checked = checkRateValues(schema, fields, merged);
  if (!checked.ok) {
    for (const [key, messages] of Object.entries(checked.problems)) {
      const i = rowOfKey.get(key);
      if (i === undefined) {
        // Only missing rates lack a row, and those are already listed.
        if (!missing.some((f) => f.key === key)) fileProblems.push(...messages);
        continue;
      }
      for (const m of messages) addRow(i, `Row ${i + 2}: ${m}`);
    }
  }

  const currency = values.currency ?? "";
  const rows: CsvRow[] = parsed.data.map((r, i) => {
    const key = (r.key ?? "").trim();
    const moved = oldRows.get(i);
    if (moved) {
      // An old name: shown with the rates it now fills.
      const now = Object.keys(moved).map((k) => byKey.get(k)!);
      const value = (r.value ?? "").trim();
      const prev = now.length ? (previousValues[now[0]!.key] ?? "") : null;
      return {
        row: i + 2, key, label: now.length ? `Old name of ${now.length === 1 ? fullLabel(now[0]!) : `${now.length} rates (${now.map((f) => f.key).join(", ")})`}` : "Old rate, no longer used: today's model reads it differently",
        unit: now.length ? unitText(now[0]!, currency) : "", value, previous: prev,
        changed: prev !== null && prev !== value && Number(prev) !== Number(value), problems: rowProblems.get(i) ?? [],
      };
    }
    const f = byKey.get(key);
    const value = key === EFFECTIVE_DATE_KEY ? (r.value ?? "").trim() : (values[key] ?? (r.value ?? "").trim());
    const prev = f ? (previousValues[key] ?? "") : null;
    return {
      row: i + 2, key, label: f ? fullLabel(f) : key === EFFECTIVE_DATE_KEY ? "Effective date" : "", unit: f ? unitText(f, currency) : "",
      value, previous: prev, changed: prev !== null && prev !== value && !(f && (f.kind === "number" || f.kind === "integer") && Number(prev) === Number(value)),
      problems: rowProblems.get(i) ?? [],
    };
  });
  const changedCount = rows.filter((r) => r.changed).length;
  const ok = checked.ok && !fileProblems.length && !rowProblems.size;
  return ok && checked.ok
    ? { ok: true, rows, fileProblems, effectiveDate, changedCount, rates: checked.rates }
    : { ok: false, rows, fileProblems, effectiveDate, changedCount };
}
