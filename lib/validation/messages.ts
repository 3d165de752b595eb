/**
 * Stopwright's words for zod's checks, wherever a schema gives none of its own: a person sees
 * "Keep this under 80 characters", never "Too big: expected string to have <=80 characters".
 * Installed globally by importing this module (lib/validation/text.ts and lib/spec/document.ts do,
 * so every form and the server have it). Unions keep zod's "Invalid input", which the scheme
 * model's messages replace with the field's own hint (lib/estimate/validate.ts). Pure.
 */
import { z } from "zod";
import type { $ZodRawIssue } from "zod/v4/core";

type Issue = $ZodRawIssue;

const plural = (n: number | bigint, one: string, many: string) => `${n} ${n === 1 || n === BigInt(1) ? one : many}`;

const typeWords: Record<string, string> = {
  string: "Enter text here.",
  number: "Enter a number here.",
  int: "Enter a whole number here.",
  boolean: "Choose yes or no.",
  array: "A list is expected here.",
  object: "A group of fields is expected here.",
  date: "Enter a date here.",
};

const formatWords: Record<string, string> = {
  email: "Enter a valid e-mail address.",
  uuid: "This is not a valid id.",
  url: "Enter a full address, e.g. https://example.com.",
  date: "Use a date like 2028-09-30.",
  datetime: "Use a date and time like 2028-09-30T14:00:00Z.",
  regex: "This is not in the expected form.",
};

export function stopwrightMessage(issue: Issue): string | undefined {
  switch (issue.code) {
    case "invalid_type":
      return issue.input === undefined ? "This is required." : (typeWords[issue.expected] ?? "This value has the wrong type.");
    case "too_big": {
      const n = issue.maximum;
      if (issue.origin === "string") return `Keep this to at most ${plural(n, "character", "characters")}.`;
      if (issue.origin === "array" || issue.origin === "set") return `At most ${plural(n, "item is", "items are")} allowed here.`;
      return issue.inclusive === false ? `Use a number below ${n}.` : `Use a number no larger than ${n}.`;
    }
    case "too_small": {
      const n = issue.minimum;
      if (issue.origin === "string") return Number(n) <= 1 ? "Fill this in." : `Use at least ${plural(n, "character", "characters")}.`;
      if (issue.origin === "array" || issue.origin === "set") return `At least ${plural(n, "item is", "items are")} needed here.`;
      return issue.inclusive === false ? `Use a number above ${n}.` : `Use a number no smaller than ${n}.`;
    }
    case "invalid_format":
      return formatWords[issue.format] ?? "This is not in the expected form.";
    case "invalid_value":
      return `Choose one of: ${issue.values.map((v: unknown) => String(v)).join(", ")}.`;
    case "not_multiple_of":
      return `Use a multiple of ${issue.divisor}.`;
    case "unrecognized_keys":
      return `Remove the unknown field${issue.keys.length === 1 ? "" : "s"} ${issue.keys.map((k: string) => JSON.stringify(k.slice(0, 40))).join(", ")}.`;
    default:
      return undefined; // zod's own, e.g. "Invalid input" for a union, replaced where it is shown
  }
}

z.config({
  customError: stopwrightMessage,
  // In the browser, no compiled parsers: zod would probe `new Function`, which the
  // Content-Security-Policy refuses (and reports, though zod catches it). The server keeps them.
  ...(typeof window !== "undefined" ? { jitless: true } : {}),
});
