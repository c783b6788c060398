ALTER TABLE "projects" ADD COLUMN "site_saved_in" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "projects" ADD COLUMN "wind_saved_in" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "projects" ADD COLUMN "climate_saved_in" integer DEFAULT 1 NOT NULL;