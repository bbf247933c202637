import { Membership } from '../models';
import type { Role } from '../schemas/group';

export async function findMembership(userId: string, groupId: string): Promise<{ groupId: string; role: Role } | null> {
  const row = await Membership.findOne({ where: { userId, groupId }, attributes: ['groupId', 'role'] });
  return row ? { groupId: row.groupId, role: row.role } : null;
}
