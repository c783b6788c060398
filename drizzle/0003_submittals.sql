CREATE TABLE "sheet_verifications" (
	"code" text PRIMARY KEY NOT NULL,
	"run_id" uuid NOT NULL,
	"issuer_organisation_id" uuid,
	"issuer_name" text NOT NULL,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "submittal_comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"submittal_id" uuid NOT NULL,
	"item_id" uuid,
	"author_id" text,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "submittal_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"submittal_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"kind" text NOT NULL,
	"check_run_id" uuid,
	"storage_key" text,
	"file_name" text,
	"content_type" text,
	"size" integer,
	"sha256" text,
	"added_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "submittal_reviewers" (
	"submittal_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	CONSTRAINT "submittal_reviewers_submittal_id_user_id_pk" PRIMARY KEY("submittal_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "submittals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"lineage_id" uuid NOT NULL,
	"previous_revision_id" uuid,
	"revision" integer DEFAULT 1 NOT NULL,
	"number" text NOT NULL,
	"title" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"spec_section" text NOT NULL,
	"spec_title" text NOT NULL,
	"due_date" date,
	"status" text DEFAULT 'draft' NOT NULL,
	"submitter_id" text,
	"submitted_at" timestamp with time zone,
	"submitted_by" text,
	"decision" text,
	"decision_note" text,
	"decided_at" timestamp with time zone,
	"decided_by" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "sheet_verifications" ADD CONSTRAINT "sheet_verifications_run_id_check_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."check_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_verifications" ADD CONSTRAINT "sheet_verifications_issuer_organisation_id_organisations_id_fk" FOREIGN KEY ("issuer_organisation_id") REFERENCES "public"."organisations"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_comments" ADD CONSTRAINT "submittal_comments_submittal_id_submittals_id_fk" FOREIGN KEY ("submittal_id") REFERENCES "public"."submittals"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_comments" ADD CONSTRAINT "submittal_comments_item_id_submittal_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."submittal_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_comments" ADD CONSTRAINT "submittal_comments_author_id_user_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_items" ADD CONSTRAINT "submittal_items_submittal_id_submittals_id_fk" FOREIGN KEY ("submittal_id") REFERENCES "public"."submittals"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_items" ADD CONSTRAINT "submittal_items_check_run_id_check_runs_id_fk" FOREIGN KEY ("check_run_id") REFERENCES "public"."check_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_items" ADD CONSTRAINT "submittal_items_added_by_user_id_fk" FOREIGN KEY ("added_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_reviewers" ADD CONSTRAINT "submittal_reviewers_submittal_id_submittals_id_fk" FOREIGN KEY ("submittal_id") REFERENCES "public"."submittals"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittal_reviewers" ADD CONSTRAINT "submittal_reviewers_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittals" ADD CONSTRAINT "submittals_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittals" ADD CONSTRAINT "submittals_previous_revision_id_submittals_id_fk" FOREIGN KEY ("previous_revision_id") REFERENCES "public"."submittals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittals" ADD CONSTRAINT "submittals_submitter_id_user_id_fk" FOREIGN KEY ("submitter_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittals" ADD CONSTRAINT "submittals_submitted_by_user_id_fk" FOREIGN KEY ("submitted_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittals" ADD CONSTRAINT "submittals_decided_by_user_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submittals" ADD CONSTRAINT "submittals_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "sheet_verifications_run" ON "sheet_verifications" USING btree ("run_id");--> statement-breakpoint
CREATE INDEX "submittal_comments_submittal_idx" ON "submittal_comments" USING btree ("submittal_id","created_at");--> statement-breakpoint
CREATE INDEX "submittal_items_submittal_idx" ON "submittal_items" USING btree ("submittal_id","position");--> statement-breakpoint
CREATE INDEX "submittals_project_idx" ON "submittals" USING btree ("project_id","status");--> statement-breakpoint
CREATE UNIQUE INDEX "submittals_lineage_revision" ON "submittals" USING btree ("lineage_id","revision");--> statement-breakpoint
CREATE UNIQUE INDEX "submittals_project_number_revision" ON "submittals" USING btree ("project_id","number","revision");