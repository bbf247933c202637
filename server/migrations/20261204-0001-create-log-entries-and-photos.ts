import type { Migration } from '../lib/migrator';

// The work log. An entry is one job done on a day by one person to one or more plants of a group;
// its kind's details sit in `details` (checked by the shared zod schema before they get here).
// The stone-fruit check's verdict is stored per plant, because each plant may stand on another
// site at another latitude; the reason for overriding an "avoid" is the entry's.
// log_entry_windows remembers which care windows an entry marked done, so deleting the entry can
// open them again. Photos belong to a plant or to an entry; the file lives under UPLOAD_DIR.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE log_entries (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      kind varchar(20) NOT NULL CHECK (kind IN ('prune', 'feed', 'mulch', 'thin', 'pinch', 'leaf-pick', 'harvest', 'spray', 'water', 'note')),
      details jsonb NOT NULL DEFAULT '{}',
      done_on date NOT NULL,
      done_by uuid REFERENCES users(id) ON DELETE SET NULL,
      recorded_by uuid REFERENCES users(id) ON DELETE SET NULL,
      notes text NOT NULL DEFAULT '',
      override_reason text,
      picking_safe_from date,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX log_entries_group_done_on ON log_entries (group_id, done_on DESC, created_at DESC);
    CREATE INDEX log_entries_done_by ON log_entries (done_by);

    CREATE TABLE log_entry_plants (
      log_entry_id uuid NOT NULL REFERENCES log_entries(id) ON DELETE CASCADE,
      plant_id uuid NOT NULL REFERENCES plants(id) ON DELETE CASCADE,
      guard_verdict varchar(10) CHECK (guard_verdict IN ('ok', 'caution', 'avoid')),
      guard_rules jsonb,
      PRIMARY KEY (log_entry_id, plant_id)
    );
    CREATE INDEX log_entry_plants_plant ON log_entry_plants (plant_id);

    CREATE TABLE log_entry_windows (
      log_entry_id uuid NOT NULL REFERENCES log_entries(id) ON DELETE CASCADE,
      window_id uuid NOT NULL REFERENCES care_windows(id) ON DELETE CASCADE,
      PRIMARY KEY (log_entry_id, window_id)
    );
    CREATE INDEX log_entry_windows_window ON log_entry_windows (window_id);

    CREATE TABLE photos (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      plant_id uuid REFERENCES plants(id) ON DELETE CASCADE,
      log_entry_id uuid REFERENCES log_entries(id) ON DELETE CASCADE,
      file_name varchar(80) NOT NULL UNIQUE,
      thumb_name varchar(80) UNIQUE,
      content_type varchar(20) NOT NULL CHECK (content_type IN ('image/jpeg', 'image/png', 'image/webp')),
      byte_size integer NOT NULL CHECK (byte_size > 0),
      uploaded_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((plant_id IS NULL) <> (log_entry_id IS NULL))
    );
    CREATE INDEX photos_plant ON photos (plant_id);
    CREATE INDEX photos_log_entry ON photos (log_entry_id);
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE photos, log_entry_windows, log_entry_plants, log_entries');
};
