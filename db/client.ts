import "server-only";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { env } from "@/lib/env";
import * as schema from "./schema";

// One pool per server process; kept on globalThis so dev-mode reloads do not open new pools.
const g = globalThis as unknown as { stopwrightPool?: Pool };
const pool = g.stopwrightPool ?? new Pool({ connectionString: env().DATABASE_URL, max: 10 });
g.stopwrightPool = pool;

export const db = drizzle(pool, { schema });
export type Db = typeof db;
export { pool };
