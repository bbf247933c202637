// A small local stand-in for a weather-station service, on loopback: `npm start` runs it for the
// demo and the tests start their own. It serves invented, deterministic daily readings in the
// service's own shape (which server/lib/station-feed.ts adapts), only for days that have ended.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { addDays, daysBetween, isIsoDate, todayIn } from '../../server/care';
import { inventedDays, type InventedClimate } from './invented-weather';

export interface FakeStation extends InventedClimate { name: string }

/** The stations the fake knows; the demo sites are linked to the first two. */
export const fakeStations: Record<string, FakeStation> = {
  'HV-1024': { name: 'Hollin Vale, east field', latitude: 52.41, shift: 0.4 },
  'SL-2051': { name: 'Sallow Lane allotments', latitude: 52.43, shift: -0.3 },
  'TEST-01': { name: 'Test station', latitude: 51.5 },
};

export const MAX_RANGE_DAYS = 400;

export interface StationFakeOptions {
  port?: number;
  host?: string;
  /** The fake's clock; readings are served up to the day before this date (UTC). */
  now?: () => Date;
  stations?: Record<string, FakeStation>;
}

export interface RunningStationFake { url: string; port: number; requests: number; close(): Promise<void> }

function send(res: http.ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { 'content-type': 'application/json' });
  res.end(JSON.stringify(body));
}

function answer(url: URL, stations: Record<string, FakeStation>, now: () => Date, res: http.ServerResponse): void {
  if (url.pathname === '/health') return send(res, 200, { status: 'ok' });
  const match = /^\/v1\/stations\/([^/]+)\/daily$/.exec(url.pathname);
  if (!match) return send(res, 404, { message: 'No such path' });
  const id = decodeURIComponent(match[1]!);
  const station = stations[id];
  if (!station) return send(res, 404, { message: `Unknown station ${id}` });
  const start = url.searchParams.get('start') ?? '';
  const end = url.searchParams.get('end') ?? '';
  if (!isIsoDate(start) || !isIsoDate(end) || start > end) return send(res, 400, { message: 'start and end must be dates, start first' });
  if (daysBetween(start, end) >= MAX_RANGE_DAYS) return send(res, 400, { message: `Ask for at most ${MAX_RANGE_DAYS} days` });
  const lastComplete = addDays(todayIn('UTC', now()), -1);
  const to = end < lastComplete ? end : lastComplete;
  const days = start > to ? [] : inventedDays(`station:${id}`, start, to, station).map((d) => ({ day: d.date, low: d.tmin, high: d.tmax, precip: d.rain }));
  send(res, 200, { stationId: id, units: { temperature: 'degC', precipitation: 'mm' }, days });
}

export function startStationFake(options: StationFakeOptions = {}): Promise<RunningStationFake> {
  const stations = options.stations ?? fakeStations;
  const now = options.now ?? (() => new Date());
  const state = { requests: 0 };
  const server = http.createServer((req, res) => {
    state.requests++;
    if (req.method !== 'GET') return send(res, 405, { message: 'GET only' });
    answer(new URL(req.url ?? '/', 'http://fake.invalid'), stations, now, res);
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, options.host ?? '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      resolve({
        url: `http://127.0.0.1:${port}`,
        port,
        get requests() { return state.requests; },
        close: () => new Promise<void>((done) => { server.closeAllConnections(); server.close(() => done()); }),
      });
    });
  });
}
