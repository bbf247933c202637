import type { Migration } from '../lib/migrator';

// care_windows.group_id and site_id copy the plant's own, and the window goes with its plant
// (plant_id cascades), so their foreign keys guard nothing the plant's does not. Each cost a
// lookup per row on every bulk upsert of the daily pass, about a fifth of its writing time.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    ALTER TABLE care_windows
      DROP CONSTRAINT IF EXISTS care_windows_group_id_fkey,
      DROP CONSTRAINT IF EXISTS care_windows_site_id_fkey
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query(`
    ALTER TABLE care_windows
      ADD CONSTRAINT care_windows_group_id_fkey FOREIGN KEY (group_id) REFERENCES groups(id) ON DELETE CASCADE,
      ADD CONSTRAINT care_windows_site_id_fkey FOREIGN KEY (site_id) REFERENCES sites(id) ON DELETE CASCADE
  `);
};
