import type { Migration } from '../lib/migrator';

export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE outbox_messages (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      delivery_key varchar(300) NOT NULL UNIQUE,
      kind varchar(40) NOT NULL,
      to_address varchar(254) NOT NULL,
      payload jsonb NOT NULL DEFAULT '{}',
      status varchar(10) NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'sending', 'sent', 'failed')),
      attempts integer NOT NULL DEFAULT 0,
      next_attempt_at timestamptz NOT NULL DEFAULT now(),
      locked_until timestamptz,
      last_error text,
      sent_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    -- The worker's claim query reads only the rows still to send, oldest first.
    CREATE INDEX outbox_messages_due ON outbox_messages (next_attempt_at) WHERE status IN ('pending', 'sending');
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE outbox_messages');
};
