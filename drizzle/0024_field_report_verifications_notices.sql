-- The new table announces its writes like every other (migration 0005; server/db/client.ts).
CREATE TRIGGER field_report_verifications_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON field_report_verifications
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
