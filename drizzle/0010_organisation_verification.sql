ALTER TABLE "organisations" ADD COLUMN "verified_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "organisations" ADD COLUMN "verified_by" text;--> statement-breakpoint
ALTER TABLE "organisations" ADD CONSTRAINT "organisations_verified_by_user_id_fk" FOREIGN KEY ("verified_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;