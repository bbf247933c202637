import type { Migration } from '../lib/migrator';

// A foreign key is checked for every row written, and care_windows' four (its plant; who did it, who
// handed it out and to whom) cost the daily pass about six seconds of PostgreSQL's time on the first
// pass over 100,000 plants (729,000 windows), even for the three that are empty on every new window.
// What they guarded is kept in cheaper ways:
//
// - The pass locks each plant it works on (FOR KEY SHARE, once per plant rather than once per
//   window), so a plant cannot be deleted while its windows are being written; deleting plants
//   deletes their windows, by the trigger below.
// - done_by, assigned_to and assigned_by are set only by the API, from the signed-in person or a
//   member it has just checked; removing people clears them, by the trigger below.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    ALTER TABLE care_windows
      DROP CONSTRAINT care_windows_plant_id_fkey,
      DROP CONSTRAINT care_windows_done_by_fkey,
      DROP CONSTRAINT care_windows_assigned_to_fkey,
      DROP CONSTRAINT care_windows_assigned_by_fkey;

    CREATE FUNCTION delete_windows_of_deleted_plants() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      -- Through the group index: a window's group is its plant's.
      DELETE FROM care_windows cw USING deleted_plants d WHERE cw.group_id = d.group_id AND cw.plant_id = d.id;
      RETURN NULL;
    END $$;
    CREATE TRIGGER plants_delete_windows AFTER DELETE ON plants
      REFERENCING OLD TABLE AS deleted_plants FOR EACH STATEMENT EXECUTE FUNCTION delete_windows_of_deleted_plants();

    CREATE FUNCTION clear_windows_of_deleted_users() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE care_windows cw SET done_by = NULL FROM deleted_users d WHERE cw.done_by = d.id;
      UPDATE care_windows cw SET assigned_to = NULL FROM deleted_users d WHERE cw.assigned_to = d.id;
      UPDATE care_windows cw SET assigned_by = NULL FROM deleted_users d WHERE cw.assigned_by = d.id;
      RETURN NULL;
    END $$;
    CREATE TRIGGER users_clear_windows AFTER DELETE ON users
      REFERENCING OLD TABLE AS deleted_users FOR EACH STATEMENT EXECUTE FUNCTION clear_windows_of_deleted_users();
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query(`
    DROP TRIGGER users_clear_windows ON users;
    DROP FUNCTION clear_windows_of_deleted_users();
    DROP TRIGGER plants_delete_windows ON plants;
    DROP FUNCTION delete_windows_of_deleted_plants();
    ALTER TABLE care_windows
      ADD CONSTRAINT care_windows_plant_id_fkey FOREIGN KEY (plant_id) REFERENCES plants(id) ON DELETE CASCADE,
      ADD CONSTRAINT care_windows_done_by_fkey FOREIGN KEY (done_by) REFERENCES users(id) ON DELETE SET NULL,
      ADD CONSTRAINT care_windows_assigned_to_fkey FOREIGN KEY (assigned_to) REFERENCES users(id) ON DELETE SET NULL,
      ADD CONSTRAINT care_windows_assigned_by_fkey FOREIGN KEY (assigned_by) REFERENCES users(id) ON DELETE SET NULL;
  `);
};
