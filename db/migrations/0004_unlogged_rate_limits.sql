-- Rate-limit counters are short-lived and need no crash safety: an unlogged table skips the
-- write-ahead log, so counting a request costs no disk flush. After a crash PostgreSQL empties it,
-- which only forgets the current minute's counts.
ALTER TABLE "rate_limit_buckets" SET UNLOGGED;
