import type { Migration } from '../lib/migrator';

// Mail payloads are written once, read once when the message is sent, and never queried inside:
// plain json keeps the text as it came, where jsonb took PostgreSQL four times as long to write on a
// Monday's ten thousand digests (npm run bench:worker).
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    ALTER TABLE outbox_messages ALTER COLUMN payload DROP DEFAULT;
    ALTER TABLE outbox_messages ALTER COLUMN payload TYPE json USING payload::json;
    ALTER TABLE outbox_messages ALTER COLUMN payload SET DEFAULT '{}'::json;
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query(`
    ALTER TABLE outbox_messages ALTER COLUMN payload DROP DEFAULT;
    ALTER TABLE outbox_messages ALTER COLUMN payload TYPE jsonb USING payload::jsonb;
    ALTER TABLE outbox_messages ALTER COLUMN payload SET DEFAULT '{}'::jsonb;
  `);
};
