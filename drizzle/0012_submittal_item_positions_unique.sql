DROP INDEX "submittal_items_submittal_idx";--> statement-breakpoint
CREATE UNIQUE INDEX "submittal_items_position_unique" ON "submittal_items" USING btree ("submittal_id","position");