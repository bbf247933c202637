import { createHash } from 'node:crypto';
import { siteSeason, windowsForPlant, type DailyTemperature, type IsoDate, type MonthlyNormal, type PlantInput } from '../../server/care';
import type { HealthFlag, PlantForm, PlantTypeCode } from '../../server/schemas/catalogue';
import { seasonsToRefresh } from './calendar';

// Turns one site's plants into care-window rows with the engine: siteSeason() once per site and
// season, windowsForPlant() per plant. Rows are kept column by column, ready for one bulk upsert.

export interface PassSite { id: string; groupId: string; latitude: number; longitude: number; timeZone: string }
export interface PassPlant { id: string; groupId: string; siteId: string; typeCode: PlantTypeCode; form: PlantForm; plantedYear: number | null; healthFlags: HealthFlag[] }
export interface Climate { readings: DailyTemperature[]; normals: MonthlyNormal[] }

export interface Place { siteId: string; groupId: string; season: number }

export class WindowColumns {
  /** Each site and season the rows are for; a row names its place by number (from 1), which costs less to send than three values. */
  readonly places: Place[] = [];
  readonly plantId: string[] = [];
  readonly place: number[] = [];
  readonly task: string[] = [];
  readonly ruleKey: string[] = [];
  readonly opens: string[] = [];
  readonly closes: string[] = [];
  readonly basis: string[] = [];
  readonly source: string[] = [];
  readonly reason: string[] = [];
  readonly detail: (string | null)[] = [];
  readonly triggerDegreeDays: (number | null)[] = [];
  readonly triggerBase: (number | null)[] = [];
  readonly triggerSince: (string | null)[] = [];
  readonly triggerReachedOn: (string | null)[] = [];

  get length(): number {
    return this.plantId.length;
  }

  /** Drops every row from `length` on (a site whose windows turned out unchanged); its places stay, unused. */
  truncate(length: number): void {
    for (const [name, column] of Object.entries(this) as [string, unknown[]][]) if (name !== 'places') column.length = length;
  }

  /** Each row's season, for the few sites whose stale windows are looked for. */
  seasons(): number[] {
    return this.place.map((n) => this.places[n - 1]!.season);
  }
}

// Window texts repeat across every plant of a type at a site (the engine shares them), so each
// distinct text is hashed once and the fingerprint takes the short hash.
const textHashes = new Map<string, string>();
function textHash(text: string | null): string {
  if (text === null) return '-';
  let hash = textHashes.get(text);
  if (hash === undefined) {
    if (textHashes.size > 20_000) textHashes.clear();
    hash = createHash('sha1').update(text).digest('base64').slice(0, 12);
    textHashes.set(text, hash);
  }
  return hash;
}

/**
 * A fingerprint of the site's rows from `first` on: every column that is written, a column at a
 * time. `runs` says which site, group and season each run of rows is for (place numbers differ from
 * batch to batch, so they are left out).
 */
function fingerprintRows(columns: WindowColumns, first: number, runs: string): string {
  const hash = createHash('sha1').update(runs);
  const { plantId, ruleKey, task, opens, closes, basis, triggerDegreeDays, triggerReachedOn, source, reason, detail } = columns;
  for (const column of [plantId, ruleKey, task, opens, closes, basis, triggerDegreeDays, triggerReachedOn] as unknown[][]) {
    hash.update(column.slice(first).join('\n'));
  }
  for (const column of [source, reason, detail]) hash.update(column.slice(first).map(textHash).join('\n'));
  return hash.digest('base64');
}

export interface SiteWindows { seasons: number[]; rows: number; fingerprint: string }

/**
 * Appends the site's windows to `columns`. Readings after `date` are left out, so a pass "as if on"
 * a past day sees what was known then.
 */
export function siteWindows(site: PassSite, plants: PassPlant[], climates: Map<number, Climate>, date: IsoDate, columns: WindowColumns): SiteWindows {
  const first = columns.length;
  const seasons = seasonsToRefresh(date, site.latitude);
  const runs: string[] = [];
  for (const season of seasons) {
    const climate = climates.get(season) ?? { readings: [], normals: [] };
    const known = climate.readings.length && (climate.readings.at(-1) as DailyTemperature).date > date ? climate.readings.filter((r) => r.date <= date) : climate.readings;
    const ss = siteSeason(site, season, known, climate.normals);
    const place = columns.places.push({ siteId: site.id, groupId: site.groupId, season });
    const before = columns.length;
    for (const plant of plants) {
      const input: PlantInput = { typeCode: plant.typeCode, form: plant.form, plantedYear: plant.plantedYear, healthFlags: plant.healthFlags };
      for (const w of windowsForPlant(input, ss, date)) {
        const t = w.triggeredBy;
        columns.plantId.push(plant.id);
        columns.place.push(place);
        columns.task.push(w.task);
        columns.ruleKey.push(w.key);
        columns.opens.push(w.opens);
        columns.closes.push(w.closes);
        columns.basis.push(w.basis);
        columns.source.push(w.source);
        columns.reason.push(w.reason);
        columns.detail.push(w.detail ?? null);
        columns.triggerDegreeDays.push(t ? t.degreeDays : null);
        columns.triggerBase.push(t ? t.base : null);
        columns.triggerSince.push(t ? t.since : null);
        columns.triggerReachedOn.push(t?.reachedOn ?? null);
      }
    }
    runs.push(`${site.id}/${site.groupId}/${season}/${columns.length - before}`);
  }
  const rows = columns.length - first;
  return { seasons, rows, fingerprint: `${seasons.join(',')}:${rows}:${fingerprintRows(columns, first, runs.join(','))}` };
}
