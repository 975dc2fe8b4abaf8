-- Stored results are tens of kilobytes to megabytes of JSON, compressed when TOASTed. lz4 compresses
-- them in about half the time of PostgreSQL's default pglz (a save writes one result and its
-- overview) and decompresses faster on every read. Only new values use it; older ones stay pglz and
-- read as before. A server built without lz4 keeps pglz.
DO $$
BEGIN
  ALTER TABLE "results" ALTER COLUMN "result" SET COMPRESSION lz4;
  ALTER TABLE "results" ALTER COLUMN "overview" SET COMPRESSION lz4;
EXCEPTION WHEN feature_not_supported OR invalid_parameter_value THEN
  RAISE NOTICE 'lz4 is not available in this PostgreSQL build; stored results keep pglz compression';
END
$$;
