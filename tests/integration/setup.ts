// Setup file of the vitest "integration" project: these tests need a real PostgreSQL database.
// `npm test` creates a fresh `mooring_test` database and passes its URL; to run them alone:
//   node scripts/test.mjs integration
if (!process.env.DATABASE_URL) {
  throw new Error(
    "DATABASE_URL is not set: integration tests need a PostgreSQL database. " +
      "Run them with `npm test` or `node scripts/test.mjs integration`.",
  );
}
