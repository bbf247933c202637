import type { MailPayload } from '../../server/schemas/mail';
import { escapeHtml, frame, type RenderedMail } from './layout';

export function renderStoreExpiry(p: MailPayload<'store-expiry'>): RenderedMail {
  const batch = `${p.what} (${p.quantity}, ${p.method.toLowerCase()} on ${p.storedOn})`;
  const text = [
    `Hello ${p.name},`,
    '',
    `In ${p.groupName}'s store: ${batch} should be used by ${p.useBy}, a week from now.`,
    'Use it soon, or check it before you do. When it has gone, mark it used so the store list stays true:',
    '',
    p.storeUrl,
    '',
    `Change what you get: ${p.preferencesUrl}`,
  ].join('\n');
  const html = `<p>Hello ${escapeHtml(p.name)},</p>
<p>In ${escapeHtml(p.groupName)}'s store: <b>${escapeHtml(batch)}</b> should be used by <b>${escapeHtml(p.useBy)}</b>, a week from now.</p>
<p>Use it soon, or check it before you do. When it has gone, mark it used so the store list stays true.</p>
<p><a href="${escapeHtml(p.storeUrl)}" style="display:inline-block;background:#3f5d2a;color:#fff;padding:12px 20px;border-radius:6px;text-decoration:none">Open the store list</a></p>
<p style="font-size:13px"><a href="${escapeHtml(p.preferencesUrl)}" style="color:#3f5d2a">Change what you get</a></p>`;
  return frame(`Use by ${p.useBy}: ${p.what}`, text, html);
}
