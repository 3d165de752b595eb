import "server-only";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool, type PoolClient } from "pg";
import { env } from "@/lib/env";
import * as schema from "./schema";

/**
 * Limits that turn a database that stopped answering into a quick 503 instead of a hang. A stopped
 * server refuses connections at once; a frozen one accepts the TCP connection and then says nothing,
 * so only the client-side limits (connect, read) end the wait there.
 */
export const databaseTimeouts = {
  /** A new connection, or a free slot in a busy pool (ms). */
  connectMs: 3_000,
  /** Server side: any one statement, lock waits included (ms). Our slowest, a 150-stop save, takes ~0.1 s. */
  statementMs: 5_000,
  /** Client side: no answer at all to a query, e.g. a frozen server (ms). A little over the statement limit. */
  readMs: 6_000,
  /** Server side: a transaction left open without a statement ends, so it cannot hold locks (ms). */
  idleInTransactionMs: 10_000,
  /** Idle connections close after this (ms). */
  idleMs: 30_000,
} as const;

function isReadTimeout(err: unknown): boolean {
  return err instanceof Error && err.message === "Query read timeout";
}

/**
 * After a read timeout the connection still waits for the lost answer, and every later query on it
 * would wait behind that one. The pool drops such a client when `pool.query` releases it with the
 * error, but a transaction (Drizzle's `db.transaction`) releases without one, so end the client here:
 * its later queries then fail at once and the pool discards it.
 */
function endOnReadTimeout(client: PoolClient) {
  const query = client.query;
  client.query = function (this: PoolClient, ...args: unknown[]) {
    const result = (query as (...a: unknown[]) => unknown).apply(this, args);
    if (result instanceof Promise) {
      result.catch((err: unknown) => {
        if (isReadTimeout(err)) this.end().catch(() => {});
      });
    }
    return result;
  } as typeof client.query;
}

function createPool(): Pool {
  const pool = new Pool({
    connectionString: env().DATABASE_URL,
    max: 10,
    connectionTimeoutMillis: databaseTimeouts.connectMs,
    idleTimeoutMillis: databaseTimeouts.idleMs,
    query_timeout: databaseTimeouts.readMs,
    statement_timeout: databaseTimeouts.statementMs,
    idle_in_transaction_session_timeout: databaseTimeouts.idleInTransactionMs,
    keepAlive: true,
  });
  // Without a listener, an idle connection that breaks (the server restarted) would throw an
  // unhandled 'error' event and end the whole process; the pool drops that client by itself.
  pool.on("error", (err) => console.error(`database: an idle connection failed: ${err.message}`));
  pool.on("connect", endOnReadTimeout);
  return pool;
}

// One pool per server process; kept on globalThis so dev-mode reloads do not open new pools.
const g = globalThis as unknown as { stopwrightPool?: Pool };
const pool = g.stopwrightPool ?? createPool();
g.stopwrightPool = pool;

export const db = drizzle(pool, { schema });
export type Db = typeof db;
export { pool };
