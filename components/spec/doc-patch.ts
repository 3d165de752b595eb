/**
 * What the estimate worker is sent for a new document: only what differs from the document it
 * already holds. Documents are immutable and edits keep the objects they do not touch (doc-ops.ts),
 * so a move of one stop sends its two divisions, not a structured clone of the whole scheme.
 */
import type { DocDivision, SchemeDocument } from "@/lib/spec/document";

export type DocPatch = {
  /** Top-level fields whose value is another object than the base's (divisions aside). */
  set: Partial<Omit<SchemeDocument, "divisions">>;
  /** Top-level fields the new document no longer has. */
  unset: string[];
  /** The divisions in order: an id where the base's division object is unchanged, else the division; null when the list is the base's. */
  divisions: (string | DocDivision)[] | null;
};

export function patchOf(base: SchemeDocument, next: SchemeDocument): DocPatch {
  const set: Record<string, unknown> = {};
  const unset: string[] = [];
  const b = base as Record<string, unknown>;
  const n = next as Record<string, unknown>;
  for (const key of Object.keys(n)) if (key !== "divisions" && n[key] !== b[key]) set[key] = n[key];
  for (const key of Object.keys(b)) if (key !== "divisions" && !(key in n)) unset.push(key);
  let divisions: DocPatch["divisions"] = null;
  if (next.divisions !== base.divisions) {
    const kept = new Map(base.divisions.map((d) => [d.id, d]));
    divisions = next.divisions.map((d) => (kept.get(d.id) === d ? d.id : d));
  }
  return { set: set as DocPatch["set"], unset, divisions };
}

/** The document `patchOf(base, next)` describes, built on `base` (the same base it was made from). */
export function applyPatch(base: SchemeDocument, patch: DocPatch): SchemeDocument {
  const out = { ...base, ...patch.set } as Record<string, unknown>;
  for (const key of patch.unset) delete out[key];
  if (patch.divisions) {
    const kept = new Map(base.divisions.map((d) => [d.id, d]));
    out.divisions = patch.divisions.map((d) => {
      if (typeof d !== "string") return d;
      const division = kept.get(d);
      if (!division) throw new Error(`the patch names division ${d}, which the base document does not have`);
      return division;
    });
  }
  return out as SchemeDocument;
}
