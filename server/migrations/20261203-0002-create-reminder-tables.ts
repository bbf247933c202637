import type { Migration } from '../lib/migrator';

// What the reminder worker keeps between passes.
//
// reminder_preferences: one row per person who changed anything (no row means the defaults). The
// calendar feed's secret is kept only as a SHA-256 of the token; the nonce lets the server work the
// same token out again (with its own secret) to show the person their link.
//
// site_passes: one row per site and local date once that day's pass has run (or failed). The worker
// claims a site by inserting its row in the same transaction as the pass's writes, so a second
// worker waits and then skips it, and a worker that dies mid-pass leaves nothing behind to undo.
//
// reminder_deliveries: every reminder decided for a person, keyed so it can exist only once: an
// opening or closing reminder once per person and window, a weekly list once per person, group and
// Monday. digest_key names the outbox message (one digest per person per day) that carried it;
// null while it waits for one.
export const up: Migration = async ({ context: sql }) => {
  await sql.query(`
    CREATE TABLE reminder_preferences (
      user_id uuid PRIMARY KEY REFERENCES users(id) ON DELETE CASCADE,
      is_enabled boolean NOT NULL DEFAULT true,
      lead_days smallint NOT NULL DEFAULT 3 CHECK (lead_days BETWEEN 0 AND 21),
      tasks varchar(30)[],
      is_opening_on boolean NOT NULL DEFAULT true,
      is_closing_on boolean NOT NULL DEFAULT true,
      is_weekly_on boolean NOT NULL DEFAULT true,
      paused_until date,
      calendar_token_hash char(64) UNIQUE,
      calendar_nonce varchar(64),
      calendar_created_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE site_passes (
      site_id uuid NOT NULL REFERENCES sites(id) ON DELETE CASCADE,
      date date NOT NULL,
      status varchar(10) NOT NULL CHECK (status IN ('done', 'failed')),
      started_at timestamptz NOT NULL,
      finished_at timestamptz NOT NULL DEFAULT now(),
      plants integer NOT NULL DEFAULT 0,
      windows_written integer NOT NULL DEFAULT 0,
      reminders integer NOT NULL DEFAULT 0,
      fingerprint varchar(64),
      error text,
      worker varchar(100) NOT NULL DEFAULT '',
      PRIMARY KEY (site_id, date)
    );
    CREATE INDEX site_passes_date ON site_passes (date);

    CREATE TABLE reminder_deliveries (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      delivery_key varchar(200) NOT NULL UNIQUE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      group_id uuid NOT NULL REFERENCES groups(id) ON DELETE CASCADE,
      window_id uuid REFERENCES care_windows(id) ON DELETE CASCADE,
      kind varchar(10) NOT NULL CHECK (kind IN ('opening', 'closing', 'weekly')),
      pass_date date NOT NULL,
      digest_key varchar(300),
      created_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((kind = 'weekly') = (window_id IS NULL))
    );
    CREATE INDEX reminder_deliveries_waiting ON reminder_deliveries (user_id) WHERE digest_key IS NULL;
    CREATE INDEX reminder_deliveries_window ON reminder_deliveries (window_id);
  `);
};

export const down: Migration = async ({ context: sql }) => {
  await sql.query('DROP TABLE reminder_deliveries, site_passes, reminder_preferences');
};
