/**
 * Reading a scheme (and a scheme file with optional rates) from untrusted JSON: zod for the shape,
 * then the planner for consistency (sources that exist, compasses the right way up, footages that are
 * footages, breaks that match the ranks). Every problem becomes one clear message naming the
 * division and stop; nothing throws.
 */
import { schemeSchema, type Scheme } from "./scheme";
import { planScheme, where } from "./pipes";
import { MSG_NOT_FOOTAGE } from "./pitch";
import { parseRates, type Rates } from "./rates";

export type ParseResult = { ok: true; scheme: Scheme } | { ok: false; messages: string[] };
export type ParseFileResult = { ok: true; scheme: Scheme; rates: Rates } | { ok: false; messages: string[] };

type Raw = { name?: unknown; divisions?: { name?: unknown; stops?: { name?: unknown }[] }[] };

function nameAt(list: unknown, i: number, what: string): { name: string } {
  const item = Array.isArray(list) ? (list[i] as { name?: unknown } | undefined) : undefined;
  return { name: typeof item?.name === "string" && item.name ? item.name : `${what} ${i + 1}` };
}

// zod's own words for a value of the wrong type ("Invalid input") say less than ours.
const FIELD_HINTS: Readonly<Record<string, string>> = { footage: MSG_NOT_FOOTAGE };

/** Words one zod issue of a scheme-shaped input so a person can find it: `Division "Great", stop "X": footage: …`. */
export function describeIssue(path: readonly PropertyKey[], message: string, raw: unknown): string {
  const doc = (typeof raw === "object" && raw !== null ? raw : {}) as Raw;
  let prefix = "Scheme";
  let rest = path;
  if (path[0] === "divisions" && typeof path[1] === "number") {
    const division = nameAt(doc.divisions, path[1], "division");
    const stops = Array.isArray(doc.divisions) ? doc.divisions[path[1]]?.stops : undefined;
    if (path[2] === "stops" && typeof path[3] === "number") {
      prefix = where(division, nameAt(stops, path[3], "stop"));
      rest = path.slice(4);
    } else {
      prefix = where(division);
      rest = path.slice(2);
    }
  }
  const field = rest.map(String).join(".");
  const last = String(rest[rest.length - 1] ?? "");
  const text = FIELD_HINTS[last] && /Invalid input/.test(message) ? FIELD_HINTS[last] : message;
  return field ? `${prefix}: ${field}: ${text}` : `${prefix}: ${text}`;
}

function fromJson(input: unknown): { value: unknown } | { error: string } {
  if (typeof input !== "string") return { value: input };
  try {
    return { value: JSON.parse(input) };
  } catch (e) {
    return { error: `The file is not valid JSON: ${(e as Error).message}` };
  }
}

/**
 * Validates a scheme (an object, or JSON text). Returns the scheme with defaults filled in, or every
 * message, e.g. `Division "Great", stop "Mixture IV": extension source "x" does not exist`.
 */
export function parseScheme(input: unknown): ParseResult {
  const j = fromJson(input);
  if ("error" in j) return { ok: false, messages: [j.error] };
  const r = schemeSchema.safeParse(j.value);
  if (!r.success) {
    return { ok: false, messages: r.error.issues.map((i) => describeIssue(i.path, i.message, j.value)) };
  }
  const plan = planScheme(r.data);
  if (plan.messages.length) return { ok: false, messages: [...plan.messages] };
  return { ok: true, scheme: r.data };
}

/**
 * Validates a scheme file: the scheme's fields, plus an optional "rates" object holding any of the
 * firm's rates and norms (the rest from `base`).
 */
export function parseSchemeFile(input: unknown, base: Rates): ParseFileResult {
  const j = fromJson(input);
  if ("error" in j) return { ok: false, messages: [j.error] };
  const obj = j.value;
  if (typeof obj !== "object" || obj === null || Array.isArray(obj)) return { ok: false, messages: ["Scheme: expected a JSON object"] };
  const { rates: rawRates, ...rest } = obj as Record<string, unknown>;
  const s = parseScheme(rest);
  const r = rawRates === undefined ? ({ ok: true, rates: base } as const) : parseRates(rawRates, base);
  if (s.ok && r.ok) return { ok: true, scheme: s.scheme, rates: r.rates };
  return { ok: false, messages: [...(s.ok ? [] : s.messages), ...(r.ok ? [] : r.messages)] };
}
