import "server-only";
import { fillPlaceholders, type SQL } from "drizzle-orm";
import { PgDialect } from "drizzle-orm/pg-core";
import { pool } from "./index";

/**
 * A hot statement written with drizzle's `sql` template, its inputs as `sql.placeholder(name)`,
 * compiled to SQL text once and run as a named prepared statement on the pool. For statements
 * drizzle cannot prepare (data-modifying CTEs go through `execute`, which rebuilds the text and
 * has PostgreSQL plan it on every call). Rows come back as pg returns them: snake_case columns,
 * timestamps as Date, json parsed. Internal to db/queries.
 *
 * @example
 * const touch = preparedSql<{ version: number }>("touch", sql`update ... where id = ${sql.placeholder("id")} returning version`);
 * const [row] = await touch({ id });
 */
export function preparedSql<TRow>(name: string, statement: SQL): (values: Record<string, unknown>) => Promise<TRow[]> {
  const query = new PgDialect().sqlToQuery(statement);
  return async (values) => {
    const result = await pool.query<TRow & object>({ name, text: query.sql, values: fillPlaceholders(query.params, values) });
    return result.rows;
  };
}
