-- Existing projects: every part counts as saved at the current version, so a save based on an older version
-- still conflicts exactly as it did before parts had versions of their own.
UPDATE projects SET site_saved_in = version, wind_saved_in = version, climate_saved_in = version;
