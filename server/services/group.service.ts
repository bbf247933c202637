import { sequelize } from '../db';
import { notFound } from '../lib/errors';
import { Group, Membership, User } from '../models';
import type { Group as GroupDto, GroupCreate, GroupUpdate, Role } from '../schemas/group';

function toGroup(group: Group, role: Role): GroupDto {
  return { id: group.id, name: group.name, kind: group.kind, role, createdAt: group.createdAt.toISOString() };
}

export async function listGroupsFor(userId: string): Promise<GroupDto[]> {
  const memberships = await Membership.findAll({
    where: { userId },
    include: [{ model: Group, as: 'group', required: true }],
    order: [[{ model: Group, as: 'group' }, 'name', 'ASC']],
  });
  return memberships.map((m) => toGroup((m as Membership & { group: Group }).group, m.role));
}

export async function createGroup(userId: string, input: GroupCreate): Promise<GroupDto> {
  return sequelize.transaction(async (transaction) => {
    const group = await Group.create({ name: input.name, kind: input.kind }, { transaction });
    await Membership.create({ groupId: group.id, userId, role: 'owner' }, { transaction });
    return toGroup(group, 'owner');
  });
}

export async function getGroup(groupId: string, role: Role): Promise<GroupDto> {
  const group = await Group.findByPk(groupId);
  if (!group) throw notFound('Group');
  return toGroup(group, role);
}

export async function updateGroup(groupId: string, role: Role, input: GroupUpdate): Promise<GroupDto> {
  const group = await Group.findByPk(groupId);
  if (!group) throw notFound('Group');
  await group.update({ ...(input.name !== undefined && { name: input.name }), ...(input.kind !== undefined && { kind: input.kind }) });
  return toGroup(group, role);
}

export async function listMembers(groupId: string) {
  const rows = await Membership.findAll({
    where: { groupId },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['createdAt', 'ASC']],
  });
  return rows.map((m) => {
    const user = (m as Membership & { user: User }).user;
    return { userId: user.id, name: user.name, email: user.email, role: m.role, joinedAt: m.createdAt.toISOString() };
  });
}
