import type { MailPayload } from '../../server/schemas/mail';
import { escapeHtml, frame, type RenderedMail } from './layout';

// What each role may do, in the words of the group page (DESIGN.md §2).
const roleWords = {
  owner: 'an owner: you can change everything in the group, its people included',
  grower: 'a grower: you can add and edit plants, weather and the log, and invite helpers',
  helper: 'a helper: you can log work on the plants and tick off jobs handed to you',
  viewer: 'a viewer: you can see the plants, windows and log, but not change them',
} as const;

export function renderInvitation(p: MailPayload<'invitation'>): RenderedMail {
  const text = [
    'Hello,',
    '',
    `${p.inviterName} has invited you to join ${p.groupName} on Spurwood as ${roleWords[p.role]}.`,
    `Accept by ${p.expiresOn}; the link works once:`,
    '',
    p.acceptUrl,
    '',
    'If you did not expect this, ignore the message: nothing happens unless you open the link and accept.',
  ].join('\n');
  const html = `<p>Hello,</p>
<p>${escapeHtml(p.inviterName)} has invited you to join <b>${escapeHtml(p.groupName)}</b> on Spurwood as ${escapeHtml(roleWords[p.role])}.</p>
<p><a href="${escapeHtml(p.acceptUrl)}" style="display:inline-block;background:#3f5d2a;color:#fff;padding:12px 20px;border-radius:6px;text-decoration:none">See the invitation</a></p>
<p style="font-size:13px">Accept by ${escapeHtml(p.expiresOn)}; the link works once. Or paste this address into your browser:<br>${escapeHtml(p.acceptUrl)}</p>
<p>If you did not expect this, ignore the message: nothing happens unless you open the link and accept.</p>`;
  return frame(`${p.inviterName} invited you to ${p.groupName} on Spurwood`, text, html);
}
