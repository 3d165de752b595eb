/**
 * A saved scheme document made ready for the drawing board: the estimator's scheme and its plan, or
 * the words that say why it cannot be drawn yet. Pure; the same checks the figures make.
 */
import { describeIssue, planScheme, schemeSchema, type SchemePlan, type Scheme } from "@/lib/estimate";
import { toEstimatorScheme, type SchemeDocument, type Tuning } from "@/lib/spec/document";

export type PlannedScheme = { ok: true; scheme: Scheme; plan: SchemePlan } | { ok: false; messages: readonly string[] };

export function planDocument(doc: SchemeDocument, tuning: Tuning): PlannedScheme {
  if (!doc.divisions.length) return { ok: false, messages: ["Add a division to see its pipes."] };
  const input = toEstimatorScheme(doc, tuning);
  const parsed = schemeSchema.safeParse(input);
  if (!parsed.success) return { ok: false, messages: parsed.error.issues.map((i) => describeIssue(i.path, i.message, input)) };
  const plan = planScheme(parsed.data);
  if (plan.messages.length) return { ok: false, messages: [...plan.messages] };
  return { ok: true, scheme: parsed.data, plan };
}
