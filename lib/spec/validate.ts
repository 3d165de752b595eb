/**
 * Validates a scheme document and words every problem so a person can find it
 * (`Division "Great", stop "Twelfth": …`), keyed by its path in the document. The words and the
 * consistency rules are the estimator's (lib/estimate), so the editor, the API and the command line
 * refuse the same things in the same words. Pure.
 */
import { describeIssue, planScheme, schemeSchema } from "@/lib/estimate";
import { schemeDocumentSchema, toEstimatorScheme, type SchemeDocument } from "./document";

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

function add(out: DocumentIssues, key: string, message: string) {
  (out[key || "_"] ??= []).push(message);
}

/** `prefix` places the paths inside a request body, e.g. "document." for PUT /api/schemes/:id. */
export function checkDocument(raw: unknown, prefix = ""): DocumentCheck {
  const out: DocumentIssues = {};
  const parsed = schemeDocumentSchema.safeParse(raw);
  if (!parsed.success) {
    const names = namesOnly(raw);
    for (const issue of parsed.error.issues) add(out, prefix + issue.path.join("."), describeIssue(issue.path, issue.message, names));
    return { ok: false, fields: out };
  }
  if (parsed.data.divisions.length) {
    // Tuning does not change what is consistent; the project's own is applied when estimating.
    const scheme = schemeSchema.parse(toEstimatorScheme(parsed.data, { pitchHz: 440, temperatureC: 18 }));
    for (const issue of planScheme(scheme).issues) add(out, prefix + issue.path.join("."), issue.message);
  }
  return Object.keys(out).length ? { ok: false, fields: out } : { ok: true, document: parsed.data };
}
