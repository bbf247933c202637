// Every message shares one frame: a plain-text part for any mail reader and a simple HTML part that
// reads well on a phone. Everything interpolated into HTML goes through `escapeHtml`.

export const escapeHtml = (value: string) =>
  value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

export interface RenderedMail { subject: string; text: string; html: string; headers?: Record<string, string> }

export function frame(subject: string, textBody: string, htmlBody: string): RenderedMail {
  const text = `${textBody}\n\n--\nSpurwood: care windows for fruit trees, bushes, canes and vines.\n`;
  const html = `<!doctype html><html><body style="margin:0;background:#f7f3ea;font-family:'Open Sans',Arial,sans-serif;color:#2b2a26">
<div style="max-width:560px;margin:0 auto;padding:24px">
<p style="font-size:18px;font-weight:700;color:#3f5d2a;margin:0 0 16px">Spurwood</p>
${htmlBody}
<p style="font-size:12px;color:#6b675c;margin-top:32px">Spurwood: care windows for fruit trees, bushes, canes and vines.</p>
</div></body></html>`;
  return { subject, text, html };
}
