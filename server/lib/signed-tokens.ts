import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { config } from '../config';

// Tokens that travel in links: HMAC-SHA256 under the server's secret, each with its own purpose in
// the signed text so a token made for one job can never be used for another.

const sign = (text: string) => createHmac('sha256', config.SESSION_SECRET).update(text).digest('base64url');

export const sha256Hex = (value: string) => createHash('sha256').update(value).digest('hex');

/** `<user id>.<signature>`: the one-click unsubscribe link's token. It does not expire. */
export function unsubscribeToken(userId: string): string {
  return `${userId}.${sign(`unsubscribe:${userId}`)}`;
}

/** The person an unsubscribe token names, or null when it is not one we signed. */
export function readUnsubscribeToken(token: string): string | null {
  const match = /^([0-9a-f-]{36})\.([A-Za-z0-9_-]{43})$/.exec(token);
  if (!match) return null;
  const [, userId, signature] = match as unknown as [string, string, string];
  const expected = Buffer.from(sign(`unsubscribe:${userId}`));
  const given = Buffer.from(signature);
  return given.length === expected.length && timingSafeEqual(given, expected) ? userId : null;
}

export const newCalendarNonce = () => randomBytes(16).toString('hex');

/**
 * The calendar feed's secret for a person and nonce. Only its SHA-256 is stored; the server can
 * work the token out again to show the link, and a new nonce makes the old link stop working.
 */
export function calendarToken(userId: string, nonce: string): string {
  return sign(`calendar:${userId}:${nonce}`);
}
