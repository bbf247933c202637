import type { Migration } from '../lib/migrator';

// Each plant's care windows for a season, as the worker's daily pass last worked them out. The pass
// upserts on (plant_id, season, rule_key), so a window keeps its id from day to day: reminders, the
// calendar feed and the work log (which sets done_at and done_by) all point at that id.
// The trigger_* columns hold the degree-day total behind a window's dates, when one set them.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE care_windows (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      plant_id uuid NOT NULL REFERENCES plants(id) ON DELETE CASCADE,
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      site_id uuid NOT NULL REFERENCES sites(id) ON DELETE CASCADE,
      season integer NOT NULL,
      task varchar(30) NOT NULL,
      rule_key varchar(60) NOT NULL,
      opens date NOT NULL,
      closes date NOT NULL,
      basis varchar(12) NOT NULL CHECK (basis IN ('readings', 'projection', 'calendar')),
      source text NOT NULL,
      reason text NOT NULL,
      detail text,
      trigger_degree_days real,
      trigger_base_c real,
      trigger_since date,
      trigger_reached_on date,
      computed_at timestamptz NOT NULL DEFAULT now(),
      done_at timestamptz,
      done_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (plant_id, season, rule_key),
      CHECK (opens <= closes)
    );
    CREATE INDEX care_windows_site_season ON care_windows (site_id, season);
    CREATE INDEX care_windows_group_dates ON care_windows (group_id, opens, closes);
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE care_windows');
};
