/**
 * Path parameters, validated with zod before anything reads them. The framework has already
 * decoded them ("%201" arrives as " 1"), so only the canonical spelling passes: a lower- or
 * upper-case UUID, or a revision number written in plain decimal without sign, spaces or leading
 * zeros, within PostgreSQL's integer (2^31 − 1). Anything else names nothing: 404.
 */
import { z } from "zod";
import { AppError } from "./errors";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const MAX_INT4 = 2_147_483_647;

/** Quoted back in a message, shortened so a 1 MiB path does not come back as a 1 MiB answer. */
export function quoted(raw: string): string {
  return JSON.stringify(raw.length > 40 ? `${raw.slice(0, 40)}…` : raw);
}

export function idParam(what: string) {
  return z.string().refine((v) => v.length === 36 && UUID.test(v), { error: (issue) => `${quoted(String(issue.input))} is not the id of any ${what}.` });
}

export const versionParam = z
  .string()
  .refine((v) => v.length <= 10 && /^[1-9][0-9]*$/.test(v) && Number(v) <= MAX_INT4, {
    error: (issue) => `${quoted(String(issue.input))} is not a version number (1, 2, 3 …).`,
  })
  .transform(Number);

const WHAT: Record<string, string> = {
  projectId: "project", schemeId: "scheme", userId: "user", fileId: "file", mailId: "message", attachmentId: "attachment",
  commentId: "comment", noteId: "note", invitationId: "invitation", quotationId: "quotation", rateSetId: "rate set",
};

/** Path parameters that are all ids: `uuidParams("projectId", "userId")`. */
export function uuidParams<K extends string>(...names: K[]) {
  return z.object(Object.fromEntries(names.map((n) => [n, idParam(WHAT[n] ?? "record")])) as Record<K, ReturnType<typeof idParam>>);
}

export const projectParams = z.object({ projectId: idParam("project") });
export const schemeParams = z.object({ schemeId: idParam("scheme") });
export const revisionParams = z.object({ schemeId: idParam("scheme"), version: versionParam });
export const userParams = z.object({ userId: idParam("user") });
export const fileParams = z.object({ fileId: idParam("file") });
export const memberParams = z.object({ projectId: idParam("project"), userId: idParam("member") });
export const quotationParams = z.object({ quotationId: idParam("quotation") });
export const quotationDocumentParams = z.object({ quotationId: idParam("quotation"), kind: z.string().max(40) });
export const rateSetParams = z.object({ rateSetId: idParam("rate set") });
export const rateSetVersionParams = z.object({ rateSetId: idParam("rate set"), version: versionParam });

/** A version number from the query string (?from=, ?version=): the same rule as in a path, else 404. */
export function parseVersion(raw: string): number {
  const parsed = versionParam.safeParse(raw);
  if (!parsed.success) throw new AppError("not_found", parsed.error.issues[0]?.message ?? "No such version.");
  return parsed.data;
}

const LOCAL = "http://stopwright.invalid";

/**
 * Where to go after signing in: a path on this site, or "/". Resolved the way a browser would, so
 * "//elsewhere", "/\elsewhere" (a browser reads the backslash as a slash) and "https://elsewhere"
 * all come back as "/", and no crafted link can send someone to another site.
 */
export function safeReturnPath(raw: string | undefined): string {
  if (!raw || raw.length > 2000 || !raw.startsWith("/")) return "/";
  try {
    const url = new URL(raw, LOCAL);
    return url.origin === LOCAL ? `${url.pathname}${url.search}${url.hash}` : "/";
  } catch {
    return "/";
  }
}
