import type { Transaction } from 'sequelize';
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
