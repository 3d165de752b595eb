// What no answer to a client may carry, whatever it sent: a 5xx, a stack trace, or SQL and driver
// wording from the database layer.
import { expect } from "vitest";

/** A V8 stack frame ("    at fn (/path/file.js:12:34)"), with or without a function name. */
const STACK_FRAME = /^[ \t]*at (?:async )?(?:[^\s()]+ )?\(?(?:\/|file:|node:|webpack|\.next|[A-Za-z]:\\)[^\n)]*:\d+:\d+/m;

/** PostgreSQL, node-postgres and Drizzle wording that only leaks from an unhandled database error. */
const SQL_WORDING = new RegExp(
  [
    String.raw`Failed query:`,
    String.raw`syntax error at or near`,
    String.raw`violates (?:not-null|foreign key|check|unique|exclusion) constraint`,
    String.raw`duplicate key value`,
    String.raw`invalid input syntax for`,
    String.raw`invalid byte sequence for encoding`,
    String.raw`unsupported Unicode escape sequence`,
    String.raw`out of range for type`,
    String.raw`date/time field value out of range`,
    String.raw`index row (?:size|requires)`,
    String.raw`relation "[^"]+" does not exist`,
    String.raw`\bselect\s+(?:"|\*|count\()[^\n]{0,300}\bfrom\s+"`,
    String.raw`\binsert into\s+"`,
    String.raw`\bupdate\s+"[a-z_]+"\s+set\b`,
    String.raw`\bdelete from\s+"`,
    String.raw`ECONNREFUSED|ECONNRESET|Connection terminated|Query read timeout`,
  ].join("|"),
  "i",
);

export type Answer = { status: number; text: string };

/** Fails on a 5xx (other than the database's own 503, when `allowUnavailable`), a stack trace or SQL. */
export function expectCleanAnswer(res: Answer, label: string, opts: { allowUnavailable?: boolean } = {}) {
  const ok = res.status < 500 || (opts.allowUnavailable && res.status === 503);
  expect(ok, `${label}: answered ${res.status}: ${res.text.slice(0, 300)}`).toBe(true);
  expect(STACK_FRAME.test(res.text), `${label}: the body carries a stack trace: ${res.text.slice(0, 300)}`).toBe(false);
  expect(SQL_WORDING.test(res.text), `${label}: the body carries SQL or driver wording: ${res.text.slice(0, 300)}`).toBe(false);
}

/** An API error in the product's own shape: a typed code and a message that says what is wrong. */
export function expectApiError(res: Answer & { json?: Record<string, unknown> }, status: number, label: string) {
  expect(res.status, `${label}: ${res.text.slice(0, 300)}`).toBe(status);
  const error = (res.json as { error?: { code?: unknown; message?: unknown } } | undefined)?.error;
  expect(typeof error?.code, `${label}: no error code in ${res.text.slice(0, 200)}`).toBe("string");
  expect(typeof error?.message === "string" && error.message.length > 0, `${label}: no message`).toBe(true);
}
