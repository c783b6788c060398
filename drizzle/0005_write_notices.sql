-- Every write to a table of ours sends a notice on the channel `skinwright_writes` (delivered at commit), so
-- that each server process sharing a PostgreSQL database can empty its read cache (server/db/client.ts).
-- A table added later needs the same trigger; tests/api/write-notices.test.ts fails until it has one.
CREATE OR REPLACE FUNCTION skinwright_notify_write() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('skinwright_writes', TG_TABLE_NAME);
  RETURN NULL;
END
$$;
--> statement-breakpoint
DO $$
DECLARE t text;
BEGIN
  FOR t IN SELECT tablename FROM pg_tables WHERE schemaname = current_schema() LOOP
    EXECUTE format(
      'CREATE TRIGGER %I AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON %I FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write()',
      t || '_notify_write', t);
  END LOOP;
END
$$;
