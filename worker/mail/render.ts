import { mailPayloadSchemas, type MailKind } from '../../server/schemas/mail';
import { renderInvitation } from './invitation';
import type { RenderedMail } from './layout';
import { renderPasswordReset } from './password-reset';
import { renderReminderDigest } from './reminder-digest';
import { renderStoreExpiry } from './store-expiry';

const renderers: { [K in MailKind]: (payload: never) => RenderedMail } = {
  'password-reset': renderPasswordReset,
  'reminder-digest': renderReminderDigest,
  invitation: renderInvitation,
  'store-expiry': renderStoreExpiry,
};

/** Renders a queued message; a payload that no longer matches its schema is an error to record, not to send. */
export function renderMail(kind: string, payload: unknown): RenderedMail {
  if (!(kind in mailPayloadSchemas)) throw new Error(`Unknown mail kind "${kind}"`);
  const typedKind = kind as MailKind;
  const parsed = mailPayloadSchemas[typedKind].parse(payload);
  return renderers[typedKind](parsed as never);
}
