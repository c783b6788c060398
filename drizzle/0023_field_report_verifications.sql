CREATE TABLE "field_report_verifications" (
	"code" text PRIMARY KEY NOT NULL,
	"inspection_id" uuid NOT NULL,
	"hash" text NOT NULL,
	"issuer_organisation_id" uuid,
	"issuer_name" text NOT NULL,
	"issued_by" text,
	"summary" jsonb NOT NULL,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "field_report_verifications" ADD CONSTRAINT "field_report_verifications_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_report_verifications" ADD CONSTRAINT "field_report_verifications_issuer_organisation_id_organisations_id_fk" FOREIGN KEY ("issuer_organisation_id") REFERENCES "public"."organisations"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_report_verifications" ADD CONSTRAINT "field_report_verifications_issued_by_user_id_fk" FOREIGN KEY ("issued_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;