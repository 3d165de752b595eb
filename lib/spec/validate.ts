/**
 * Validates a scheme document and words every problem so a person can find it:
 * `Division "Great", stop "Twelfth": footage …`, keyed by its path in the document.
 * Pure; the editor runs it before saving and the server runs it again.
 */
import type { z } from "zod";
import { schemeDocumentSchema, type SchemeDocument } from "./document";

export type DocumentIssues = Record<string, string[]>;
export type DocumentCheck = { ok: true; document: SchemeDocument } | { ok: false; fields: DocumentIssues };

type Loose = { name?: unknown; divisions?: { name?: unknown; stops?: { name?: unknown }[] }[] };

function label(raw: Loose, path: readonly PropertyKey[]): string {
  const parts: string[] = [];
  if (path[0] === "divisions" && typeof path[1] === "number") {
    const div = raw.divisions?.[path[1]];
    parts.push(`Division ${typeof div?.name === "string" && div.name ? `"${div.name}"` : `no. ${path[1] + 1}`}`);
    if (path[2] === "stops" && typeof path[3] === "number") {
      const stop = div?.stops?.[path[3]];
      parts.push(`stop ${typeof stop?.name === "string" && stop.name ? `"${stop.name}"` : `no. ${path[3] + 1}`}`);
    }
  }
  const field = path.filter((p) => typeof p === "string" && p !== "divisions" && p !== "stops").join(".");
  return `${parts.length ? parts.join(", ") : "Scheme"}${field ? ` (${field})` : ""}`;
}

export function describeZodIssues(raw: unknown, error: z.ZodError, prefix = ""): DocumentIssues {
  const out: DocumentIssues = {};
  for (const issue of error.issues) {
    const key = prefix + issue.path.map(String).join(".");
    (out[key || "_"] ??= []).push(`${label((raw ?? {}) as Loose, issue.path)}: ${issue.message}`);
  }
  return out;
}

export type SemanticCheck = (doc: SchemeDocument) => { path: (string | number)[]; message: string }[];

/** Checks that zod alone cannot make: ids unique, references that point somewhere. */
export const documentReferences: SemanticCheck = (doc) => {
  const problems: { path: (string | number)[]; message: string }[] = [];
  const divisionIds = new Set<string>();
  const stopIds = new Map<string, string>();
  doc.divisions.forEach((d, i) => {
    if (divisionIds.has(d.id)) problems.push({ path: ["divisions", i, "id"], message: `the id "${d.id}" is used twice` });
    divisionIds.add(d.id);
    d.stops.forEach((s, j) => {
      if (stopIds.has(s.id)) problems.push({ path: ["divisions", i, "stops", j, "id"], message: `the id "${s.id}" is used twice` });
      stopIds.set(s.id, s.name);
    });
  });
  doc.divisions.forEach((d, i) =>
    d.stops.forEach((s, j) => {
      const draws = s.treatment === "extension" || s.treatment === "borrowed";
      if (draws && !s.source) problems.push({ path: ["divisions", i, "stops", j, "source"], message: `an ${s.treatment === "extension" ? "extension" : "borrowed stop"} needs the stop it draws on` });
      if (draws && s.source && !stopIds.has(s.source)) problems.push({ path: ["divisions", i, "stops", j, "source"], message: `it draws on a stop that is not in this scheme ("${s.source}")` });
      if (draws && s.source === s.id) problems.push({ path: ["divisions", i, "stops", j, "source"], message: "a stop cannot draw on itself" });
    }),
  );
  doc.accessories.couplers.forEach((c, k) => {
    if (!divisionIds.has(c.from)) problems.push({ path: ["accessories", "couplers", k, "from"], message: `coupler from a division that is not in this scheme ("${c.from}")` });
    if (!divisionIds.has(c.to)) problems.push({ path: ["accessories", "couplers", k, "to"], message: `coupler to a division that is not in this scheme ("${c.to}")` });
  });
  doc.accessories.tremulants.forEach((t, k) => {
    if (!divisionIds.has(t.division)) problems.push({ path: ["accessories", "tremulants", k, "division"], message: `tremulant on a division that is not in this scheme ("${t.division}")` });
  });
  return problems;
};

export function checkDocument(raw: unknown, extra: readonly SemanticCheck[] = [], prefix = ""): DocumentCheck {
  const parsed = schemeDocumentSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, fields: describeZodIssues(raw, parsed.error, prefix) };
  const out: DocumentIssues = {};
  for (const check of [documentReferences, ...extra]) {
    for (const p of check(parsed.data)) {
      (out[prefix + p.path.join(".")] ??= []).push(`${label(parsed.data, p.path)}: ${p.message}`);
    }
  }
  return Object.keys(out).length ? { ok: false, fields: out } : { ok: true, document: parsed.data };
}
