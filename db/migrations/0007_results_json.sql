-- Stored results and overviews become json instead of jsonb. A result is written once and read
-- whole (the API sends it as stored text); jsonb parsed it into its binary form on every save and
-- printed it back to text on every read, about three quarters of PostgreSQL's time on a result
-- (measured on a 50 kB result with lz4: 0.79 ms to insert as jsonb against 0.29 ms as json, 0.31 ms
-- against 0.10 ms to read as text). The few lookups inside a result (one sector, the summary of a
-- reused result) work on json as well. The rewrite compresses the rows with lz4 (migration 0006)
-- when the server has it, and with pglz otherwise.
DO $$
BEGIN
  ALTER TABLE "results"
    ALTER COLUMN "result" SET DATA TYPE json USING "result"::json,
    ALTER COLUMN "result" SET COMPRESSION lz4,
    ALTER COLUMN "overview" SET DATA TYPE json USING "overview"::json,
    ALTER COLUMN "overview" SET COMPRESSION lz4;
EXCEPTION WHEN feature_not_supported OR invalid_parameter_value THEN
  RAISE NOTICE 'lz4 is not available in this PostgreSQL build; stored results keep pglz compression';
  ALTER TABLE "results"
    ALTER COLUMN "result" SET DATA TYPE json USING "result"::json,
    ALTER COLUMN "overview" SET DATA TYPE json USING "overview"::json;
END
$$;
