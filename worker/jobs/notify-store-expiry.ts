import { QueryTypes, type Sequelize } from 'sequelize';
import { addDays, type IsoDate } from '../../server/care';
import { NOTICE_DAYS } from '../../server/care/keeping';
import { config } from '../../server/config';
import type { MailPayload } from '../../server/schemas/mail';
import { storeItemLabels, storeMethodLabels, storeUnitLabels, type StoreItem, type StoreMethod, type StoreUnit } from '../../server/schemas/store';
import { enqueueMails } from '../../server/services/outbox.service';

// A week before a stored batch's use-by date, one notice to the person who stored it (or, if they
// have left the group, its longest-standing owner). The delivery key names the batch, so however
// often this runs, and however many workers run it, a batch gets one notice. A batch already used,
// or whose use-by has passed, gets none. People who turned reminders off get none either.

export interface NotifyStoreExpiryDeps { db: Sequelize; now?: () => Date; appUrl?: string }

interface DueRow {
  id: string; group_name: string; item: StoreItem; label: string; method: StoreMethod; quantity: number; unit: StoreUnit;
  stored_on: string; use_by: string; email: string; name: string;
}

const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
const inWords = (date: IsoDate) => `${Number(date.slice(8, 10))} ${MONTHS[Number(date.slice(5, 7)) - 1] ?? ''} ${date.slice(0, 4)}`;

export const storeExpiryKey = (batchId: string) => `store-expiry:${batchId}`;

export async function run({ db, now = () => new Date(), appUrl = config.APP_URL }: NotifyStoreExpiryDeps): Promise<{ queued: number }> {
  // The store has no site of its own, so its day is UTC's: a notice a week ahead can be hours early or late.
  const today = now().toISOString().slice(0, 10);
  const due = await db.query<DueRow>(
    `SELECT b.id, g.name AS group_name, b.item, b.label, b.method, b.quantity, b.unit,
       to_char(b.stored_on, 'YYYY-MM-DD') AS stored_on, to_char(b.use_by, 'YYYY-MM-DD') AS use_by, u.email, u.name
     FROM store_batches b
     JOIN groups g ON g.id = b.group_id
     CROSS JOIN LATERAL (
       SELECT m.user_id FROM memberships m
       WHERE m.group_id = b.group_id AND (m.user_id = b.created_by OR m.role = 'owner')
       ORDER BY (m.user_id = b.created_by) DESC, m.created_at, m.user_id LIMIT 1) r
     JOIN users u ON u.id = r.user_id
     LEFT JOIN reminder_preferences rp ON rp.user_id = u.id
     WHERE b.used_on IS NULL AND b.use_by BETWEEN $1::date AND $2::date AND coalesce(rp.is_enabled, true)`,
    { bind: [today, addDays(today, NOTICE_DAYS)], type: QueryTypes.SELECT },
  );
  const messages = due.map((b) => ({
    deliveryKey: storeExpiryKey(b.id), kind: 'store-expiry' as const, to: b.email,
    payload: {
      name: b.name, groupName: b.group_name, what: b.label || storeItemLabels[b.item] || b.item, method: storeMethodLabels[b.method] ?? b.method,
      quantity: `${b.quantity} ${storeUnitLabels[b.unit] ?? b.unit}`, storedOn: inWords(b.stored_on), useBy: inWords(b.use_by),
      storeUrl: `${appUrl}/store`, preferencesUrl: `${appUrl}/account/reminders`,
    } satisfies MailPayload<'store-expiry'>,
  }));
  const queued = await enqueueMails(messages);
  return { queued: queued.size };
}
