/**
 * Checks on a request that changes something, before anyone reads its body: it must come from
 * Stopwright's own pages (a page on another port or a sibling host is another origin, though the
 * browser would still send the session cookie), and a JSON body must say it is JSON, so a plain
 * form or text/plain post from elsewhere is never parsed as one.
 */
import { AppError } from "./errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export function changesState(method: string): boolean {
  return !SAFE_METHODS.has(method.toUpperCase());
}

/**
 * Browsers send Origin with every cross-origin request that can change state (and "null" from
 * sandboxed or privacy-sensitive contexts). Without Origin, Sec-Fetch-Site still tells a browser's
 * cross-site request apart; a request with neither comes from a program, not a page, and carries no
 * victim's cookies unless its author holds them.
 */
export function foreignOriginProblem(headers: Headers, ownOrigin: string): string | null {
  const origin = headers.get("origin");
  if (origin !== null) {
    return origin === ownOrigin ? null : `This request came from another site (${origin.slice(0, 100)}); Stopwright accepts changes only from its own pages.`;
  }
  const site = headers.get("sec-fetch-site");
  if (site === "cross-site" || site === "same-site") return "This request came from another site; Stopwright accepts changes only from its own pages.";
  return null;
}

export function assertSameOrigin(req: Request, ownOrigin: string): void {
  if (!changesState(req.method)) return;
  const problem = foreignOriginProblem(req.headers, ownOrigin);
  if (problem) throw new AppError("forbidden", problem);
}

/** `application/json`, with or without parameters such as `; charset=utf-8`. */
export function isJsonContentType(value: string | null): boolean {
  if (!value) return false;
  return value.split(";")[0]!.trim().toLowerCase() === "application/json";
}

export function assertJsonBody(req: Request): void {
  if (!isJsonContentType(req.headers.get("content-type"))) {
    throw new AppError("unsupported_media_type", "Send the request body as JSON, with the header Content-Type: application/json.");
  }
}

/**
 * The address a request came from, as the nearest proxy reported it: the last entry of
 * X-Forwarded-For. In production `next start` listens on loopback behind a TLS proxy that appends
 * the client's address (README, "Running in production"); without a proxy, the framework fills the
 * header with the socket's address. Shortened, since it only ever becomes a hashed counter key.
 */
export function clientAddress(headers: Headers | Record<string, string | string[] | undefined>): string {
  const raw = headers instanceof Headers ? headers.get("x-forwarded-for") : headers["x-forwarded-for"];
  const value = Array.isArray(raw) ? raw.join(",") : raw;
  const last = value?.split(",").at(-1)?.trim();
  return last ? last.slice(0, 64) : "unknown";
}
