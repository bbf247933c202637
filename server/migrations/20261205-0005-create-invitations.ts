import type { Migration } from '../lib/migrator';

// An invitation to join a group with a role, sent by e-mail. Only a SHA-256 of the link's token is
// stored, so a copy of the table lets nobody in. A row is spent once (accepted_at) and can be
// withdrawn (revoked_at); a new invitation to the same address withdraws the one before it.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE invitations (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      email varchar(254) NOT NULL,
      role varchar(10) NOT NULL CHECK (role IN ('owner', 'grower', 'helper', 'viewer')),
      token_hash char(64) NOT NULL UNIQUE,
      invited_by uuid REFERENCES users(id) ON DELETE SET NULL,
      expires_at timestamptz NOT NULL,
      accepted_at timestamptz,
      accepted_by uuid REFERENCES users(id) ON DELETE SET NULL,
      revoked_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX invitations_group_open ON invitations (group_id) WHERE accepted_at IS NULL AND revoked_at IS NULL;
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE invitations');
};
