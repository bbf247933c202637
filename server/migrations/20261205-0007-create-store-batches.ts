import type { Migration } from '../lib/migrator';

// Stored produce: one row per batch put by (frozen, dried, bottled…). use_by and warn_on are worked
// out from the item and method when the batch is stored (server/care/keeping.ts) and kept, so a later
// change to the keep table does not move a date someone has already written on a bag.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE store_batches (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      item varchar(30) NOT NULL,
      label varchar(100) NOT NULL DEFAULT '',
      quantity real NOT NULL CHECK (quantity > 0),
      unit varchar(12) NOT NULL,
      method varchar(10) NOT NULL CHECK (method IN ('frozen', 'dried', 'bottled', 'other')),
      stored_on date NOT NULL,
      warn_on date NOT NULL,
      use_by date NOT NULL,
      keep_source text NOT NULL,
      notes text NOT NULL DEFAULT '',
      used_on date,
      used_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (stored_on <= warn_on AND warn_on <= use_by)
    );
    CREATE INDEX store_batches_group ON store_batches (group_id, use_by);
    CREATE INDEX store_batches_in_store ON store_batches (use_by) WHERE used_on IS NULL;

    CREATE TABLE store_batch_plants (
      batch_id uuid NOT NULL REFERENCES store_batches(id) ON DELETE CASCADE,
      plant_id uuid NOT NULL REFERENCES plants(id) ON DELETE CASCADE,
      PRIMARY KEY (batch_id, plant_id)
    );
    CREATE INDEX store_batch_plants_plant ON store_batch_plants (plant_id);
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE store_batch_plants, store_batches');
};
