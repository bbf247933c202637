// Care-window throughput: 5,000 invented sites with a full season of synthetic daily readings each,
// 100,000 plants of mixed types and forms. Run with `npx tsx scripts/bench-windows.ts`.
// Optional: SITES=… PLANTS=… SEASON=… ON=YYYY-MM-DD in the environment.
import { performance } from 'node:perf_hooks';
import { plantForms, plantTypeCodes, type HealthFlag, type PlantForm, type PlantTypeCode } from '../server/schemas/catalogue';
import { catalogue } from '../server/care/catalogue';
import { addDays, daysBetween } from '../server/care/dates';
import type { DailyTemperature } from '../server/care/degree-days';
import { seasonEnd, seasonStart } from '../server/care/projection';
import { siteSeason, windowsForPlant, type PlantInput, type SiteInput } from '../server/care/windows';
import { seededRandom } from './lib/seeded-random';

const SITES = Number(process.env.SITES ?? 5_000);
const PLANTS = Number(process.env.PLANTS ?? 100_000);
const SEASON = Number(process.env.SEASON ?? 2025);
const ON = process.env.ON ?? `${SEASON}-06-15`;

const { random, between, pick } = seededRandom(20_250_615);

interface BenchSite {
  site: SiteInput;
  readings: DailyTemperature[];
}

// Readings arrive from the database with one date string per row; sites in a hemisphere share the
// season's dates, as rows parsed from one query would not, but that keeps generation quick.
const seasonDates = new Map<string, string[]>();
function datesOf(hemisphere: 'north' | 'south'): string[] {
  let dates = seasonDates.get(hemisphere);
  if (!dates) {
    const start = seasonStart(SEASON, hemisphere);
    dates = Array.from({ length: daysBetween(start, seasonEnd(SEASON, hemisphere)) + 1 }, (_, i) => addDays(start, i));
    seasonDates.set(hemisphere, dates);
  }
  return dates;
}

/** A temperate annual cycle (warmest about three weeks after midsummer) with day-to-day noise. */
function syntheticSeason(latitude: number): DailyTemperature[] {
  const hemisphere = latitude < 0 ? 'south' : 'north';
  const dates = datesOf(hemisphere);
  const days = dates.length;
  const mean = 14 - 0.35 * (Math.abs(latitude) - 40) + between(-2, 2);
  const swing = between(6, 11);
  const peakDay = hemisphere === 'north' ? 200 : 200 - 182; // day of the season
  const out: DailyTemperature[] = new Array(days);
  for (let i = 0; i < days; i++) {
    const seasonal = mean + swing * Math.cos((2 * Math.PI * (i - peakDay)) / 365);
    const range = between(6, 12);
    const tmin = seasonal - range / 2 + between(-3, 3);
    out[i] = { date: dates[i] as string, tmin, tmax: tmin + range };
  }
  return out;
}

function makeSites(): BenchSite[] {
  return Array.from({ length: SITES }, () => {
    const isSouth = random() < 0.3;
    const latitude = (isSouth ? -1 : 1) * between(35, 58);
    return { site: { latitude, longitude: between(-180, 180) }, readings: syntheticSeason(latitude) };
  });
}

const formsByGroup: Record<string, readonly PlantForm[]> = {
  pome: ['bush', 'half-standard', 'standard', 'pyramid', 'spindle', 'cordon', 'espalier', 'fan', 'stepover'],
  stone: ['bush', 'half-standard', 'standard', 'pyramid', 'fan'],
  fig: ['bush', 'fan', 'standard'],
  vine: ['vine-rod-and-spur', 'vine-guyot'],
  bush: ['bush', 'cordon', 'fan', 'stool', 'standard'],
  cane: ['cane-row', 'fan', 'other'],
};
const flags: readonly HealthFlag[] = ['silver-leaf', 'canker', 'dead-wood', 'mildew'];

// Plants come grouped by site, as a worker reads them: one site's season is computed, its plants
// get their windows, and the season can then be dropped.
function makePlants(): { plant: PlantInput; siteIndex: number }[] {
  const plants = Array.from({ length: PLANTS }, () => {
    const typeCode: PlantTypeCode = pick(plantTypeCodes);
    const form = pick(formsByGroup[catalogue[typeCode].group] ?? plantForms);
    const plantedYear = random() < 0.1 ? null : Math.floor(between(SEASON - 30, SEASON + 1));
    const healthFlags = random() < 0.06 ? [pick(flags)] : [];
    return { plant: { typeCode, form, plantedYear, healthFlags }, siteIndex: Math.floor(random() * SITES) };
  });
  return plants.sort((a, b) => a.siteIndex - b.siteIndex);
}

// Peak memory, sampled while the work runs (Node gives no high-water mark for the heap).
const peak = { rss: 0, heapUsed: 0 };
function sampleMemory(): void {
  const m = process.memoryUsage();
  if (m.rss > peak.rss) peak.rss = m.rss;
  if (m.heapUsed > peak.heapUsed) peak.heapUsed = m.heapUsed;
}

interface RunTimes {
  siteMs: number;
  plantMs: number;
  /** CPU time of this process over the whole run (user + system): what one core spent, whatever else the machine runs. */
  cpuMs: number;
  windows: number;
  open: number;
}

// process.cpuUsage() costs microseconds, so it is read once per run, not around every site.
const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

function run(sites: BenchSite[], plants: { plant: PlantInput; siteIndex: number }[]): RunTimes {
  const times: RunTimes = { siteMs: 0, plantMs: 0, cpuMs: 0, windows: 0, open: 0 };
  const cpuStart = cpuMs();
  let next = 0;
  for (let i = 0; i < sites.length; i++) {
    const s = sites[i] as BenchSite;
    const t0 = performance.now();
    const season = siteSeason(s.site, SEASON, s.readings);
    const t1 = performance.now();
    for (; next < plants.length && (plants[next] as { siteIndex: number }).siteIndex === i; next++) {
      const list = windowsForPlant((plants[next] as { plant: PlantInput }).plant, season, ON);
      times.windows += list.length;
      for (const w of list) if (w.state === 'open' || w.state === 'closing') times.open++;
    }
    times.plantMs += performance.now() - t1;
    times.siteMs += t1 - t0;
    if (i % 250 === 0) sampleMemory();
  }
  times.cpuMs = cpuMs() - cpuStart;
  sampleMemory();
  return times;
}

const fmt = (n: number) => Math.round(n).toLocaleString('en-GB');
const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(0)} MB`;
const perSecond = (ms: number) => fmt(plants.length / (ms / 1000));

const genStart = performance.now();
const sites = makeSites();
const plants = makePlants();
console.log(`Generated ${fmt(sites.length)} sites (${fmt(sites.reduce((n, s) => n + s.readings.length, 0))} daily readings) and ${fmt(plants.length)} plants in ${fmt(performance.now() - genStart)} ms`);

// A short warm-up so the timed runs measure compiled code, not the first interpretation of it.
run(sites.slice(0, 200), plants.filter((p) => p.siteIndex < 200));

const RUNS = Number(process.env.RUNS ?? 3);
const runs: RunTimes[] = [];
console.log(`Season ${SEASON}, states on ${ON}; ${RUNS} timed runs`);
for (let i = 0; i < RUNS; i++) {
  const r = run(sites, plants);
  runs.push(r);
  console.log(`  run ${i + 1}: sites ${fmt(r.siteMs)} ms, plants ${fmt(r.plantMs)} ms, total ${fmt(r.siteMs + r.plantMs)} ms wall, ${fmt(r.cpuMs)} ms CPU`);
}
const best = runs.reduce((a, b) => (a.siteMs + a.plantMs <= b.siteMs + b.plantMs ? a : b));
console.log(`Best run (${fmt(best.windows)} windows, ${fmt(best.open)} open or closing):`);
console.log(`  siteSeason() for every site (projection):          ${fmt(best.siteMs)} ms for ${fmt(sites.length)} sites`);
console.log(`  windowsForPlant() for every plant:                  ${fmt(best.plantMs)} ms for ${fmt(plants.length)} plants (each site's degree-days and triggers are worked out here, once, on first need)`);
console.log(`  total:                                              ${fmt(best.siteMs + best.plantMs)} ms wall (the whole run took ${fmt(best.cpuMs)} ms of CPU, bookkeeping included)`);
console.log(`  plant-seasons per second, site work included:       ${perSecond(best.siteMs + best.plantMs)} (by CPU time ${perSecond(best.cpuMs)})`);
console.log(`  plant-seasons per second, windowsForPlant only:     ${perSecond(best.plantMs)}`);
console.log(`  peak memory: rss ${mb(peak.rss)}, heapUsed ${mb(peak.heapUsed)} (sampled during the runs; the generated readings account for most of it)`);
