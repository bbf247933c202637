// An invented world for the worker benchmark: groups of four people with two sites each, twenty
// plants per site, and a season of daily readings at every site, written with multi-row INSERTs
// (arrays unnested on the server, 20,000 rows a statement). Seeded, so every run is the same.
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { catalogue } from '../../server/care/catalogue';
import { plantTypeCodes, type PlantForm } from '../../server/schemas/catalogue';
import { seededRandom } from './seeded-random';

export interface WorldSize { people: number; sites: number; plants: number; readingsThrough: string }

const { random, between, pick } = seededRandom(20_261_203);

const formsByGroup: Record<string, readonly PlantForm[]> = {
  pome: ['bush', 'half-standard', 'standard', 'pyramid', 'spindle', 'cordon', 'espalier', 'fan'],
  stone: ['bush', 'half-standard', 'standard', 'pyramid', 'fan'],
  fig: ['bush', 'fan', 'standard'], vine: ['vine-rod-and-spur', 'vine-guyot'], bush: ['bush', 'cordon', 'fan', 'stool'], cane: ['cane-row', 'fan'],
};
// Zones with longitudes that roughly match them, so local 06:00 falls at a sensible UTC hour.
const NORTH_ZONES: readonly (readonly [string, number])[] = [['Europe/London', -2], ['Europe/Paris', 4], ['America/New_York', -75], ['America/Chicago', -90], ['America/Los_Angeles', -120]];
const SOUTH_ZONES: readonly (readonly [string, number])[] = [['Australia/Melbourne', 145], ['Pacific/Auckland', 175], ['America/Santiago', -71]];

const CHUNK = 20_000;

async function insert(db: pg.Client, table: string, columns: string[], types: string[], rows: unknown[][]): Promise<void> {
  for (let from = 0; from < rows.length; from += CHUNK) {
    const chunk = rows.slice(from, from + CHUNK);
    const arrays = columns.map((_, i) => chunk.map((r) => r[i]));
    // "text:varchar[]" sends text and casts it on the server (an array column cannot be unnested directly).
    const params = types.map((t, i) => `$${i + 1}::${t.split(':')[0]}[]`).join(', ');
    const select = types.map((t, i) => `c${i}${t.includes(':') ? `::${t.split(':')[1]}` : ''}`).join(', ');
    const names = types.map((_, i) => `c${i}`).join(', ');
    await db.query(`INSERT INTO ${table} (${columns.join(', ')}) SELECT ${select} FROM unnest(${params}) AS u(${names})`, arrays);
  }
}

function* days(from: string, through: string): Generator<[string, number]> {
  const end = Date.parse(`${through}T00:00:00Z`);
  for (let t = Date.parse(`${from}T00:00:00Z`), i = 0; t <= end; t += 86_400_000, i += 1) yield [new Date(t).toISOString().slice(0, 10), i];
}

export async function makeWorld(db: pg.Client, size: WorldSize): Promise<{ readings: number }> {
  const groups = Array.from({ length: size.sites / 2 }, () => randomUUID());
  await insert(db, 'groups', ['id', 'name', 'kind'], ['uuid', 'text', 'text'], groups.map((id, i) => [id, `Invented orchard ${i + 1}`, 'community-orchard']));
  const users = Array.from({ length: size.people }, (_, i) => [randomUUID(), `grower${i + 1}@bench.example.org`, `Grower ${i + 1}`, 'x']);
  await insert(db, 'users', ['id', 'email', 'name', 'password_hash'], ['uuid', 'text', 'text', 'text'], users);
  // Four people a group; one in ten is also in a second group.
  const members = users.map((u, i) => [u[0], groups[i % groups.length], i < groups.length ? 'owner' : 'helper']);
  for (let i = 0; i < size.people / 10; i += 1) members.push([users[i]![0], groups[(i + Math.floor(groups.length / 2)) % groups.length], 'viewer']);
  await insert(db, 'memberships', ['user_id', 'group_id', 'role'], ['uuid', 'uuid', 'text'], members);
  const sites = Array.from({ length: size.sites }, (_, i) => {
    const isSouth = random() < 0.3;
    const [zone, longitude] = pick(isSouth ? SOUTH_ZONES : NORTH_ZONES);
    const hazards = random() < 0.2 ? '{overhead-lines}' : random() < 0.2 ? '{sloping-ground,soft-ground}' : '{}';
    return [randomUUID(), groups[Math.floor(i / 2)], `Plot ${i + 1}`, (isSouth ? -1 : 1) * between(35, 56), longitude + between(-3, 3), zone, hazards];
  });
  await insert(db, 'sites', ['id', 'group_id', 'name', 'latitude', 'longitude', 'time_zone', 'hazards'], ['uuid', 'uuid', 'text', 'float8', 'float8', 'text', 'text:varchar[]'], sites);
  const plants = Array.from({ length: size.plants }, (_, i) => {
    const site = sites[Math.floor(i / (size.plants / size.sites))]!;
    const type = pick(plantTypeCodes);
    const flags = random() < 0.06 ? '{canker}' : '{}';
    return [randomUUID(), site[1], site[0], type, pick(formsByGroup[catalogue[type].group] ?? ['bush']), Math.floor(between(1995, 2026)), Math.round(between(0.8, 5) * 10) / 10, `Row ${1 + (i % 20)}`, flags];
  });
  await insert(db, 'plants', ['id', 'group_id', 'site_id', 'type_code', 'form', 'planted_year', 'height_m', 'position_label', 'health_flags'], ['uuid', 'uuid', 'uuid', 'text', 'text', 'int', 'float8', 'text', 'text:varchar[]'], plants);
  // A temperate year with day-to-day noise, from the start of each site's season to the pass's eve.
  let readings = 0;
  const rows: unknown[][] = [];
  for (const site of sites) {
    const lat = site[3] as number;
    const start = lat < 0 ? '2025-07-01' : '2026-01-01';
    const mean = 14 - 0.35 * (Math.abs(lat) - 40) + between(-2, 2);
    for (const [date, i] of days(start, size.readingsThrough)) {
      const seasonal = mean + 8 * Math.cos((2 * Math.PI * (i - (lat < 0 ? 18 : 200))) / 365);
      const range = between(6, 12);
      const tmin = Math.round((seasonal - range / 2 + between(-3, 3)) * 10) / 10;
      rows.push([site[0], date, tmin, Math.round((tmin + range) * 10) / 10, 'upload']);
    }
    if (rows.length >= 200_000) {
      readings += rows.length;
      await insert(db, 'site_readings', ['site_id', 'date', 'tmin_c', 'tmax_c', 'source'], ['uuid', 'date', 'real', 'real', 'text'], rows.splice(0));
    }
  }
  readings += rows.length;
  await insert(db, 'site_readings', ['site_id', 'date', 'tmin_c', 'tmax_c', 'source'], ['uuid', 'date', 'real', 'real', 'text'], rows);
  // Settled tables (hint bits set, statistics fresh), so no step pays for the load or waits on autovacuum.
  await db.query('VACUUM (ANALYZE)');
  await db.query('CHECKPOINT');
  return { readings };
}
