import type { Migration } from '../lib/migrator';

// The first daily pass over a large install writes every plant's windows at once (729,000 rows for
// 100,000 plants in `npm run bench:worker`), and most of that time went on the rows' width and on
// their four indexes. Two changes make the rows narrow and the indexes fewer:
//
// - A window's wording (source, reason, how-to) is the same for every plant of a kind at a site, so
//   it is stored once in care_window_wordings, named by a hash of its text, and windows point at it.
//   Wordings are never changed or deleted, so no foreign key is checked on each window written.
// - A window's id is worked out from what makes it one window (plant, season, rule), so the primary
//   key also does the unique constraint's job and the pass upserts on it. Ids stay the same from
//   day to day, as before; the work log, reminders and calendar feed go on pointing at them. The id
//   is an MD5 hash in UUID form, without a UUID version, so the API checks job ids as GUIDs.
//
// Every reader already knows the group (jobs, weekly lists, the calendar feed, the work log, and
// the daily pass, which keeps to its sites within their groups), so windows are found by group and
// dates alone; the site index goes, and the plant index with the unique constraint.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE FUNCTION care_window_id(plant_id uuid, season integer, rule_key text) RETURNS uuid
      LANGUAGE sql IMMUTABLE PARALLEL SAFE
      RETURN md5(plant_id::text || '/' || season::text || '/' || rule_key)::uuid;
    CREATE FUNCTION care_window_wording_id(source text, reason text, detail text) RETURNS uuid
      LANGUAGE sql IMMUTABLE PARALLEL SAFE
      RETURN md5(source || chr(31) || reason || chr(31) || coalesce(detail, chr(30)))::uuid;

    CREATE TABLE care_window_wordings (
      id uuid PRIMARY KEY,
      source text NOT NULL,
      reason text NOT NULL,
      detail text,
      created_at timestamptz NOT NULL DEFAULT now(),
      CHECK (id = care_window_wording_id(source, reason, detail))
    );
    INSERT INTO care_window_wordings (id, source, reason, detail)
      SELECT DISTINCT care_window_wording_id(source, reason, detail), source, reason, detail FROM care_windows;

    ALTER TABLE care_windows
      ADD COLUMN wording_id uuid,
      ADD COLUMN window_id uuid GENERATED ALWAYS AS (care_window_id(plant_id, season, rule_key)) STORED;
    UPDATE care_windows SET wording_id = care_window_wording_id(source, reason, detail);
    ALTER TABLE care_windows ALTER COLUMN wording_id SET NOT NULL;

    -- Everything that points at a window moves to its new id, reminder keys included, so a reminder
    -- already sent is not sent again under the new id.
    ALTER TABLE log_entry_windows DROP CONSTRAINT log_entry_windows_window_id_fkey;
    ALTER TABLE reminder_deliveries DROP CONSTRAINT reminder_deliveries_window_id_fkey;
    UPDATE log_entry_windows lew SET window_id = cw.window_id FROM care_windows cw WHERE cw.id = lew.window_id;
    UPDATE reminder_deliveries rd SET window_id = cw.window_id, delivery_key = replace(rd.delivery_key, cw.id::text, cw.window_id::text)
      FROM care_windows cw WHERE cw.id = rd.window_id;

    ALTER TABLE care_windows DROP CONSTRAINT care_windows_pkey;
    ALTER TABLE care_windows DROP COLUMN id;
    ALTER TABLE care_windows RENAME COLUMN window_id TO id;
    ALTER TABLE care_windows ADD PRIMARY KEY (id);
    ALTER TABLE care_windows DROP CONSTRAINT care_windows_plant_id_season_rule_key_key;
    DROP INDEX care_windows_site_season;
    ALTER TABLE care_windows DROP COLUMN source, DROP COLUMN reason, DROP COLUMN detail;

    ALTER TABLE log_entry_windows ADD CONSTRAINT log_entry_windows_window_id_fkey FOREIGN KEY (window_id) REFERENCES care_windows(id) ON DELETE CASCADE;
    ALTER TABLE reminder_deliveries ADD CONSTRAINT reminder_deliveries_window_id_fkey FOREIGN KEY (window_id) REFERENCES care_windows(id) ON DELETE CASCADE;
  `);
};

// Back to the earlier shape; window ids keep their worked-out values, which are valid uuids.
export const down: Migration = async ({ context: sql }) => {
  await sql.query(`
    ALTER TABLE care_windows ADD COLUMN source text, ADD COLUMN reason text, ADD COLUMN detail text, ADD COLUMN old_id uuid;
    UPDATE care_windows cw SET source = w.source, reason = w.reason, detail = w.detail, old_id = cw.id
      FROM care_window_wordings w WHERE w.id = cw.wording_id;
    ALTER TABLE care_windows ALTER COLUMN source SET NOT NULL, ALTER COLUMN reason SET NOT NULL, ALTER COLUMN old_id SET NOT NULL;
    ALTER TABLE log_entry_windows DROP CONSTRAINT log_entry_windows_window_id_fkey;
    ALTER TABLE reminder_deliveries DROP CONSTRAINT reminder_deliveries_window_id_fkey;
    ALTER TABLE care_windows DROP CONSTRAINT care_windows_pkey;
    ALTER TABLE care_windows DROP COLUMN id, DROP COLUMN wording_id;
    ALTER TABLE care_windows RENAME COLUMN old_id TO id;
    ALTER TABLE care_windows ALTER COLUMN id SET DEFAULT gen_random_uuid();
    ALTER TABLE care_windows ADD PRIMARY KEY (id);
    ALTER TABLE care_windows ADD CONSTRAINT care_windows_plant_id_season_rule_key_key UNIQUE (plant_id, season, rule_key);
    CREATE INDEX care_windows_site_season ON care_windows (site_id, season);
    ALTER TABLE log_entry_windows ADD CONSTRAINT log_entry_windows_window_id_fkey FOREIGN KEY (window_id) REFERENCES care_windows(id) ON DELETE CASCADE;
    ALTER TABLE reminder_deliveries ADD CONSTRAINT reminder_deliveries_window_id_fkey FOREIGN KEY (window_id) REFERENCES care_windows(id) ON DELETE CASCADE;
    DROP TABLE care_window_wordings;
    DROP FUNCTION care_window_wording_id(text, text, text);
    DROP FUNCTION care_window_id(uuid, integer, text);
  `);
};
