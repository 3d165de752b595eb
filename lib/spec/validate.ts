/**
 * Validates a scheme document and words every problem so a person can find it
 * (`Division "Great", stop "Twelfth": …`), keyed by its path in the document. The words and the
 * consistency rules are the estimator's (lib/estimate), so the editor, the API and the command line
 * refuse the same things in the same words. Pure.
 */
import { describeIssue, planScheme, schemeSchema } from "@/lib/estimate";
import { where } from "@/lib/estimate/pipes";
import { fieldLabel } from "@/lib/validation/labels";
import { schemeDocumentSchema, toEstimatorScheme, type DocDivision, type DocStop, type SchemeDocument } from "./document";

export type DocumentIssues = Record<string, string[]>;
export type DocumentCheck = { ok: true; document: SchemeDocument } | { ok: false; fields: DocumentIssues };

/** Longest name quoted back in a message; a longer one (itself refused) is shortened with "…". */
const QUOTED_NAME = 80;

/** Only the names that messages quote, shortened: a 1 MB stop name is not echoed 1 MB at a time. */
function namesOnly(raw: unknown): unknown {
  const short = (v: unknown) => (typeof v === "string" && v.length > QUOTED_NAME ? `${v.slice(0, QUOTED_NAME)}…` : v);
  const list = (v: unknown) => (Array.isArray(v) ? v : []);
  const divisions = raw && typeof raw === "object" ? (raw as { divisions?: unknown }).divisions : undefined;
  return {
    divisions: list(divisions).map((d) => ({
      name: short((d as { name?: unknown } | null)?.name),
      stops: list((d as { stops?: unknown } | null)?.stops).map((s) => ({ name: short((s as { name?: unknown } | null)?.name) })),
    })),
  };
}

/** The division (and stop) a path lies in: ["divisions", 0, "stops", 2, "ranks"] → ["divisions", 0, "stops", 2]. */
function placeOf(path: readonly PropertyKey[]): PropertyKey[] {
  if (path[0] !== "divisions" || typeof path[1] !== "number") return [];
  return path[2] === "stops" && typeof path[3] === "number" ? path.slice(0, 4) : path.slice(0, 2);
}

function namingField(issue: { path: readonly PropertyKey[]; message: string }): string {
  const label = fieldLabel(issue.path);
  return !label || issue.message.startsWith(`${label}: `) ? issue.message : `${label}: ${issue.message}`;
}

/** One zod issue of a scheme-shaped input, worded: `Division "Great", stop "Principal": Ranks: at least 1`. */
export function describeDocumentIssue(issue: { path: readonly PropertyKey[]; message: string }, raw: unknown): string {
  return describeIssue(placeOf(issue.path), namingField(issue), raw);
}

function add(out: DocumentIssues, key: string, message: string) {
  (out[key || "_"] ??= []).push(message);
}

/** `prefix` places the paths inside a request body, e.g. "document." for PUT /api/schemes/:id. */
export function checkDocument(raw: unknown, prefix = ""): DocumentCheck {
  const out: DocumentIssues = {};
  const parsed = schemeDocumentSchema.safeParse(raw);
  if (!parsed.success) {
    const names = namesOnly(raw);
    // The place says which division and stop, the message which field ("Ranks: at least 1"); a
    // schema's own message that does not name its field gets the field's label in front.
    for (const issue of parsed.error.issues) add(out, prefix + issue.path.join("."), describeDocumentIssue(issue, names));
    return { ok: false, fields: out };
  }
  if (parsed.data.divisions.length) {
    // Tuning does not change what is consistent; the project's own is applied when estimating.
    for (const issue of consistencyIssues(parsed.data)) add(out, prefix + issue.path.join("."), issue.message);
  }
  return Object.keys(out).length ? { ok: false, fields: out } : { ok: true, document: parsed.data };
}

type Issue = { path: readonly (string | number)[]; message: string };

/**
 * The estimator's consistency checks of a valid document. A division whose compass is wrong (it
 * runs downward) makes every stop in it look wrong too ("12 offset bass pipes, but the stop has
 * only 0 notes"): those follow-on messages are left out, so the one real problem is the one said.
 */
function consistencyIssues(doc: SchemeDocument): Issue[] {
  // Tuning does not change what is consistent; the project's own is applied when estimating.
  const scheme = schemeSchema.parse(toEstimatorScheme(doc, { pitchHz: 440, temperatureC: 18 }));
  const issues = planScheme(scheme).issues;
  const badCompass = new Set(issues.filter((i) => i.path[0] === "divisions" && i.path[2] === "compass").map((i) => i.path[1]));
  return issues.filter((i) => !(i.path[0] === "divisions" && badCompass.has(i.path[1]) && i.path[2] === "stops"));
}

/** A message without the `Division "Great": ` (or `…, stop "X": `) it starts with, for a form that shows it in place. */
function inPlace(message: string, division: DocDivision, stop?: DocStop): string {
  const prefix = `${stop ? where(division, stop) : where(division)}: `;
  const rest = message.startsWith(prefix) ? message.slice(prefix.length) : message;
  return rest.charAt(0).toUpperCase() + rest.slice(1);
}

/**
 * What the server would refuse in a division as the division form would save it (same checks as
 * checkDocument, on the scheme with this division in place): problems of the division's own fields
 * keyed by their path in the division ("compass"), and problems it would cause in its stops, named.
 */
export function checkDivisionInDocument(doc: SchemeDocument, division: DocDivision): { fields: DocumentIssues; stops: string[] } {
  const at = doc.divisions.findIndex((d) => d.id === division.id);
  const divisions = at >= 0 ? doc.divisions.map((d, i) => (i === at ? division : d)) : [...doc.divisions, division];
  const index = at >= 0 ? at : divisions.length - 1;
  const fields: DocumentIssues = {};
  const stops: string[] = [];
  for (const issue of consistencyIssues({ ...doc, divisions })) {
    if (issue.path[0] !== "divisions" || issue.path[1] !== index) continue;
    if (issue.path[2] === "stops") {
      const stop = division.stops[Number(issue.path[3])] as DocStop | undefined;
      stops.push(`${stop?.name ?? "A stop"}: ${inPlace(issue.message, division, stop)}`);
    } else add(fields, issue.path.slice(2).join("."), inPlace(issue.message, division));
  }
  return { fields, stops };
}
