import type { MailPayload } from '../../server/schemas/mail';
import { escapeHtml, frame, type RenderedMail } from './layout';

export function renderPasswordReset(p: MailPayload<'password-reset'>): RenderedMail {
  const text = [
    `Hello ${p.name},`,
    '',
    'Someone (we hope you) asked to reset the password of your Spurwood account.',
    `Choose a new password here within ${p.expiresInMinutes} minutes; the link works once:`,
    '',
    p.resetUrl,
    '',
    'If it was not you, ignore this message: your password stays as it is.',
  ].join('\n');
  const html = `<p>Hello ${escapeHtml(p.name)},</p>
<p>Someone (we hope you) asked to reset the password of your Spurwood account.
Choose a new password within ${p.expiresInMinutes} minutes; the link works once.</p>
<p><a href="${escapeHtml(p.resetUrl)}" style="display:inline-block;background:#3f5d2a;color:#fff;padding:12px 20px;border-radius:6px;text-decoration:none">Choose a new password</a></p>
<p style="font-size:13px">Or paste this address into your browser:<br>${escapeHtml(p.resetUrl)}</p>
<p>If it was not you, ignore this message: your password stays as it is.</p>`;
  return frame('Reset your Spurwood password', text, html);
}
