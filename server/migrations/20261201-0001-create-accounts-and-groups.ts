import type { Migration } from '../lib/migrator';

export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE users (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      email varchar(254) NOT NULL UNIQUE,
      name varchar(100) NOT NULL,
      password_hash varchar(100) NOT NULL,
      is_admin boolean NOT NULL DEFAULT false,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE groups (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name varchar(100) NOT NULL,
      kind varchar(30) NOT NULL CHECK (kind IN ('household', 'allotment-society', 'community-orchard', 'market-garden', 'other')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE memberships (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      role varchar(10) NOT NULL CHECK (role IN ('owner', 'grower', 'helper', 'viewer')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (group_id, user_id)
    );
    CREATE INDEX memberships_user_id ON memberships (user_id);

    CREATE TABLE password_reset_tokens (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash char(64) NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    -- The table connect-pg-simple keeps sessions in.
    CREATE TABLE sessions (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    );
    CREATE INDEX sessions_expire ON sessions (expire);
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE sessions, password_reset_tokens, memberships, groups, users');
};
