import { z } from 'zod';
import type { IsoDate } from '../care';

// A weather-station service that serves daily readings over HTTP, behind one small interface so
// another provider means one more class, not changes to the services. `npm start` and the tests run
// a local fake of the one implemented here (scripts/lib/station-fake.ts).

export interface StationDay {
  date: IsoDate;
  tminC: number | null;
  tmaxC: number | null;
  rainMm: number | null;
}

export interface StationFeed {
  /** Daily readings for `from` … `to` (both included); days the station lacks are simply absent. */
  fetchDays(stationId: string, from: IsoDate, to: IsoDate): Promise<StationDay[]>;
}

/** The service did not answer, answered with a server error, or sent something we cannot read. */
export class StationUnavailableError extends Error {
  override readonly name = 'StationUnavailableError';
}

/** The service answered, but does not know this station. */
export class StationUnknownError extends Error {
  override readonly name = 'StationUnknownError';
}

// The service's own shape: its field names are not ours, and the adapter is where they stop.
const dailyResponseSchema = z.object({
  stationId: z.string(),
  units: z.object({ temperature: z.literal('degC'), precipitation: z.literal('mm') }),
  days: z.array(z.object({
    day: z.string().regex(/^\d{4}-\d{2}-\d{2}$/),
    low: z.number().nullable(),
    high: z.number().nullable(),
    precip: z.number().nullable().optional(),
  })),
});

export class HttpStationFeed implements StationFeed {
  constructor(private readonly baseUrl: string, private readonly timeoutMs = 8_000) {}

  async fetchDays(stationId: string, from: IsoDate, to: IsoDate): Promise<StationDay[]> {
    const url = new URL(`v1/stations/${encodeURIComponent(stationId)}/daily`, this.baseUrl.endsWith('/') ? this.baseUrl : `${this.baseUrl}/`);
    url.searchParams.set('start', from);
    url.searchParams.set('end', to);
    let response: Response;
    try {
      response = await fetch(url, { headers: { accept: 'application/json' }, signal: AbortSignal.timeout(this.timeoutMs) });
    } catch (err) {
      const why = err instanceof Error && err.name === 'TimeoutError' ? `did not answer within ${this.timeoutMs / 1000} s` : 'could not be reached';
      throw new StationUnavailableError(`The weather-station service ${why}`);
    }
    if (response.status === 404) throw new StationUnknownError(`The weather-station service does not know station "${stationId}"`);
    if (!response.ok) throw new StationUnavailableError(`The weather-station service answered with an error (HTTP ${response.status})`);
    const parsed = dailyResponseSchema.safeParse(await response.json().catch(() => null));
    if (!parsed.success) throw new StationUnavailableError('The weather-station service sent data we could not read');
    return parsed.data.days.map((d) => ({ date: d.day, tminC: d.low, tmaxC: d.high, rainMm: d.precip ?? null }));
  }
}
