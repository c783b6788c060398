CREATE TABLE "org_attachment_products" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"name" text NOT NULL,
	"source" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"data" jsonb NOT NULL,
	"data_sheet_key" text,
	"data_sheet_name" text,
	"data_sheet_type" text,
	"data_sheet_size" integer,
	"data_sheet_sha256" text,
	"data_sheet_uploaded_at" timestamp with time zone,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "org_attachment_products" ADD CONSTRAINT "org_attachment_products_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "org_attachment_products" ADD CONSTRAINT "org_attachment_products_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "org_attachment_products_org_idx" ON "org_attachment_products" USING btree ("organisation_id","kind");