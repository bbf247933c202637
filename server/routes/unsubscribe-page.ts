import { config } from '../config';

const escape = (value: string) => value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

/** The plain page an unsubscribe link answers with; no script, readable on a phone. */
export function unsubscribePage(person: { name: string } | null): string {
  const body = person
    ? `<h1>Reminders are off</h1>
<p>${escape(person.name)}, Spurwood will not send you any more reminder e-mails. Anything already waiting to go has been withdrawn.</p>
<p>Changed your mind? Sign in and turn them back on in <a href="${escape(config.APP_URL)}/account/reminders">your reminder settings</a>.</p>`
    : `<h1>This link does not work</h1>
<p>It may have been cut short when it was copied. Sign in and turn reminders off in <a href="${escape(config.APP_URL)}/account/reminders">your reminder settings</a> instead.</p>`;
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${person ? 'Reminders are off' : 'Link not recognised'} · Spurwood</title></head>
<body style="margin:0;background:#f7f3ea;font-family:'Open Sans',Arial,sans-serif;color:#2b2a26;line-height:1.5">
<main style="max-width:36rem;margin:0 auto;padding:2rem 1.25rem">
<p style="font-weight:700;color:#3f5d2a">Spurwood</p>
${body}
</main></body></html>`;
}
