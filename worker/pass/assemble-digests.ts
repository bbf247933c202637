import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { IsoDate } from '../../server/care';
import { unsubscribeToken } from '../../server/lib/signed-tokens';
import type { MailPayload } from '../../server/schemas/mail';
import { enqueueMails } from '../../server/services/outbox.service';
import { inLanes } from './lanes';
import { timed, type Timings } from './timings';
import { plantsAndSites, waitingItems, waitingUsers, weekJobs, type WaitingItem, type WeekJob } from './digest-items';

// One digest per person per day: everything waiting for them goes into one outbox message keyed
// (person, date). If that day's digest has already gone (a site in a later time zone added more),
// the new items wait for the next day's. Items nobody should get any more (reminders turned off or
// paused, the person left the group, the job done or its window past) are dropped, not sent.

type Digest = MailPayload<'reminder-digest'>;
const USERS_PER_TRANSACTION = 500;
// Enough for a week's work at one go; the rest are in the calendar feed and on each plant's page.
const WEEKLY_LIST_LIMIT = 15;

export interface DigestLinks { appUrl: string }

export const digestKey = (userId: string, date: IsoDate) => `digest:${userId}:${date}`;

function isStillDue(item: WaitingItem, date: IsoDate): boolean {
  if (!item.isWanted) return false;
  if (item.kind === 'weekly') return item.passDate === date;
  return !item.isDone && item.closes !== null && item.closes >= date;
}

function weeklyFor(item: WaitingItem, jobsByGroup: Map<string, WeekJob[]>, groupNames: Map<string, string>): Digest['weekly'][number] {
  const all = jobsByGroup.get(item.groupId) ?? [];
  const mine = item.tasks === null ? all : all.filter((j) => item.tasks!.includes(j.task));
  // Jobs beyond those read are counted but not sorted by task, so a person's filter cannot apply to them.
  const unread = Math.max(0, Number(all[0]?.groupTotal ?? 0) - all.length);
  return {
    groupId: item.groupId, groupName: groupNames.get(item.groupId) ?? '', more: Math.max(0, mine.length - WEEKLY_LIST_LIMIT) + unread,
    jobs: mine.slice(0, WEEKLY_LIST_LIMIT).map(({ plantId, task, opens, closes }) => ({ plantId, task, opens, closes })),
  };
}

async function groupNamesOf(db: Sequelize, t: Transaction, groupIds: string[]): Promise<Map<string, string>> {
  const rows = await db.query<{ id: string; name: string }>('SELECT id, name FROM groups WHERE id = ANY($1::uuid[])', { bind: [groupIds], transaction: t, type: QueryTypes.SELECT });
  return new Map(rows.map((r) => [r.id, r.name]));
}

async function buildDigests(db: Sequelize, t: Transaction, items: WaitingItem[], date: IsoDate, links: DigestLinks, timings?: Timings): Promise<Map<string, Digest>> {
  const weeklyGroups = [...new Set(items.filter((i) => i.kind === 'weekly').map((i) => i.groupId))];
  const jobs = await timed(timings, 'digests: week jobs', () => weekJobs(db, t, weeklyGroups, date));
  const jobsByGroup = new Map<string, WeekJob[]>();
  for (const job of jobs) {
    const list = jobsByGroup.get(job.groupId) ?? [];
    list.push(job);
    jobsByGroup.set(job.groupId, list);
  }
  const groupNames = await groupNamesOf(db, t, weeklyGroups);
  const plantIds = new Set<string>([...items.flatMap((i) => (i.plantId ? [i.plantId] : [])), ...jobs.map((j) => j.plantId)]);
  const { plants, sites } = await timed(timings, 'digests: plants', () => plantsAndSites(db, t, [...plantIds]));
  const digests = new Map<string, Digest>();
  for (const item of items) {
    let digest = digests.get(item.userId);
    if (!digest) {
      digest = {
        name: item.name, date, appUrl: links.appUrl, preferencesUrl: `${links.appUrl}/account/reminders`,
        unsubscribeUrl: `${links.appUrl}/unsubscribe/${unsubscribeToken(item.userId)}`, sites: [], plants: [], jobs: [], weekly: [],
      };
      digests.set(item.userId, digest);
    }
    if (item.kind === 'weekly') digest.weekly.push(weeklyFor(item, jobsByGroup, groupNames));
    else if (item.plantId && plants.has(item.plantId)) {
      digest.jobs.push({
        windowId: item.windowId!, plantId: item.plantId, kind: item.kind, task: item.task!, opens: item.opens!, closes: item.closes!, basis: item.basis!, reason: item.reason!,
        degreeDays: item.degreeDays === null ? null : { total: item.degreeDays, baseC: item.baseC ?? 0, since: item.since ?? '', reachedOn: item.reachedOn },
      });
    }
  }
  for (const digest of digests.values()) {
    const ids = new Set([...digest.jobs.map((j) => j.plantId), ...digest.weekly.flatMap((w) => w.jobs.map((j) => j.plantId))]);
    digest.plants = [...ids].map((id) => plants.get(id)!).filter(Boolean);
    digest.sites = [...new Set(digest.plants.map((p) => p.siteId))].map((id) => sites.get(id)!).filter(Boolean);
  }
  return digests;
}

async function markItems(db: Sequelize, t: Transaction, ids: string[], key: string[]): Promise<void> {
  if (!ids.length) return;
  await db.query(
    'UPDATE reminder_deliveries rd SET digest_key = k.key FROM unnest($1::uuid[], $2::text[]) AS k(id, key) WHERE rd.id = k.id',
    { bind: [ids, key], transaction: t },
  );
}

async function assembleChunk(db: Sequelize, userIds: string[], date: IsoDate, links: DigestLinks, timings?: Timings): Promise<number> {
  return db.transaction(async (t) => {
    const items = await timed(timings, 'digests: items', () => waitingItems(db, t, userIds, date));
    const due = items.filter((i) => isStillDue(i, date));
    const digests = await timed(timings, 'digests: build', () => buildDigests(db, t, due, date, links, timings));
    const sendable = [...digests].filter(([, d]) => d.jobs.length > 0 || d.weekly.some((w) => w.jobs.length > 0));
    const emails = new Map(items.map((i) => [i.userId, i.email]));
    const queued = await timed(timings, 'digests: queue', () => enqueueMails(sendable.map(([userId, payload]) => ({ deliveryKey: digestKey(userId, date), kind: 'reminder-digest' as const, to: emails.get(userId)!, payload })), t));
    const hasDigest = (userId: string) => queued.has(digestKey(userId, date));
    const sendableUsers = new Set(sendable.map(([userId]) => userId));
    // Items in a queued digest name it; items nobody should get are dropped; the rest wait a day.
    const marked = items.flatMap((i) => {
      if (!isStillDue(i, date) || !sendableUsers.has(i.userId)) return [{ id: i.id, key: `dropped:${date}` }];
      return hasDigest(i.userId) ? [{ id: i.id, key: digestKey(i.userId, date) }] : [];
    });
    await timed(timings, 'digests: queue', () => markItems(db, t, marked.map((m) => m.id), marked.map((m) => m.key)));
    return queued.size;
  });
}

/**
 * Queues the day's digests; answers how many were queued. Chunks of people go `lanes` at a time, and
 * any number of workers may assemble at once: each chunk locks its people's waiting items in one
 * order (waitingItems), so a second worker meeting the same people waits, then finds them taken.
 */
export async function assembleDigests(db: Sequelize, date: IsoDate, links: DigestLinks, timings?: Timings, lanes = 1): Promise<number> {
  const users = await waitingUsers(db, date);
  let queued = 0;
  let from = 0;
  const lane = async () => {
    while (from < users.length) {
      const chunk = users.slice(from, (from += USERS_PER_TRANSACTION));
      const n = await assembleChunk(db, chunk, date, links, timings);
      queued += n;
    }
  };
  await inLanes(lanes, lane);
  return queued;
}
