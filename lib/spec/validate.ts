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

function add(out: DocumentIssues, key: string, message: string) {
  (out[key || "_"] ??= []).push(message);
}

/** `prefix` places the paths inside a request body, e.g. "document." for PUT /api/schemes/:id. */
export function checkDocument(raw: unknown, prefix = ""): DocumentCheck {
  const out: DocumentIssues = {};
  const parsed = schemeDocumentSchema.safeParse(raw);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) add(out, prefix + issue.path.join("."), describeIssue(issue.path, issue.message, raw));
    return { ok: false, fields: out };
  }
  if (parsed.data.divisions.length) {
    // Tuning does not change what is consistent; the project's own is applied when estimating.
    const scheme = schemeSchema.parse(toEstimatorScheme(parsed.data, { pitchHz: 440, temperatureC: 18 }));
    for (const issue of planScheme(scheme).issues) add(out, prefix + issue.path.join("."), issue.message);
  }
  return Object.keys(out).length ? { ok: false, fields: out } : { ok: true, document: parsed.data };
}
