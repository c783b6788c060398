-- Firm roles become admin / editor / reader (shared/auth/permissions.ts). Every firm member could write the
-- firm's data before, so `member` becomes `editor`; administrators (a firm's creator among them) stay `admin`.
-- Anything else unknown reads as the least role, `reader`.
UPDATE "organisation_members" SET "role" = 'editor' WHERE "role" = 'member';
--> statement-breakpoint
UPDATE "organisation_members" SET "role" = 'reader' WHERE "role" NOT IN ('admin', 'editor', 'reader');
