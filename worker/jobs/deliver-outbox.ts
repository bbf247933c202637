import { QueryTypes, type Sequelize } from 'sequelize';
import type { Mailer } from '../mailer';
import { renderMail } from '../mail/render';

export interface DeliverOutboxDeps {
  db: Sequelize;
  mailer: Mailer;
  now?: () => Date;
  batchSize?: number;
  log?: (msg: string, extra?: object) => void;
  /** Called once a message is recorded as sent (the crash test pauses here). */
  afterSent?: (sentSoFar: number) => Promise<void>;
}

export const MAX_ATTEMPTS = 8;
// A claim lasts this long; a worker that dies mid-send leaves its rows to be claimed again after it.
const CLAIM_SECONDS = 120;

/** Waits 30 s, 1, 2, 4 … minutes between tries, at most an hour. */
export const backoffSeconds = (attempts: number) => Math.min(3600, 30 * 2 ** Math.max(0, attempts - 1));

interface ClaimedRow { id: string; delivery_key: string; kind: string; to_address: string; payload: unknown; attempts: number }

/**
 * Claims due messages with SKIP LOCKED (so any number of workers share the queue without sending a
 * message twice), sends each, and records the outcome. Returns how many were sent and failed.
 */
export async function run({ db, mailer, now = () => new Date(), batchSize = 50, log = () => {}, afterSent }: DeliverOutboxDeps) {
  const claimed = await db.query<ClaimedRow>(
    `UPDATE outbox_messages SET status = 'sending', attempts = attempts + 1, locked_until = :now::timestamptz + make_interval(secs => :claim), updated_at = now()
     WHERE id IN (
       SELECT id FROM outbox_messages
       WHERE status IN ('pending', 'sending') AND next_attempt_at <= :now AND (locked_until IS NULL OR locked_until < :now)
       ORDER BY next_attempt_at LIMIT :batchSize FOR UPDATE SKIP LOCKED)
     RETURNING id, delivery_key, kind, to_address, payload, attempts`,
    { replacements: { now: now().toISOString(), claim: CLAIM_SECONDS, batchSize }, type: QueryTypes.SELECT },
  );
  let sent = 0;
  let failed = 0;
  for (const row of claimed) {
    try {
      const mail = renderMail(row.kind, row.payload);
      await mailer.send({ to: row.to_address, ...mail, messageId: `<${row.id}@spurwood.outbox>` });
      await db.query(`UPDATE outbox_messages SET status = 'sent', sent_at = now(), locked_until = NULL, last_error = NULL, updated_at = now() WHERE id = :id`, { replacements: { id: row.id } });
      sent += 1;
    } catch (err) {
      failed += 1;
      const giveUp = row.attempts >= MAX_ATTEMPTS;
      log('mail send failed', { id: row.id, kind: row.kind, attempts: row.attempts, giveUp, error: String(err) });
      await db.query(
        `UPDATE outbox_messages SET status = :status, locked_until = NULL, last_error = :error, updated_at = now(),
           next_attempt_at = :now::timestamptz + make_interval(secs => :wait) WHERE id = :id`,
        { replacements: { id: row.id, status: giveUp ? 'failed' : 'pending', error: String(err).slice(0, 2000), now: now().toISOString(), wait: backoffSeconds(row.attempts) } },
      );
      continue;
    }
    await afterSent?.(sent);
  }
  return { claimed: claimed.length, sent, failed };
}
