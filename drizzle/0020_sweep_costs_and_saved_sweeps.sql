CREATE TABLE "assembly_sweeps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"assembly_id" uuid NOT NULL,
	"assembly_revision" integer NOT NULL,
	"name" text NOT NULL,
	"criteria_set_id" uuid NOT NULL,
	"criteria_set_version" integer NOT NULL,
	"criteria_set_name" text NOT NULL,
	"parameters" jsonb NOT NULL,
	"costs" jsonb,
	"summary" jsonb NOT NULL,
	"engine_version" text NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "org_sweep_costs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"name" text NOT NULL,
	"cost" double precision NOT NULL,
	"currency" text NOT NULL,
	"movement_class" text,
	"source" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "org_sweep_costs_kind" CHECK ("org_sweep_costs"."kind" in ('insulation', 'clip', 'girt', 'sealant'))
);
--> statement-breakpoint
ALTER TABLE "assembly_sweeps" ADD CONSTRAINT "assembly_sweeps_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assembly_sweeps" ADD CONSTRAINT "assembly_sweeps_assembly_id_assemblies_id_fk" FOREIGN KEY ("assembly_id") REFERENCES "public"."assemblies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assembly_sweeps" ADD CONSTRAINT "assembly_sweeps_criteria_set_id_criteria_sets_id_fk" FOREIGN KEY ("criteria_set_id") REFERENCES "public"."criteria_sets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assembly_sweeps" ADD CONSTRAINT "assembly_sweeps_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "org_sweep_costs" ADD CONSTRAINT "org_sweep_costs_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "org_sweep_costs" ADD CONSTRAINT "org_sweep_costs_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "assembly_sweeps_assembly_idx" ON "assembly_sweeps" USING btree ("assembly_id","created_at");--> statement-breakpoint
CREATE INDEX "org_sweep_costs_org_idx" ON "org_sweep_costs" USING btree ("organisation_id","kind");