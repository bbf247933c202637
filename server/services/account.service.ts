import { createHash, randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { Op, UniqueConstraintError } from 'sequelize';
import { config } from '../config';
import { sequelize } from '../db';
import { conflict, validationFailed } from '../lib/errors';
import { PasswordResetToken, User } from '../models';
import type { Person, Register } from '../schemas/auth';
import { enqueueMail } from './outbox.service';

const RESET_LIFETIME_MINUTES = 60;

export function toPerson(user: User): Person {
  return { id: user.id, email: user.email, name: user.name, isAdmin: user.isAdmin, createdAt: user.createdAt.toISOString() };
}

export const hashPassword = (password: string) => bcrypt.hash(password, config.BCRYPT_COST);

// A fixed hash to compare against when the account does not exist, so a wrong e-mail costs as much
// time as a wrong password and sign-in timing does not reveal who has an account.
const decoyHash = bcrypt.hashSync(randomBytes(16).toString('hex'), config.BCRYPT_COST);

export async function verifyCredentials(email: string, password: string): Promise<Person | null> {
  const user = await User.findOne({ where: { email } });
  const matches = await bcrypt.compare(password, user?.passwordHash ?? decoyHash);
  return user && matches ? toPerson(user) : null;
}

export async function findPerson(id: string): Promise<Person | null> {
  const user = await User.findByPk(id);
  return user ? toPerson(user) : null;
}

export async function register(input: Register): Promise<Person> {
  try {
    const user = await User.create({ email: input.email, name: input.name, passwordHash: await hashPassword(input.password) });
    return toPerson(user);
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw conflict('An account with this e-mail already exists; sign in or reset the password', [{ path: 'email', message: 'Already registered' }]);
    throw err;
  }
}

export async function changePassword(userId: string, currentPassword: string, newPassword: string): Promise<void> {
  const user = await User.findByPk(userId);
  if (!user || !(await bcrypt.compare(currentPassword, user.passwordHash))) {
    throw validationFailed([{ path: 'currentPassword', message: 'This is not your current password' }]);
  }
  user.passwordHash = await hashPassword(newPassword);
  await user.save();
}

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

/** Queues a reset message when the account exists; says nothing either way to the caller. */
export async function requestPasswordReset(email: string, appUrl: string, now = new Date()): Promise<void> {
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const token = randomBytes(32).toString('base64url');
  await sequelize.transaction(async (transaction) => {
    await PasswordResetToken.create(
      { userId: user.id, tokenHash: sha256(token), expiresAt: new Date(now.getTime() + RESET_LIFETIME_MINUTES * 60_000), usedAt: null },
      { transaction },
    );
    await enqueueMail(
      {
        deliveryKey: `password-reset:${sha256(token)}`,
        kind: 'password-reset',
        to: user.email,
        payload: { name: user.name, resetUrl: `${appUrl}/reset-password?token=${token}`, expiresInMinutes: RESET_LIFETIME_MINUTES },
      },
      transaction,
    );
  });
}

/** Spends a reset token once: the row is locked, checked and marked used in one transaction. */
export async function resetPassword(token: string, newPassword: string, now = new Date()): Promise<void> {
  const passwordHash = await hashPassword(newPassword);
  await sequelize.transaction(async (transaction) => {
    const row = await PasswordResetToken.findOne({
      where: { tokenHash: sha256(token), usedAt: null, expiresAt: { [Op.gt]: now } },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!row) throw validationFailed([{ path: 'token', message: 'This reset link has expired or was already used; ask for a new one' }], 'This reset link has expired or was already used');
    await row.update({ usedAt: now }, { transaction });
    await User.update({ passwordHash }, { where: { id: row.userId }, transaction });
    // Other outstanding links for the same account stop working too.
    await PasswordResetToken.update({ usedAt: now }, { where: { userId: row.userId, usedAt: null }, transaction });
  });
}
