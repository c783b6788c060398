ALTER TABLE "projects" ADD COLUMN "wind" jsonb;--> statement-breakpoint
ALTER TABLE "projects" ADD COLUMN "climate" jsonb;