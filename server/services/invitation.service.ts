import { randomBytes } from 'node:crypto';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { conflict, forbidden, notFound, validationFailed } from '../lib/errors';
import { sha256Hex } from '../lib/signed-tokens';
import { Group, Invitation, Membership, User } from '../models';
import type { Person } from '../schemas/auth';
import type { Role } from '../schemas/group';
import { INVITATION_DAYS, type Invitation as InvitationDto, type InvitationAccept, type InvitationAccepted, type InvitationCreate, type InvitationPreview } from '../schemas/team';
import { hashPassword, toPerson } from './account.service';
import { enqueueMail } from './outbox.service';

// Invitations by e-mail. The link carries a random token; only its SHA-256 is stored. It works once,
// for seven days. Accepting joins the account that is signed in, whatever its address: holding the
// link already proves the invited inbox was read, and many people keep one account under another
// address. Signed out, accepting creates an account for the invited address.

const DAY_MS = 86_400_000;
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
const inWords = (d: Date) => `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;

export interface Actor { userId: string; role: Role }

// DESIGN.md §2: owners invite anyone; growers invite helpers.
function assertMayInvite(actor: Actor, role: Role): void {
  if (actor.role === 'owner' || (actor.role === 'grower' && role === 'helper')) return;
  throw forbidden(actor.role === 'grower' ? `Growers may invite helpers; ask an owner to invite a ${role}` : 'Only owners and growers may invite people');
}

function toDto(row: Invitation, inviterName: string | null): InvitationDto {
  return { id: row.id, email: row.email, role: row.role, invitedByName: inviterName, expiresAt: row.expiresAt.toISOString(), createdAt: row.createdAt.toISOString() };
}

async function names(ids: (string | null)[]): Promise<Map<string, string>> {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))];
  const users = wanted.length ? await User.findAll({ where: { id: wanted }, attributes: ['id', 'name'] }) : [];
  return new Map(users.map((u) => [u.id, u.name]));
}

export async function listInvitations(groupId: string, now = new Date()): Promise<InvitationDto[]> {
  const rows = await Invitation.findAll({ where: { groupId, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: now } }, order: [['createdAt', 'DESC']] });
  const inviters = await names(rows.map((r) => r.invitedBy));
  return rows.map((r) => toDto(r, r.invitedBy ? (inviters.get(r.invitedBy) ?? null) : null));
}

export async function createInvitation(groupId: string, actor: Actor, input: InvitationCreate, appUrl: string, now = new Date()): Promise<InvitationDto> {
  assertMayInvite(actor, input.role);
  const existing = await User.findOne({ where: { email: input.email }, attributes: ['id'] });
  if (existing && (await Membership.count({ where: { groupId, userId: existing.id } }))) {
    throw conflict('This person is already in the group; change their role on the members list instead', [{ path: 'email', message: 'Already a member' }]);
  }
  const [group, inviter] = await Promise.all([Group.findByPk(groupId, { attributes: ['name'] }), User.findByPk(actor.userId, { attributes: ['name'] })]);
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(now.getTime() + INVITATION_DAYS * DAY_MS);
  const row = await sequelize.transaction(async (transaction) => {
    // A second invitation to the same address replaces the first, whose link stops working.
    await Invitation.update({ revokedAt: now }, { where: { groupId, email: input.email, acceptedAt: null, revokedAt: null }, transaction });
    const created = await Invitation.create(
      { groupId, email: input.email, role: input.role, tokenHash: sha256Hex(token), invitedBy: actor.userId, expiresAt, acceptedAt: null, acceptedBy: null, revokedAt: null },
      { transaction },
    );
    await enqueueMail({
      deliveryKey: `invitation:${created.id}`, kind: 'invitation', to: input.email,
      payload: { groupName: group?.name ?? 'a group', inviterName: inviter?.name ?? 'Someone', role: input.role, acceptUrl: `${appUrl}/invitations/${token}`, expiresOn: inWords(expiresAt) },
    }, transaction);
    return created;
  });
  return toDto(row, inviter?.name ?? null);
}

export async function revokeInvitation(groupId: string, actor: Actor, invitationId: string, now = new Date()): Promise<void> {
  const row = await Invitation.findOne({ where: { id: invitationId, groupId, acceptedAt: null, revokedAt: null } });
  if (!row) throw notFound('Invitation');
  assertMayInvite(actor, row.role);
  await row.update({ revokedAt: now });
}

const tokenIssue = (message: string) => validationFailed([{ path: 'token', message }], message);

/** The invitation behind a link, or the reason it no longer works (400 with issue path `token`). */
async function usableInvitation(token: string, now: Date, transaction?: Transaction): Promise<Invitation> {
  const row = await Invitation.findOne({ where: { tokenHash: sha256Hex(token) }, ...(transaction ? { transaction, lock: transaction.LOCK.UPDATE } : {}) });
  if (!row) throw notFound('Invitation');
  if (row.acceptedAt) throw tokenIssue('This invitation has already been accepted. Sign in to reach the group.');
  if (row.revokedAt) throw tokenIssue('This invitation was withdrawn or replaced by a newer one. Use the latest e-mail, or ask for a new invitation.');
  if (row.expiresAt <= now) throw tokenIssue(`This invitation expired on ${inWords(row.expiresAt)}. Ask the person who invited you to send a new one.`);
  return row;
}

export async function previewInvitation(token: string, now = new Date()): Promise<InvitationPreview> {
  const row = await usableInvitation(token, now);
  const [group, inviters, account] = await Promise.all([
    Group.findByPk(row.groupId, { attributes: ['name'] }), names([row.invitedBy]), User.count({ where: { email: row.email } }),
  ]);
  return {
    groupName: group?.name ?? '', role: row.role, email: row.email, invitedByName: row.invitedBy ? (inviters.get(row.invitedBy) ?? null) : null,
    expiresAt: row.expiresAt.toISOString(), hasAccount: account > 0,
  };
}

async function newAccount(email: string, input: InvitationAccept, transaction: Transaction): Promise<User> {
  const issues = [
    ...(input.name ? [] : [{ path: 'name', message: 'Tell us your name' }]),
    ...(input.password ? [] : [{ path: 'password', message: 'Choose a password of at least 10 characters' }]),
  ];
  if (issues.length) throw validationFailed(issues);
  try {
    return await User.create({ email, name: input.name!, passwordHash: await hashPassword(input.password!) }, { transaction });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw conflict('An account with this e-mail already exists; sign in first, then open the link again', [{ path: 'email', message: 'Already registered' }]);
    throw err;
  }
}

/**
 * Spends the invitation once: the row is locked, checked, the account made if need be, the
 * membership added and the row marked accepted, all in one transaction.
 */
export async function acceptInvitation(token: string, signedInId: string | null, input: InvitationAccept, now = new Date()): Promise<{ person: Person; accepted: InvitationAccepted }> {
  return sequelize.transaction(async (transaction) => {
    const row = await usableInvitation(token, now, transaction);
    const user = signedInId ? await User.findByPk(signedInId, { transaction }) : await newAccount(row.email, input, transaction);
    if (!user) throw notFound('Account');
    if (await Membership.count({ where: { groupId: row.groupId, userId: user.id }, transaction })) throw conflict('You are already in this group');
    await Membership.create({ groupId: row.groupId, userId: user.id, role: row.role }, { transaction });
    await row.update({ acceptedAt: now, acceptedBy: user.id }, { transaction });
    const group = await Group.findByPk(row.groupId, { attributes: ['id', 'name'], transaction });
    return { person: toPerson(user), accepted: { groupId: row.groupId, groupName: group?.name ?? '', role: row.role } };
  });
}
