CREATE TABLE "check_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"assembly_id" uuid NOT NULL,
	"assembly_revision" integer NOT NULL,
	"assembly_name" text NOT NULL,
	"criteria_set_id" uuid NOT NULL,
	"criteria_set_version" integer NOT NULL,
	"criteria_set_name" text NOT NULL,
	"verdict" text NOT NULL,
	"criteria_verdict" text NOT NULL,
	"module_verdict" text NOT NULL,
	"pass_count" integer NOT NULL,
	"fail_count" integer NOT NULL,
	"not_evaluated_count" integer NOT NULL,
	"engine_version" text NOT NULL,
	"inputs" jsonb NOT NULL,
	"outputs" jsonb NOT NULL,
	"inputs_hash" text NOT NULL,
	"outputs_hash" text NOT NULL,
	"hash" text NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "criteria_rows" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"set_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"climate_zone" text NOT NULL,
	"wall_category" text NOT NULL,
	"criterion" text NOT NULL,
	"value" double precision NOT NULL,
	"note" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "criteria_sets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"lineage_id" uuid NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"previous_version_id" uuid,
	"revision" integer DEFAULT 1 NOT NULL,
	"name" text NOT NULL,
	"jurisdiction" text DEFAULT '' NOT NULL,
	"edition" text DEFAULT '' NOT NULL,
	"effective_date" date,
	"notes" text DEFAULT '' NOT NULL,
	"source_reference" text DEFAULT '' NOT NULL,
	"category_labels" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"frozen_at" timestamp with time zone,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "check_runs" ADD CONSTRAINT "check_runs_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_runs" ADD CONSTRAINT "check_runs_assembly_id_assemblies_id_fk" FOREIGN KEY ("assembly_id") REFERENCES "public"."assemblies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_runs" ADD CONSTRAINT "check_runs_criteria_set_id_criteria_sets_id_fk" FOREIGN KEY ("criteria_set_id") REFERENCES "public"."criteria_sets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_runs" ADD CONSTRAINT "check_runs_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "criteria_rows" ADD CONSTRAINT "criteria_rows_set_id_criteria_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."criteria_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "criteria_sets" ADD CONSTRAINT "criteria_sets_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "criteria_sets" ADD CONSTRAINT "criteria_sets_previous_version_id_criteria_sets_id_fk" FOREIGN KEY ("previous_version_id") REFERENCES "public"."criteria_sets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "criteria_sets" ADD CONSTRAINT "criteria_sets_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "check_runs_project_idx" ON "check_runs" USING btree ("project_id","created_at");--> statement-breakpoint
CREATE INDEX "check_runs_assembly_idx" ON "check_runs" USING btree ("assembly_id");--> statement-breakpoint
CREATE UNIQUE INDEX "criteria_rows_key" ON "criteria_rows" USING btree ("set_id","climate_zone","wall_category","criterion");--> statement-breakpoint
CREATE UNIQUE INDEX "criteria_sets_lineage_version" ON "criteria_sets" USING btree ("lineage_id","version");--> statement-breakpoint
CREATE INDEX "criteria_sets_org_idx" ON "criteria_sets" USING btree ("organisation_id");