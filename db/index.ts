import "server-only";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { getEnv } from "../lib/server/env";
import * as schema from "./schema";

/** The Drizzle database handle, typed with Mooring's schema. */
export type Database = NodePgDatabase<typeof schema>;
/** A transaction handle as passed to `db.transaction(async (tx) => ...)`. */
export type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];
/** Either the database or a transaction: what helpers that may run inside a transaction accept. */
export type Executor = Database | Transaction;

interface DatabaseCache {
  pool: Pool;
  db: Database;
}

// Next's dev server re-evaluates modules on every change; keep one pool per process.
const cache = globalThis as typeof globalThis & { __mooringDatabase?: DatabaseCache };

function connect(): DatabaseCache {
  const env = getEnv();
  const pool = new Pool({
    connectionString: env.DATABASE_URL,
    max: env.DATABASE_POOL_MAX,
    connectionTimeoutMillis: 5_000,
    idleTimeoutMillis: 30_000,
    // The prepared statements (db/queries/actor.ts, configuration-access.ts, ...) are indexed lookups
    // by id, for which a plan made once serves every value; left to choose, PostgreSQL keeps
    // re-planning the access join for each call's values. Unprepared statements are unaffected.
    options: "-c plan_cache_mode=force_generic_plan",
  });
  // An idle client loses its connection when PostgreSQL restarts; without a listener the
  // 'error' event would crash the process. The pool replaces the client on the next query.
  pool.on("error", (error) => {
    console.error("PostgreSQL idle client error (the pool will reconnect):", error.message);
  });
  return { pool, db: drizzle(pool, { schema }) };
}

const connection = cache.__mooringDatabase ?? connect();
if (getEnv().NODE_ENV !== "production") cache.__mooringDatabase = connection;

/** The one Drizzle client of the app. Import it only from `db/queries/*` and db scripts. */
export const db: Database = connection.db;
/** The underlying pg pool (for migrations, health checks and orderly shutdown). */
export const pool: Pool = connection.pool;

/** Ends the pool; for scripts and test teardown. */
export async function closeDatabase(): Promise<void> {
  await pool.end();
  if (cache.__mooringDatabase === connection) delete cache.__mooringDatabase;
}
