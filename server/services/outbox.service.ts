import { QueryTypes, type Transaction } from 'sequelize';
import { OutboxMessage } from '../models';
import type { MailKind, MailPayload } from '../schemas/mail';

/**
 * Queues a message in the caller's transaction: if the transaction rolls back, no mail goes out.
 * A second call with the same delivery key is ignored, which is what makes a send happen once.
 */
export async function enqueueMail<K extends MailKind>(
  message: { deliveryKey: string; kind: K; to: string; payload: MailPayload<K> },
  transaction?: Transaction,
): Promise<void> {
  await OutboxMessage.bulkCreate(
    [{ deliveryKey: message.deliveryKey, kind: message.kind, toAddress: message.to, payload: message.payload, lockedUntil: null, lastError: null, sentAt: null }],
    { ignoreDuplicates: true, transaction },
  );
}

/**
 * Queues many messages in one statement (the reminder worker's digests). Answers the delivery keys
 * that were new: a key already queued, by this worker earlier or by another one, is left as it was.
 */
export async function enqueueMails<K extends MailKind>(
  messages: { deliveryKey: string; kind: K; to: string; payload: MailPayload<K> }[],
  transaction?: Transaction,
): Promise<Set<string>> {
  if (!messages.length) return new Set();
  // One JSON document for the lot: PostgreSQL parses it far faster than an array of JSON texts.
  const rows = await OutboxMessage.sequelize!.query<{ delivery_key: string }>(
    `INSERT INTO outbox_messages (delivery_key, kind, to_address, payload)
     SELECT m.key, m.kind, m.to, m.payload FROM json_to_recordset($1::json) AS m(key text, kind text, "to" text, payload json)
     ON CONFLICT (delivery_key) DO NOTHING RETURNING delivery_key`,
    { bind: [JSON.stringify(messages.map((m) => ({ key: m.deliveryKey, kind: m.kind, to: m.to, payload: m.payload })))], transaction, type: QueryTypes.SELECT },
  );
  return new Set(rows.map((r) => r.delivery_key));
}
