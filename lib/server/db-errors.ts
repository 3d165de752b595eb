/**
 * What a database error means for the person who asked: the database is out of reach or too slow
 * (503, try again), a value it cannot store slipped past validation (400), or two writes met (409).
 * Drizzle wraps the driver's error ("Failed query: …") in `cause`, so the whole chain is read.
 * SQLSTATE codes: PostgreSQL documentation, Appendix A "PostgreSQL Error Codes".
 */

export type DatabaseProblem = "unavailable" | "bad_value" | "conflict";

/** Node's socket errors and node-postgres's own words for a connection that failed or timed out. */
const UNREACHABLE_SYSCALL = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EHOSTUNREACH", "ENETUNREACH", "EPIPE", "ENOTFOUND", "EAI_AGAIN"]);
const UNREACHABLE_WORDS = [
  "Connection terminated",
  "timeout exceeded when trying to connect",
  "Query read timeout",
  "is not queryable",
  "Cannot use a pool after calling end",
  "the database system is starting up",
  "the database system is shutting down",
];

function sqlState(code: string): DatabaseProblem | null {
  // 08 connection exception, 53 insufficient resources (too many connections), 57 operator
  // intervention (shutdown, statement timeout 57014), 25P03 idle-in-transaction timeout.
  if (/^(?:08|53|57)/.test(code) || code === "25P03") return "unavailable";
  // 40001 serialization failure, 40P01 deadlock, 23 integrity constraint violation.
  if (code === "40001" || code === "40P01" || code.startsWith("23")) return "conflict";
  // 22 data exception (bad date, number out of range, NUL, bad Unicode), 54 program limit (index row too big).
  if (code.startsWith("22") || code.startsWith("54")) return "bad_value";
  return null;
}

export function databaseProblem(err: unknown): DatabaseProblem | null {
  const seen = new Set<unknown>();
  for (let e = err; e && typeof e === "object" && !seen.has(e); e = (e as { cause?: unknown }).cause) {
    seen.add(e);
    const { code, message } = e as { code?: unknown; message?: unknown };
    if (typeof code === "string") {
      if (UNREACHABLE_SYSCALL.has(code)) return "unavailable";
      if (/^[0-9A-Z]{5}$/.test(code)) {
        const problem = sqlState(code);
        if (problem) return problem;
      }
    }
    if (typeof message === "string" && UNREACHABLE_WORDS.some((w) => message.includes(w))) return "unavailable";
    if (e instanceof AggregateError && e.errors.some((inner) => databaseProblem(inner) === "unavailable")) return "unavailable";
  }
  return null;
}

/** The innermost cause's message ("connect ECONNREFUSED 127.0.0.1:5432"), for the server log. */
export function rootCauseMessage(err: unknown): string {
  let e = err;
  for (let depth = 0; depth < 10 && e && typeof e === "object" && (e as { cause?: unknown }).cause; depth++) e = (e as { cause?: unknown }).cause;
  return e instanceof Error ? e.message.split("\n")[0]! : String(e);
}

export const DATABASE_UNAVAILABLE_MESSAGE = "The database is not answering; try again shortly.";
