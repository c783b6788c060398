-- One site elevation: the wind data stops keeping its own copy of the ground elevation (projectWindSchema);
-- K_e, the sheet and every screen read the site's `elevation_m`. Reconcile before dropping the copy: a site
-- elevation left at its default 0 takes the wind copy (the value K_e was computed with); otherwise the site's
-- own value stands. Each project changed gets a new version with the wind part (and the site part, when its
-- elevation changed) saved in it, so a form opened before this migration gets a 409 instead of writing the old
-- copy back, and an audit_log row with both values.
WITH "changed" AS (
  SELECT
    "id",
    "version" AS "old_version",
    "elevation_m" AS "old_elevation",
    "wind" AS "old_wind",
    CASE
      WHEN "elevation_m" = 0 AND jsonb_typeof("wind" -> 'groundElevation') = 'number'
        THEN ("wind" ->> 'groundElevation')::double precision
      ELSE "elevation_m"
    END AS "new_elevation"
  FROM "projects"
  WHERE jsonb_typeof("wind") = 'object' AND "wind" ? 'groundElevation'
), "updated" AS (
  UPDATE "projects" AS "p"
  SET
    "elevation_m" = "c"."new_elevation",
    "wind" = "p"."wind" - 'groundElevation',
    "version" = "c"."old_version" + 1,
    "wind_saved_in" = "c"."old_version" + 1,
    "site_saved_in" = CASE
      WHEN "c"."new_elevation" <> "c"."old_elevation" THEN "c"."old_version" + 1
      ELSE "p"."site_saved_in"
    END,
    "updated_at" = now()
  FROM "changed" AS "c"
  WHERE "p"."id" = "c"."id"
  RETURNING "p"."id", "p"."elevation_m", "p"."wind"
)
INSERT INTO "audit_log" ("project_id", "entity", "entity_id", "action", "before", "after")
SELECT
  "u"."id",
  'project',
  "u"."id"::text,
  'update_wind',
  jsonb_build_object('elevationM', "c"."old_elevation", 'wind', "c"."old_wind"),
  jsonb_build_object('elevationM', "u"."elevation_m", 'wind', "u"."wind")
FROM "updated" AS "u"
JOIN "changed" AS "c" ON "c"."id" = "u"."id";
