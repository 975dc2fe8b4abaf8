import "server-only";
import { sql } from "drizzle-orm";
import { db } from "../index";

/** Outcome of one database round trip for the health route. */
export interface DatabasePing {
  /** Wall-clock time of the round trip in milliseconds. */
  latencyMs: number;
}

/**
 * Runs `select 1` against PostgreSQL. It reads no user data, so unlike the rest of the DAL it
 * takes no actor; the health route and load benchmarks use it. Throws when the database is
 * unreachable (the pool's connection timeout bounds the wait).
 */
export async function pingDatabase(): Promise<DatabasePing> {
  const started = performance.now();
  await db.execute(sql`select 1`);
  return { latencyMs: Math.round((performance.now() - started) * 100) / 100 };
}
