import path from "node:path";
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { closeDatabase, pool } from "./index";
import * as schema from "./schema";

/** Any constant works; it only has to be the same for every instance that migrates. */
const migrationLockKey = 72_616_201;

/**
 * Applies the committed migrations in db/migrations. Holds a PostgreSQL advisory lock so that
 * several app instances starting at once migrate one after another instead of racing.
 */
async function main(): Promise<void> {
  const client = await pool.connect();
  try {
    await client.query("select pg_advisory_lock($1)", [migrationLockKey]);
    await migrate(drizzle(client, { schema }), {
      migrationsFolder: path.join(process.cwd(), "db", "migrations"),
    });
    await client.query("select pg_advisory_unlock($1)", [migrationLockKey]);
    console.log("Migrations applied.");
  } finally {
    client.release();
    await closeDatabase();
  }
}

main().catch((error: unknown) => {
  console.error("Migration failed:", error);
  process.exitCode = 1;
});
