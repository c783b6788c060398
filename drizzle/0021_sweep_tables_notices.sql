-- The new tables announce their writes like every other (migration 0005; server/db/client.ts).
CREATE TRIGGER org_sweep_costs_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON org_sweep_costs
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
--> statement-breakpoint
CREATE TRIGGER assembly_sweeps_notify_write AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON assembly_sweeps
  FOR EACH STATEMENT EXECUTE FUNCTION skinwright_notify_write();
