import type { Migration } from '../lib/migrator';

// A care window handed to one person ("My jobs"). The worker's upsert never touches these columns,
// so an assignment survives the daily refresh; leaving or being removed from the group clears it.
// reminder_deliveries gains the kind 'assigned': the next digest tells the person about the job once.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    ALTER TABLE care_windows
      ADD COLUMN assigned_to uuid REFERENCES users(id) ON DELETE SET NULL,
      ADD COLUMN assigned_by uuid REFERENCES users(id) ON DELETE SET NULL,
      ADD COLUMN assigned_at timestamptz;
    CREATE INDEX care_windows_assigned_to ON care_windows (assigned_to) WHERE assigned_to IS NOT NULL;

    ALTER TABLE reminder_deliveries DROP CONSTRAINT reminder_deliveries_kind_check;
    ALTER TABLE reminder_deliveries ADD CONSTRAINT reminder_deliveries_kind_check CHECK (kind IN ('opening', 'closing', 'weekly', 'assigned'));
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query(`
    DELETE FROM reminder_deliveries WHERE kind = 'assigned';
    ALTER TABLE reminder_deliveries DROP CONSTRAINT reminder_deliveries_kind_check;
    ALTER TABLE reminder_deliveries ADD CONSTRAINT reminder_deliveries_kind_check CHECK (kind IN ('opening', 'closing', 'weekly'));
    DROP INDEX care_windows_assigned_to;
    ALTER TABLE care_windows DROP COLUMN assigned_to, DROP COLUMN assigned_by, DROP COLUMN assigned_at;
  `);
};
