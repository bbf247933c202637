import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { conflict, notFound } from '../lib/errors';
import { Membership } from '../models';
import type { Role } from '../schemas/group';
import type { Member } from '../schemas/team';
import { listMembers } from './group.service';

// Role changes, removals and leaving. A group always keeps at least one owner: the memberships of
// the group are locked first, so two owners stepping down at the same moment cannot both succeed.

const LAST_OWNER = 'A group needs at least one owner. Make someone else an owner first.';

async function lockedMemberships(groupId: string, transaction: Transaction): Promise<{ userId: string; role: Role }[]> {
  return sequelize.query<{ userId: string; role: Role }>(
    'SELECT user_id AS "userId", role FROM memberships WHERE group_id = $1 ORDER BY user_id FOR UPDATE',
    { bind: [groupId], transaction, type: QueryTypes.SELECT },
  );
}

async function findLocked(groupId: string, userId: string, transaction: Transaction) {
  const all = await lockedMemberships(groupId, transaction);
  const member = all.find((m) => m.userId === userId);
  if (!member) throw notFound('Member');
  const owners = all.filter((m) => m.role === 'owner').length;
  return { member, isLastOwner: member.role === 'owner' && owners === 1 };
}

export async function changeRole(groupId: string, userId: string, role: Role): Promise<Member> {
  await sequelize.transaction(async (transaction) => {
    const { isLastOwner } = await findLocked(groupId, userId, transaction);
    if (isLastOwner && role !== 'owner') throw conflict(LAST_OWNER);
    await Membership.update({ role }, { where: { groupId, userId }, transaction });
    // A viewer logs no work, so jobs handed to someone who becomes a viewer go back to the pool.
    if (role === 'viewer') await releaseJobs(groupId, userId, transaction);
  });
  return (await listMembers(groupId)).find((m) => m.userId === userId)!;
}

/** Removes someone (an owner's act) or lets them leave; the last owner may do neither. */
export async function removeMember(groupId: string, userId: string): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const { isLastOwner } = await findLocked(groupId, userId, transaction);
    if (isLastOwner) throw conflict(LAST_OWNER);
    await Membership.destroy({ where: { groupId, userId }, transaction });
    await releaseJobs(groupId, userId, transaction);
  });
}

async function releaseJobs(groupId: string, userId: string, transaction: Transaction): Promise<void> {
  await sequelize.query(
    `UPDATE care_windows SET assigned_to = NULL, assigned_by = NULL, assigned_at = NULL, updated_at = now()
     WHERE group_id = $1 AND assigned_to = $2 AND done_at IS NULL`,
    { bind: [groupId, userId], transaction },
  );
  await sequelize.query(
    `DELETE FROM reminder_deliveries WHERE group_id = $1 AND user_id = $2 AND kind = 'assigned' AND digest_key IS NULL`,
    { bind: [groupId, userId], transaction },
  );
}
