// Log entries and photos for the API tests: request bodies, paths and small real images.
import fs from 'node:fs';
import path from 'node:path';
import { Jimp } from 'jimp';
import { QueryTypes } from 'sequelize';
import { CareWindow, type Plant } from '../../server/models';
import type { LogEntryCreate } from '../../server/schemas/log';
import type { Client } from './api';

export const logPath = (groupId: string, rest = '') => `/api/groups/${groupId}/log${rest}`;

export function feedBody(plantIds: string[], over: Partial<LogEntryCreate> = {}): LogEntryCreate {
  return { kind: 'feed', doneOn: '2026-03-10', plantIds, details: { product: 'Growmore', npk: { n: 7, p: 7, k: 7 }, amount: 140, unit: 'g', areaM2: 1 }, ...over } as LogEntryCreate;
}

export function pruneBody(plantIds: string[], doneOn: string, extra: Record<string, unknown> = {}): LogEntryCreate {
  return { kind: 'prune', doneOn, plantIds, details: { pruneType: 'summer' }, ...extra } as LogEntryCreate;
}

/** A real picture, small enough to send quickly, made the way a phone's would be decoded. */
export async function imageBytes(type: 'image/jpeg' | 'image/png', width = 64, height = 48): Promise<Buffer> {
  const image = new Jimp({ width, height, color: 0x5b2a45ff });
  return type === 'image/png' ? image.getBuffer('image/png') : image.getBuffer('image/jpeg', { quality: 80 });
}

export function upload(client: Client, url: string, bytes: Buffer, name: string, contentType: string) {
  return client.agent.post(url).set('x-csrf-token', client.token).attach('file', bytes, { filename: name, contentType });
}

/** Every file under the group's upload folder, to prove a refused upload wrote none. */
export function filesOf(groupId: string): string[] {
  const dir = path.join(process.env.UPLOAD_DIR!, groupId);
  return fs.existsSync(dir) ? fs.readdirSync(dir) : [];
}

export async function windowFor(plant: Plant, task: string, opens: string, closes: string, season = Number(opens.slice(0, 4))): Promise<CareWindow> {
  // Raw SQL, as the worker writes windows: the id is the database's to work out (a generated column).
  const [row] = await CareWindow.sequelize!.query<{ id: string }>(
    `WITH wording AS (
       INSERT INTO care_window_wordings (id, source, reason) VALUES (care_window_wording_id('test', 'test window', NULL), 'test', 'test window')
       ON CONFLICT (id) DO UPDATE SET source = EXCLUDED.source RETURNING id)
     INSERT INTO care_windows (plant_id, group_id, site_id, season, task, rule_key, opens, closes, basis, wording_id)
     SELECT $1, $2, $3, $4, $5, $6, $7, $8, 'calendar', wording.id FROM wording RETURNING id`,
    { bind: [plant.id, plant.groupId, plant.siteId, season, task, `${task}-${opens}`, opens, closes], type: QueryTypes.SELECT },
  );
  return (await CareWindow.findByPk(row!.id))!;
}
