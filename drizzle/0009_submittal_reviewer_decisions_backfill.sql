-- Revisions decided before each reviewer's decision was recorded: the reviewer who decided gets that decision.
UPDATE "submittal_reviewers" AS r
SET "decision" = s."decision", "decision_note" = s."decision_note", "decided_at" = s."decided_at"
FROM "submittals" AS s
WHERE s."id" = r."submittal_id" AND s."decided_by" = r."user_id" AND s."decision" IS NOT NULL;
