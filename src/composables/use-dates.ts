// Calendar dates travel as `YYYY-MM-DD`. Formatting pins the zone to UTC so that "1 June" never
// shows as "31 May" on a phone set to a zone west of Greenwich.

const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', timeZone: 'UTC' });
const dayYearFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const longFormat = new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

const asUtc = (iso: string) => new Date(`${iso}T00:00:00Z`);

/** "1 Jun", or "1 Jun 2026" with the year. */
export function formatDay(iso: string, withYear = false): string {
  return (withYear ? dayYearFormat : dayFormat).format(asUtc(iso));
}

export function formatLongDay(iso: string): string {
  return longFormat.format(asUtc(iso));
}

/** "1 Jun – 31 Aug 2026", naming the first year only when the range crosses into another. */
export function formatRange(from: string, to: string): string {
  const sameYear = from.slice(0, 4) === to.slice(0, 4);
  return `${formatDay(from, !sameYear)} – ${formatDay(to, true)}`;
}

/** Today on the phone's own calendar, which is the grower's day. */
export function todayLocal(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** "20:58" from an ISO time with offset, read in the offset it carries (the place's own clock). */
export function clockOf(isoWithOffset: string | null): string {
  return isoWithOffset ? isoWithOffset.slice(11, 16) : '—';
}

/** Brings an answer into view when it landed below the fold (on a phone); beside the form it stays put. */
export function revealIfBelow(el: HTMLElement | null): void {
  if (el && el.getBoundingClientRect().top > window.innerHeight * 0.6) el.scrollIntoView({ behavior: 'smooth', block: 'start' });
}

/** Day of the year, 0-based, of `iso` in its own year; for drawing dates along a year. */
export function dayIndex(iso: string): number {
  const d = asUtc(iso);
  return Math.round((d.getTime() - Date.UTC(d.getUTCFullYear(), 0, 1)) / 86_400_000);
}
