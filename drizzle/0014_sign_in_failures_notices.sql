-- The new table announces its writes like every other (migration 0005; server/db/client.ts).
CREATE TRIGGER sign_in_failures_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON sign_in_failures
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
--> statement-breakpoint
-- Password sign-in now needs a verified e-mail address. Accounts made before that were never asked to verify
-- and could sign in: they keep doing so.
UPDATE "user" SET email_verified = true WHERE email_verified = false;
