ALTER TABLE "submittal_reviewers" ADD COLUMN "decision" text;--> statement-breakpoint
ALTER TABLE "submittal_reviewers" ADD COLUMN "decision_note" text;--> statement-breakpoint
ALTER TABLE "submittal_reviewers" ADD COLUMN "decided_at" timestamp with time zone;