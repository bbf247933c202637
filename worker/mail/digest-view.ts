import type { Caution, IsoDate } from '../../server/care';
import { plantFormLabels, plantTypeLabels, type PlantForm, type PlantTypeCode } from '../../server/schemas/catalogue';
import type { MailPayload } from '../../server/schemas/mail';
import { reminderTaskLabels, type ReminderTaskCode } from '../../server/schemas/reminders';
import { jobSafety, siteLight, type JobSafety, type SiteLight } from './job-safety';

// The digest as the grower will read it, before it becomes text or HTML: sites, then plants, then
// each plant's jobs with their dates, why they are due and what care they call for.

type Digest = MailPayload<'reminder-digest'>;
type Plant = Digest['plants'][number];
type Job = Digest['jobs'][number];

/** `cautions` leaves out the warnings an earlier job at the same site already gave; stop cautions always show. */
export interface JobView { title: string; when: string; why: string; reason: string; safety: JobSafety; cautions: Caution[]; isSomeAbove: boolean; finishBy: string | null }
export interface PlantView { title: string; facts: string; url: string; jobs: JobView[] }
export interface SiteView { name: string; groupName: string; light: SiteLight; hasLines: boolean; plants: PlantView[] }
export interface WeeklyView { groupName: string; rows: { plant: string; site: string; task: string; dates: string; url: string }[]; more: number }
export interface DigestView { subject: string; name: string; day: string; sites: SiteView[]; weekly: WeeklyView[]; everyday: Caution[]; preferencesUrl: string; unsubscribeUrl: string }

const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];

const dayMonth = (date: IsoDate) => `${Number(date.slice(8, 10))} ${MONTHS[Number(date.slice(5, 7)) - 1] ?? ''}`;
export const longDate = (date: IsoDate) => `${WEEKDAYS[new Date(`${date}T12:00:00Z`).getUTCDay()] ?? ''} ${dayMonth(date)}`;

export const taskLabel = (task: string) => reminderTaskLabels[task as ReminderTaskCode] ?? task;

function plantTitle(p: Plant): string {
  const type = plantTypeLabels[p.typeCode as PlantTypeCode] ?? p.typeCode;
  return p.cultivar ? `'${p.cultivar}' ${type.toLowerCase()}` : type;
}

function plantFacts(p: Plant): string {
  const parts = [plantFormLabels[p.form as PlantForm] ?? p.form, p.positionLabel, p.heightM === null ? 'height not recorded' : `${p.heightM} m tall`];
  return parts.filter(Boolean).join(' · ');
}

function when(job: Job, date: IsoDate): string {
  if (job.kind === 'assigned') return job.opens > date ? `Handed to you: opens ${longDate(job.opens)}, open until ${longDate(job.closes)}` : `Handed to you: open until ${longDate(job.closes)}`;
  if (job.kind === 'closing') return `Closing: the window ends ${longDate(job.closes)}`;
  return job.opens === date ? `Opens today, and stays open until ${longDate(job.closes)}` : `Opens ${longDate(job.opens)}, and stays open until ${longDate(job.closes)}`;
}

function why(job: Job): string {
  const dd = job.degreeDays;
  if (!dd) return 'Set by the calendar.';
  const total = `${dd.total} degree-days above ${dd.baseC} °C since ${dayMonth(dd.since)}`;
  if (!dd.reachedOn) return `Timed by the season's warmth; ${total} were not reached in time, so it follows the latest usual date.`;
  if (job.basis === 'readings') return `Timed by the season's warmth: ${total}, reached on ${dayMonth(dd.reachedOn)} by this site's readings.`;
  return `Timed by the season's warmth: ${total} are expected around ${dayMonth(dd.reachedOn)} (projected from typical temperatures until readings cover it).`;
}

function jobView(job: Job, plant: Plant, site: Digest['sites'][number], date: IsoDate, light: SiteLight, given: Set<string>): JobView {
  const safety = jobSafety(job.task, plant, site, date);
  const cautions = safety.cautions.filter((c) => c.severity === 'stop' || !given.has(c.code));
  for (const c of safety.cautions) given.add(c.code);
  return {
    title: taskLabel(job.task), when: when(job, date), why: why(job), reason: job.reason, safety, cautions,
    isSomeAbove: cautions.length < safety.cautions.length, finishBy: safety.ladder ? light.finishLadderWorkBy : null,
  };
}

// Closing windows first: they are the ones that will not wait.
const byUrgency = (a: Job, b: Job) => (a.kind === b.kind ? (a.closes < b.closes ? -1 : 1) : a.kind === 'closing' ? -1 : 1);

// A job handed to the person may also be opening or closing for them: say it once, as theirs.
function onePerWindow(jobs: Job[]): Job[] {
  const assigned = new Set(jobs.filter((j) => j.kind === 'assigned').map((j) => j.windowId));
  return jobs.filter((j) => j.kind === 'assigned' || !assigned.has(j.windowId));
}

export function digestView(digest: Digest): DigestView {
  const d = { ...digest, jobs: onePerWindow(digest.jobs) };
  const plants = new Map(d.plants.map((p) => [p.id, p]));
  const url = (plantId: string) => `${d.appUrl}/plants/${plantId}`;
  const everyday = new Map<string, Caution>();
  const sites = [...d.sites].sort((a, b) => a.name.localeCompare(b.name)).map((site): SiteView => {
    const light = siteLight(site, d.date);
    const here = d.plants.filter((p) => p.siteId === site.id && d.jobs.some((j) => j.plantId === p.id));
    here.sort((a, b) => a.positionLabel.localeCompare(b.positionLabel));
    const given = new Set<string>();
    const plantViews = here.map((p) => {
      const jobs = d.jobs.filter((j) => j.plantId === p.id).sort(byUrgency).map((j) => jobView(j, p, site, d.date, light, given));
      for (const j of jobs) for (const c of j.safety.everyday) everyday.set(c.code, c);
      return { title: plantTitle(p), facts: plantFacts(p), url: url(p.id), jobs };
    });
    return { name: site.name, groupName: site.groupName, light, hasLines: site.hazards.includes('overhead-lines'), plants: plantViews };
  }).filter((s) => s.plants.length > 0);
  const siteNames = new Map(d.sites.map((s) => [s.id, s.name]));
  const weekly = d.weekly.map((w) => ({
    groupName: w.groupName,
    more: w.more,
    rows: w.jobs.map((j) => {
      const p = plants.get(j.plantId);
      return { plant: p ? plantTitle(p) : 'A plant', site: p ? (siteNames.get(p.siteId) ?? '') : '', task: taskLabel(j.task), dates: `${dayMonth(j.opens)} – ${dayMonth(j.closes)}`, url: url(j.plantId) };
    }),
  }));
  const count = d.jobs.length;
  const jobsPart = count ? `${count} job${count === 1 ? '' : 's'} to plan` : 'no new jobs';
  const subject = `Spurwood for ${longDate(d.date)}: ${jobsPart}${weekly.length ? ', and this week\u2019s list' : ''}`;
  return { subject, name: d.name, day: longDate(d.date), sites, weekly, everyday: [...everyday.values()], preferencesUrl: d.preferencesUrl, unsubscribeUrl: d.unsubscribeUrl };
}
