/**
 * A request body before any schema sees it: bounded in size, UTF-8, JSON, not nested deeper than
 * any document of ours, and free of text PostgreSQL cannot store — a NUL character (text and jsonb
 * both refuse U+0000) or half of a surrogate pair (jsonb refuses it; text would keep a "�").
 */
import { AppError, type FieldErrors } from "./errors";

/** Bodies larger than this are refused unread (bytes). A 150-stop scheme is about 60 KiB. */
export const DEFAULT_BODY_LIMIT = 256 * 1024;
/** Whole scheme documents: 16 divisions × 250 stops at ~300 bytes a stop is about 1.2 MB. */
export const DOCUMENT_BODY_LIMIT = 2 * 1024 * 1024;
/** Deeper than any scheme document (about 6 levels) by a wide margin. */
const MAX_DEPTH = 32;

function sizeText(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${bytes / (1024 * 1024)} MiB` : `${bytes / 1024} KiB`;
}

function tooLarge(limit: number): AppError {
  return new AppError("payload_too_large", `The request is too large; send at most ${sizeText(limit)}.`);
}

/** Reads the body as UTF-8 text, refusing it as soon as it passes `limit` bytes. */
export async function readBodyText(req: Request, limit: number): Promise<string> {
  const declared = Number(req.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(limit);
  if (!req.body) return "";
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel().catch(() => {});
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(size);
  let at = 0;
  for (const c of chunks) {
    bytes.set(c, at);
    at += c.byteLength;
  }
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("bad_request", "The request body is not valid UTF-8 text.");
  }
}

/** What is wrong with one string for storage, or null. */
export function unstorableText(value: string): string | null {
  if (value.includes("\u0000")) return "contains a NUL character (U+0000), which cannot be stored; remove it.";
  if (!value.isWellFormed()) return "contains half of a Unicode surrogate pair, which cannot be stored; retype the text.";
  return null;
}

/**
 * Every string and object key in a parsed body that cannot be stored, keyed by its path
 * ("document.divisions.0.stops.1.name"). Walks without recursion, so no input can exhaust the stack.
 */
export function unstorableFields(root: unknown): FieldErrors {
  const out: FieldErrors = {};
  const stack: { value: unknown; path: string; depth: number }[] = [{ value: root, path: "", depth: 0 }];
  while (stack.length) {
    const { value, path, depth } = stack.pop()!;
    if (typeof value === "string") {
      const problem = unstorableText(value);
      if (problem) (out[path || "_"] ??= []).push(`This text ${problem}`);
    } else if (value && typeof value === "object") {
      if (depth >= MAX_DEPTH) throw new AppError("bad_request", `The request is nested more than ${MAX_DEPTH} levels deep; no Stopwright document is.`);
      for (const [key, child] of Object.entries(value)) {
        // Paths name where the problem is; a pathological key is shortened, and its NUL shown as \0.
        const shown = (key.length > 64 ? `${key.slice(0, 64)}…` : key).replaceAll("\u0000", "\\0");
        const childPath = path ? `${path}.${shown}` : shown;
        const keyProblem = unstorableText(key);
        if (keyProblem) (out[childPath] ??= []).push(`This name ${keyProblem}`);
        else stack.push({ value: child, path: childPath, depth: depth + 1 });
      }
    }
  }
  return out;
}

export function assertStorable(value: unknown): void {
  const fields = unstorableFields(value);
  if (Object.keys(fields).length) throw new AppError("invalid", "Some text cannot be stored; nothing was saved.", fields);
}

/** The body as JSON: size-limited, UTF-8, parsed, and free of text that cannot be stored. */
export async function readJsonBody(req: Request, limit = DEFAULT_BODY_LIMIT): Promise<unknown> {
  const text = await readBodyText(req, limit);
  if (!text.trim()) return {};
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
  assertStorable(value);
  return value;
}
