import { inject } from 'vitest';
import { sequelize } from '../../server/db';
import * as deliverOutbox from '../../worker/jobs/deliver-outbox';
import { createMailer } from '../../worker/mailer';

export interface CaughtMail { subject: string; text: string; html: string; to: { address: string }[] }

const inbox = () => `http://127.0.0.1:${inject('maildevWebPort')}/api/email`;

/** Messages maildev holds for one address (the suites share one maildev, so always filter by recipient). */
export async function mailTo(address: string): Promise<CaughtMail[]> {
  const all = (await (await fetch(inbox())).json()) as CaughtMail[];
  return all.filter((m) => m.to.some((t) => t.address === address));
}

/** Runs the worker's outbox job once against the test maildev, as the worker would. */
export async function deliverQueuedMail() {
  const mailer = createMailer(`smtp://127.0.0.1:${inject('smtpPort')}`, 'Spurwood <test@spurwood.example.org>');
  try {
    return await deliverOutbox.run({ db: sequelize, mailer });
  } finally {
    mailer.close();
  }
}
