// Team, jobs and store fixtures for the API tests: paths, an open window, a stored batch.
import { todayIn } from '../../server/care';
import { CareWindow, Invitation, Membership, OutboxMessage, Plant, StoreBatch, type Group, type User } from '../../server/models';
import { roleFixture } from './api';
import { windowFor } from './log';

export const groupPath = (groupId: string, rest = '') => `/api/groups/${groupId}${rest}`;

/** The day the API counts as today for the fixture's London site. */
export const today = () => todayIn('Europe/London');

const shift = (iso: string, days: number) => new Date(Date.parse(`${iso}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
export { shift as addDays };

/** A feed window open today on the plant: three days in, three weeks to go. */
export async function openFeedWindow(plant: Plant): Promise<CareWindow> {
  return windowFor(plant, 'spring-feed', shift(today(), -3), shift(today(), 21));
}

export async function assign(window: CareWindow, user: User, by: User): Promise<void> {
  await CareWindow.sequelize!.query('UPDATE care_windows SET assigned_to = $1, assigned_by = $2, assigned_at = now() WHERE id = $3', { bind: [user.id, by.id, window.id] });
}

export async function storedBatch(group: Group, by: User, over: Partial<StoreBatch> = {}): Promise<StoreBatch> {
  return StoreBatch.create({
    groupId: group.id, item: 'vine-leaves', label: 'Blanched leaves', quantity: 40, unit: 'leaves', method: 'frozen', storedOn: '2026-06-10',
    warnOn: '2026-12-10', useBy: '2027-06-10', keepSource: 'test', notes: '', usedOn: null, usedBy: null, createdBy: by.id, ...over,
  } as StoreBatch);
}

/** The role fixture plus an open feed window handed to the helper, a stored batch and an invitation. */
export async function teamFixture() {
  const f = await roleFixture();
  const window = await openFeedWindow(f.plant);
  await assign(window, f.people.helper, f.people.owner);
  const batch = await storedBatch(f.group, f.people.helper);
  const invitation = await Invitation.create({
    groupId: f.group.id, email: 'new-helper@test.example.org', role: 'helper', tokenHash: 'a'.repeat(64), invitedBy: f.people.owner.id,
    expiresAt: new Date(Date.now() + 86_400_000), acceptedAt: null, acceptedBy: null, revokedAt: null,
  });
  return { ...f, window, batch, invitation };
}

/** Everything the team endpoints could write, to prove a refused call wrote nothing. */
export async function teamSnapshot(): Promise<string> {
  const q = <T>(sql: string) => CareWindow.sequelize!.query(sql, { type: 'SELECT' }) as Promise<T[]>;
  const [memberships, invitations, windows, batches, plants, log, outbox, deliveries] = await Promise.all([
    Membership.findAll({ attributes: ['groupId', 'userId', 'role'], order: [['userId', 'ASC'], ['groupId', 'ASC']], raw: true }),
    Invitation.findAll({ attributes: ['id', 'revokedAt', 'acceptedAt'], order: [['id', 'ASC']], raw: true }),
    q('SELECT id, assigned_to, done_at FROM care_windows ORDER BY id'),
    StoreBatch.findAll({ attributes: ['id', 'usedOn'], order: [['id', 'ASC']], raw: true }),
    Plant.count(),
    q('SELECT count(*) FROM log_entries'),
    OutboxMessage.count(),
    q('SELECT count(*) FROM reminder_deliveries'),
  ]);
  return JSON.stringify({ memberships, invitations, windows, batches, plants, log, outbox, deliveries });
}
