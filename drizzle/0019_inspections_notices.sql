-- The new tables announce their writes like every other (migration 0005; server/db/client.ts).
CREATE TRIGGER inspection_templates_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON inspection_templates
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
--> statement-breakpoint
CREATE TRIGGER inspections_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON inspections
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
--> statement-breakpoint
CREATE TRIGGER inspection_items_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON inspection_items
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
--> statement-breakpoint
CREATE TRIGGER inspection_photos_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON inspection_photos
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
--> statement-breakpoint
CREATE TRIGGER inspection_deficiencies_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON inspection_deficiencies
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
