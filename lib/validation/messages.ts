/**
 * Stopwright's words for zod's checks, wherever a schema gives none of its own, naming the field:
 * "Ranks: at least 1", "Name: at most 80 characters", "Wind pressure: a whole number" — never
 * "Too big: expected string to have <=80 characters". The field's name is the schema's
 * `.meta({ title })` where it has one, otherwise its path's label (lib/validation/labels.ts).
 * Installed globally by importing this module (lib/validation/text.ts, lib/spec/document.ts,
 * lib/server/guard.ts and the browser's instrumentation do, so every form and the server have it). Pure.
 */
import { z } from "zod";
import type { $ZodRawIssue, $ZodType } from "zod/v4/core";
import { fieldHint, fieldLabel } from "./labels";

type Issue = $ZodRawIssue & { schema?: $ZodType };

const plural = (n: number | bigint, one: string, many: string) => `${n} ${n === 1 || n === BigInt(1) ? one : many}`;

const typeWords: Record<string, string> = {
  string: "text",
  number: "a number",
  int: "a whole number",
  bigint: "a whole number",
  boolean: "yes or no",
  array: "a list",
  object: "a group of fields",
  date: "a date",
  nan: "a number",
};

const formatWords: Record<string, string> = {
  email: "not a valid e-mail address",
  uuid: "not a valid id",
  guid: "not a valid id",
  url: "a full address, e.g. https://example.com",
  date: "a date like 2028-09-30",
  datetime: "a date and time like 2028-09-30T14:00:00Z",
  time: "a time like 14:00",
  regex: "not in the form this field takes",
};

const shown = (v: unknown) => (typeof v === "string" ? v : String(v));

/** What is wrong, as a phrase to follow the field's name: "at least 1". */
function what(issue: Issue): string {
  switch (issue.code) {
    case "invalid_type":
      return issue.input === undefined ? "required" : (typeWords[issue.expected] ?? "not the right kind of value");
    case "too_big": {
      const n = issue.maximum;
      if (issue.origin === "string") return `at most ${plural(n, "character", "characters")}`;
      if (issue.origin === "array" || issue.origin === "set") return `at most ${plural(n, "item", "items")}`;
      if (issue.origin === "date") return `on or before ${new Date(Number(n)).toISOString().slice(0, 10)}`;
      return issue.inclusive === false ? `less than ${n}` : `at most ${n}`;
    }
    case "too_small": {
      const n = issue.minimum;
      if (issue.origin === "string") return Number(n) <= 1 ? "required" : `at least ${plural(n, "character", "characters")}`;
      if (issue.origin === "array" || issue.origin === "set") return `at least ${plural(n, "item", "items")}`;
      if (issue.origin === "date") return `on or after ${new Date(Number(n)).toISOString().slice(0, 10)}`;
      return issue.inclusive === false ? `more than ${n}` : `at least ${n}`;
    }
    case "invalid_format":
      if (issue.format === "starts_with") return `must start with “${shown((issue as { prefix?: string }).prefix)}”`;
      if (issue.format === "ends_with") return `must end with “${shown((issue as { suffix?: string }).suffix)}”`;
      if (issue.format === "includes") return `must contain “${shown((issue as { includes?: string }).includes)}”`;
      return formatWords[issue.format] ?? "not in the form this field takes";
    case "invalid_value": {
      const values = issue.values.map(shown);
      if (values.length === 1) return `must be ${values[0]}`;
      return values.length <= 12 ? `one of ${values.join(", ")}` : "not one of the choices";
    }
    case "not_multiple_of":
      return `a multiple of ${issue.divisor}`;
    case "unrecognized_keys":
      return `unknown field${issue.keys.length === 1 ? "" : "s"} ${issue.keys.map((k: string) => JSON.stringify(k.slice(0, 40))).join(", ")}; remove ${issue.keys.length === 1 ? "it" : "them"}`;
    case "invalid_union":
      return fieldHint(issue.path ?? []) ?? "not a value this field takes";
    case "invalid_key":
      return "has a key that is not allowed";
    case "invalid_element":
      return "has an entry that is not valid";
    default:
      return "not valid";
  }
}

/** The field's name: its schema's `.meta({ title })`, else its path's label; undefined for the whole input. */
function labelOf(issue: Issue): string | undefined {
  const meta = issue.schema ? z.globalRegistry.get(issue.schema as z.ZodType) : undefined;
  const title = typeof meta?.title === "string" && meta.title ? meta.title : undefined;
  return title ?? fieldLabel(issue.path ?? []);
}

export function stopwrightMessage(issue: Issue): string {
  const phrase = what(issue);
  const label = labelOf(issue);
  return label ? `${label}: ${phrase}` : phrase.charAt(0).toUpperCase() + phrase.slice(1);
}

z.config({
  customError: stopwrightMessage,
  // In the browser, no compiled parsers: zod would probe `new Function`, which the
  // Content-Security-Policy refuses (and reports, though zod catches it). The server keeps them.
  ...(typeof window !== "undefined" ? { jitless: true } : {}),
});
