-- Every change to what a session check reads (db/queries/actor.ts `actor_by_session`: the session
-- row, and the account's e-mail, name, site role and deletion) is announced on the channel
-- mooring_session_change with the account's id, when its transaction commits. Each app process
-- listens there and drops what it remembered of that account's sessions (db/session-cache.ts), so
-- a revoked session, or a demoted or deleted account, loses its rights in every process at once,
-- whichever code or tool made the change.
CREATE OR REPLACE FUNCTION mooring_notify_session_change() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF TG_TABLE_NAME = 'users' THEN
    PERFORM pg_notify('mooring_session_change', OLD.id::text);
  ELSE
    PERFORM pg_notify('mooring_session_change', OLD.user_id::text);
  END IF;
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER sessions_notify_change AFTER UPDATE OR DELETE ON "sessions"
  FOR EACH ROW EXECUTE FUNCTION mooring_notify_session_change();
--> statement-breakpoint
CREATE TRIGGER users_notify_session_change AFTER UPDATE OF email, name, site_role, deleted_at OR DELETE ON "users"
  FOR EACH ROW EXECUTE FUNCTION mooring_notify_session_change();
