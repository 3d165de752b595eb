/**
 * Rates as the editor and the CSV file hold them (every value as typed text) and back, checked with
 * the estimator's own schema; every problem is said in the estimator's words, keyed by its field.
 */
import type { z } from "zod";
import { fullLabel, type RateField } from "./fields";
import { currencyProblem } from "@/lib/quote/currency";

/** Values as text, keyed by dotted field key. */
export type RateValues = Record<string, string>;
export type RateProblems = Record<string, string[]>;

/** The value at a dotted field's path in nested rates, or undefined where the path stops. */
export function getAt(obj: unknown, path: readonly string[]): unknown {
  let cur = obj;
  for (const p of path) {
    if (typeof cur !== "object" || cur === null) return undefined;
    cur = (cur as Record<string, unknown>)[p];
  }
  return cur;
}

function setAt(obj: Record<string, unknown>, path: readonly string[], value: unknown): void {
  let cur = obj;
  for (const p of path.slice(0, -1)) {
    const next = cur[p];
    cur = (typeof next === "object" && next !== null ? next : (cur[p] = {})) as Record<string, unknown>;
  }
  cur[path[path.length - 1]!] = value;
}

/** Every value of a rates object as text (absent optional values as ""). */
export function flattenRates(fields: readonly RateField[], rates: unknown): RateValues {
  const out: RateValues = {};
  for (const f of fields) {
    const v = getAt(rates, f.path);
    out[f.key] = v === undefined || v === null ? "" : String(v);
  }
  return out;
}

/** Flat values as the nested object a form edits ({ hourlyRate: { voicing: "72.00" } }). */
export function nestValues(fields: readonly RateField[], values: RateValues): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of fields) setAt(out, f.path, values[f.key] ?? "");
  return out;
}

/** A nested form object back to flat text values; numbers are accepted as they come. */
export function flattenForm(fields: readonly RateField[], form: unknown): RateValues {
  return flattenRates(fields, form);
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function limitText(f: RateField): string {
  const parts: string[] = [];
  if (f.min) parts.push(f.min.inclusive ? `at least ${f.min.value}` : `more than ${f.min.value}`);
  if (f.max) parts.push(f.max.inclusive ? `at most ${f.max.value}` : `less than ${f.max.value}`);
  return parts.join(" and ");
}

/** One value from text to what the schema takes, or the problem with it in the estimator's words. */
function convert(f: RateField, raw: string): { value?: unknown; problem?: string } {
  const text = raw.trim();
  if (text === "") return f.optional ? {} : { problem: "is missing: enter a value" };
  switch (f.kind) {
    case "number":
    case "integer": {
      if (!NUMBER.test(text)) return { problem: `"${text.slice(0, 40)}" is not a number` };
      const n = Number(text);
      if (f.kind === "integer" && !Number.isInteger(n)) return { problem: `must be a whole number${f.min || f.max ? `, ${limitText(f)}` : ""}` };
      return { value: n };
    }
    case "decimal":
      return /^\d+(\.\d+)?$/.test(text) ? { value: text } : { problem: `"${text.slice(0, 40)}" is not an amount: write it as digits with a decimal point, e.g. 62.50` };
    case "boolean":
      if (/^(true|yes|1)$/i.test(text)) return { value: true };
      if (/^(false|no|0)$/i.test(text)) return { value: false };
      return { problem: "must be yes or no" };
    default:
      return { value: text };
  }
}

type Issue = z.core.$ZodIssue;

/** zod's issue in the estimator's words, using the field's own limits. */
function wordsFor(issue: Issue, f: RateField | undefined): string {
  switch (issue.code) {
    case "too_small":
    case "too_big":
      return f && (f.min || f.max) ? `must be ${limitText(f)}` : issue.code === "too_small" ? "is too small" : "is too large";
    case "invalid_type":
      return f?.kind === "number" || f?.kind === "integer" ? "must be a number" : "is missing or of the wrong kind";
    case "invalid_format":
      if (f?.kind === "decimal") return "must be an amount with at most 4 decimals, e.g. 62.50";
      return /^Invalid/.test(issue.message) ? "is not in the expected form" : issue.message;
    case "not_multiple_of":
      return "is not a whole number of its step";
    case "invalid_value":
      return f?.options ? `must be one of ${f.options.join(", ")}` : "is not one of the allowed values";
    default:
      // Custom checks carry our own words (e.g. "weight fractions must add up to 1").
      return /^Invalid/.test(issue.message) ? "is not valid" : issue.message;
  }
}

export type CheckedRates<T> = { ok: true; rates: T } | { ok: false; problems: RateProblems };

/**
 * Text values → a rates object the schema accepts, or every problem keyed by field key (a check over
 * a whole group, such as an alloy's fractions adding up to 1, is keyed by the group's first field).
 * Messages start with the field's full label, so they read on their own.
 */
export function checkRateValues<S extends z.ZodType>(schema: S, fields: readonly RateField[], values: RateValues): CheckedRates<z.output<S>> {
  const problems: RateProblems = {};
  const add = (key: string, message: string) => (problems[key] ??= []).push(message);
  const byKey = new Map(fields.map((f) => [f.key, f]));
  const obj: Record<string, unknown> = {};
  for (const f of fields) {
    const { value, problem } = convert(f, values[f.key] ?? "");
    if (problem) add(f.key, `${fullLabel(f)} ${problem}.`);
    else if (value !== undefined) setAt(obj, f.path, value);
  }
  const currencyField = byKey.get("currency");
  if (currencyField && !problems.currency) {
    const p = currencyProblem(String(values.currency ?? "").trim());
    if (p) add("currency", `${fullLabel(currencyField)}: ${p}`);
  }
  const parsed = schema.safeParse(obj);
  if (parsed.success && !Object.keys(problems).length) return { ok: true, rates: parsed.data };
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = issue.path.join(".");
      if (problems[key]) continue; // already said when the text was read
      const f = byKey.get(key);
      if (f) {
        add(key, `${fullLabel(f)} ${wordsFor(issue, f)}.`);
        continue;
      }
      // A check on a group: name the group and key the message by its first field.
      const first = fields.find((x) => x.key.startsWith(key ? `${key}.` : ""));
      if (first && problems[first.key]) continue;
      const label = first ? [...first.groupLabels.slice(0, key.split(".").length)].join(" — ") : "Rates";
      add(first?.key ?? "_", `${label || "Rates"}: ${wordsFor(issue, undefined)}.`);
    }
  }
  return { ok: false, problems };
}
