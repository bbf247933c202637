import type { MailPayload } from '../../server/schemas/mail';
import { digestView, type DigestView, type JobView, type SiteView } from './digest-view';
import { escapeHtml, frame, type RenderedMail } from './layout';

// The daily digest in plain text and in HTML, both from the same view.

export const GUIDANCE = [
  'These reminders are guidance, not a promise that a job is safe: you know the plant, the ground and the weather on the day.',
  'Follow your local rules (council, landlord, allotment society) and the label of any product you use.',
  'Large trees, anything that needs a chainsaw or climbing, and any work near power lines are for a qualified arborist; near lines, contact the electricity network operator first.',
];

const LINES_NOTE = 'Overhead lines are recorded at this site. Look up before you raise a ladder or a pole, and leave any branch near the wires to the electricity network operator or a qualified line-clearance arborist.';

const SAME_AS_ABOVE = 'And the other cautions given above for this site.';

const lightLine = (s: SiteView) =>
  s.light.sunset ? `Sunset today ${s.light.sunset}: finish ladder and cutting work by ${s.light.finishLadderWorkBy}.` : 'No sunset today at this site: plan ladder work for good light.';

function ladderLine(job: JobView): string | null {
  const l = job.safety.ladder;
  if (!l) return job.safety.isHeightUnknown ? 'Ladder: record the plant\u2019s height to see where to set the ladder.' : null;
  const setUp = `Ladder: for a rest point at ${l.heightM} m, set the foot ${l.footDistanceM.toFixed(2)} m out (one out for every four up) and use a ladder longer than ${l.ladderLengthM.toFixed(2)} m.`;
  return l.beyondLadder ? `${setUp} ${l.beyondLadder}` : setUp;
}

function jobText(job: JobView): string[] {
  const lines = [`  * ${job.title}. ${job.when}.`, `    Why now: ${job.why} ${job.reason}`];
  const ladder = ladderLine(job);
  if (ladder) lines.push(`    ${ladder}`);
  if (job.safety.tools.length) lines.push(`    Tools: ${job.safety.tools.join(', ')}.`);
  if (job.finishBy) lines.push(`    Finish ladder work by ${job.finishBy}.`);
  for (const c of job.cautions) lines.push(`    - ${c.severity === 'stop' ? 'STOP: ' : ''}${c.text}`);
  if (job.isSomeAbove) lines.push(`    - ${SAME_AS_ABOVE}`);
  return lines;
}

function toText(v: DigestView): string {
  const out = [`Hello ${v.name},`, '', `Your jobs from Spurwood for ${v.day}, with the care each one calls for.`];
  for (const site of v.sites) {
    out.push('', `== ${site.name} (${site.groupName}) ==`, lightLine(site));
    if (site.hasLines) out.push(LINES_NOTE);
    for (const plant of site.plants) out.push('', `${plant.title} (${plant.facts})`, `  ${plant.url}`, ...plant.jobs.flatMap(jobText));
  }
  for (const w of v.weekly) {
    out.push('', `== This week in ${w.groupName} ==`);
    if (!w.rows.length) out.push('Nothing is due this week.');
    for (const r of w.rows) out.push(`  * ${r.task}: ${r.plant}, ${r.site} (${r.dates}) ${r.url}`);
    if (w.more) out.push(`  …and ${w.more} more in the calendar.`);
  }
  if (v.everyday.length) out.push('', 'For every job:', ...v.everyday.map((c) => `  - ${c.text}`));
  out.push('', ...GUIDANCE, '', `Change what you get: ${v.preferencesUrl}`, `Stop these e-mails: ${v.unsubscribeUrl}`);
  return out.join('\n');
}

const h = escapeHtml;
const card = 'background:#fff;border:1px solid #e4dccb;border-radius:10px;padding:14px 16px;margin:12px 0';

function jobHtml(job: JobView): string {
  const ladder = ladderLine(job);
  const listed = job.cautions.map((c) => `<li style="margin:4px 0${c.severity === 'stop' ? ';color:#8a2a1c;font-weight:600' : ''}">${c.severity === 'stop' ? 'Stop: ' : ''}${h(c.text)}</li>`);
  const cautions = [...listed, ...(job.isSomeAbove ? [`<li style="margin:4px 0;color:#6b675c">${h(SAME_AS_ABOVE)}</li>`] : [])].join('');
  return `<div style="border-top:1px solid #eee6d6;padding-top:10px;margin-top:10px">
<p style="margin:0;font-weight:700;color:#3f5d2a">${h(job.title)}</p>
<p style="margin:2px 0 6px;font-weight:600">${h(job.when)}</p>
<p style="margin:0 0 6px;font-size:14px"><b>Why now:</b> ${h(job.why)} ${h(job.reason)}</p>
${ladder ? `<p style="margin:0 0 4px;font-size:14px"><b>Ladder:</b> ${h(ladder.replace(/^Ladder: /, ''))}</p>` : ''}
${job.safety.tools.length ? `<p style="margin:0 0 4px;font-size:14px"><b>Tools:</b> ${h(job.safety.tools.join(', '))}</p>` : ''}
${job.finishBy ? `<p style="margin:0 0 4px;font-size:14px"><b>Finish ladder work by ${h(job.finishBy)}.</b></p>` : ''}
${cautions ? `<ul style="margin:6px 0 0;padding-left:20px;font-size:14px">${cautions}</ul>` : ''}
</div>`;
}

function siteHtml(site: SiteView): string {
  const plants = site.plants.map((p) => `<div style="${card}">
<p style="margin:0;font-size:16px;font-weight:700"><a href="${h(p.url)}" style="color:#2b2a26">${h(p.title)}</a></p>
<p style="margin:2px 0 0;font-size:13px;color:#6b675c">${h(p.facts)}</p>
${p.jobs.map(jobHtml).join('')}
<p style="margin:10px 0 0;font-size:14px"><a href="${h(p.url)}" style="color:#3f5d2a">Open this plant in Spurwood</a></p>
</div>`).join('');
  return `<h2 style="font-size:18px;margin:24px 0 4px">${h(site.name)} <span style="font-weight:400;color:#6b675c;font-size:14px">${h(site.groupName)}</span></h2>
<p style="margin:0 0 4px;font-size:14px">${h(lightLine(site))}</p>
${site.hasLines ? `<p style="margin:4px 0;font-size:14px;background:#fbeee9;border-left:4px solid #8a2a1c;padding:8px 10px">${h(LINES_NOTE)}</p>` : ''}
${plants}`;
}

function toHtml(v: DigestView): string {
  const weekly = v.weekly.map((w) => `<h2 style="font-size:18px;margin:24px 0 4px">This week in ${h(w.groupName)}</h2>
${w.rows.length ? `<ul style="padding-left:20px;font-size:14px">${w.rows.map((r) => `<li style="margin:4px 0"><b>${h(r.task)}</b>: <a href="${h(r.url)}" style="color:#2b2a26">${h(r.plant)}</a>, ${h(r.site)} <span style="color:#6b675c">(${h(r.dates)})</span></li>`).join('')}</ul>` : '<p>Nothing is due this week.</p>'}
${w.more ? `<p style="font-size:14px">…and ${w.more} more in the calendar.</p>` : ''}`).join('');
  const everyday = v.everyday.length ? `<h2 style="font-size:16px;margin:24px 0 4px">For every job</h2><ul style="padding-left:20px;font-size:14px">${v.everyday.map((c) => `<li style="margin:4px 0">${h(c.text)}</li>`).join('')}</ul>` : '';
  return `<p>Hello ${h(v.name)},</p>
<p>Your jobs for <b>${h(v.day)}</b>, with the care each one calls for.</p>
${v.sites.map(siteHtml).join('')}
${weekly}
${everyday}
<div style="font-size:13px;color:#4a473f;border-top:1px solid #e4dccb;margin-top:24px;padding-top:12px">${GUIDANCE.map((g) => `<p style="margin:0 0 6px">${h(g)}</p>`).join('')}
<p style="margin:12px 0 0"><a href="${h(v.preferencesUrl)}" style="color:#3f5d2a">Change what you get</a> · <a href="${h(v.unsubscribeUrl)}" style="color:#3f5d2a">Stop these e-mails</a></p></div>`;
}

export function renderReminderDigest(payload: MailPayload<'reminder-digest'>): RenderedMail {
  const view = digestView(payload);
  return {
    ...frame(view.subject, toText(view), toHtml(view)),
    // RFC 2369 and RFC 8058: mail programs show their own one-click "unsubscribe" from these.
    headers: { 'List-Unsubscribe': `<${payload.unsubscribeUrl}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
  };
}
