// Files of daily readings for the upload tests, and the two upload calls as a browser makes them.
import { addDays } from '../../server/care';
import type { UploadOptions } from '../../server/schemas/readings';
import type { Client } from './api';

export const readingsPath = (groupId: string, siteId: string, rest = '') => `/api/groups/${groupId}/sites/${siteId}/readings${rest}`;
export const weatherPath = (groupId: string, siteId: string, rest = '') => `/api/groups/${groupId}/sites/${siteId}/weather${rest}`;

export interface Day { date: string; tmin: number; tmax: number; rain?: number }

/** Days from `from`, one per day, with temperatures from `temps(i, date)`. */
export function days(from: string, count: number, temps: (i: number, date: string) => { tmin: number; tmax: number; rain?: number }): Day[] {
  return Array.from({ length: count }, (_, i) => {
    const date = addDays(from, i);
    return { date, ...temps(i, date) };
  });
}

/** A plain seasonal curve, so totals are not trivially round. */
export const seasonal = (i: number) => {
  const mean = 10 + 7 * Math.sin((2 * Math.PI * (i - 110)) / 365);
  return { tmin: Math.round((mean - 4) * 10) / 10, tmax: Math.round((mean + 4) * 10) / 10, rain: i % 3 === 0 ? 1.2 : 0 };
};

export function csvOf(rows: Day[], header = 'date,tmin,tmax,rain'): string {
  return [header, ...rows.map((d) => `${d.date},${d.tmin},${d.tmax},${d.rain ?? ''}`)].join('\n') + '\n';
}

export function uploadPreview(client: Client, path: string, file: Buffer | string, options?: UploadOptions, name = 'readings.csv') {
  const req = client.agent.post(`${path}/upload/preview`).set('x-csrf-token', client.token).attach('file', Buffer.from(file), name);
  return options ? req.field('options', JSON.stringify(options)) : req;
}

export function uploadImport(client: Client, path: string, file: Buffer | string, options?: UploadOptions, name = 'readings.csv') {
  const req = client.agent.post(`${path}/upload`).set('x-csrf-token', client.token).attach('file', Buffer.from(file), name);
  return options ? req.field('options', JSON.stringify(options)) : req;
}
