import { beforeEach, describe, expect, it } from 'vitest';
import { accumulate, windowDegreeDayMethod } from '../../server/care';
import { SiteReading } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { readingListSchema, uploadPreviewSchema, uploadResultSchema, UPLOAD_LIMIT_BYTES } from '../../server/schemas/readings';
import { siteWeatherSchema } from '../../server/schemas/weather';
import { resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { csvOf, days, readingsPath, seasonal, uploadImport, uploadPreview, weatherPath } from '../helpers/readings';

beforeEach(resetDatabase);

async function grower() {
  const f = await roleFixture();
  const client = await signedIn(f.people.grower.email);
  return { f, client, path: readingsPath(f.group.id, f.site.id) };
}

const stored = (siteId: string) => SiteReading.findAll({ where: { siteId }, order: [['date', 'ASC']], raw: true });

describe('POST …/readings/upload/preview', () => {
  it('detects the columns from names with units and reads the first rows', async () => {
    const { client, path } = await grower();
    const csv = 'Day,Min temp (°C),Max temp (°C),Rainfall (mm)\n2025-03-01,1.5,9.2,0.4\n2025-03-02,2.1,10.8,\n';
    const res = await uploadPreview(client, path, csv);
    expect(res.status).toBe(200);
    const body = uploadPreviewSchema.parse(res.body);
    expect(body.mapping).toEqual({ date: 0, tmin: 1, tmax: 2, rain: 3 });
    expect(body.unit).toBe('C');
    expect(body.mappingProblems).toEqual([]);
    expect(body.totals).toEqual({ rows: 2, valid: 2, withErrors: 0, alreadyStored: 0 });
    expect(body.rows[0]).toMatchObject({ row: 2, date: '2025-03-01', tminC: 1.5, tmaxC: 9.2, rainMm: 0.4, errors: [] });
    expect(await SiteReading.count()).toBe(0);
  });

  it.each([
    ['tmin / tmax', 'date,tmin,tmax'],
    ['minimum / maximum', 'Date,Minimum,Maximum'],
    ['low / high in °F', 'date,Low °F,High °F'],
    ['TMIN_C / TMAX_C', 'DATE,TMIN_C,TMAX_C'],
    ['semicolons', 'datum;min;max'],
  ])('finds the date, minimum and maximum in a header of %s', async (_name, header) => {
    const { client, path } = await grower();
    const sep = header.includes(';') ? ';' : ',';
    const date = header.startsWith('datum') ? null : 0;
    const res = await uploadPreview(client, path, `${header}\n2025-04-01${sep}40${sep}55\n`);
    const body = uploadPreviewSchema.parse(res.body);
    expect(body.mapping).toMatchObject({ date, tmin: 1, tmax: 2 });
    if (date === null) expect(body.mappingProblems).toContain('Choose the column with the date');
    if (header.includes('°F')) expect(body.unit).toBe('F');
  });

  it('reads a file without a header once the columns are chosen, and marks days already stored', async () => {
    const { f, client, path } = await grower();
    await SiteReading.create({ siteId: f.site.id, date: '2025-05-02', tminC: 5, tmaxC: 15, rainMm: null, source: 'manual' });
    const res = await uploadPreview(client, path, '02/05/2025,6,16\n03/05/2025,7,17\n', { mapping: { date: 0, tmin: 1, tmax: 2, rain: null }, dateOrder: 'dmy' });
    const body = uploadPreviewSchema.parse(res.body);
    expect(body.columns.map((c) => c.name)).toEqual(['Column 1', 'Column 2', 'Column 3']);
    expect(body.rows.map((r) => [r.row, r.date, r.isStored])).toEqual([[1, '2025-05-02', true], [2, '2025-05-03', false]]);
    expect(body.totals.alreadyStored).toBe(1);
  });
});

describe('POST …/readings/upload', () => {
  it('imports a good file: every row, in °C, with the totals', async () => {
    const { f, client, path } = await grower();
    const res = await uploadImport(client, path, csvOf(days('2025-01-01', 31, seasonal)));
    expect(res.status).toBe(200);
    expect(uploadResultSchema.parse(res.body)).toEqual({ added: 31, replaced: 0, skipped: 0, firstDate: '2025-01-01', lastDate: '2025-01-31', latestReading: '2025-01-31' });
    const rows = await stored(f.site.id);
    expect(rows).toHaveLength(31);
    expect(rows.every((r) => r.source === 'upload')).toBe(true);
  });

  it('converts °F to °C: 50 °F is 10 °C, 32 °F is 0 °C, 68.9 °F is 20.5 °C', async () => {
    const { f, client, path } = await grower();
    const csv = 'date,low (F),high (F)\n2025-06-01,50,68.9\n2025-06-02,32,50\n';
    expect((await uploadImport(client, path, csv)).status).toBe(200);
    const rows = await stored(f.site.id);
    expect(rows.map((r) => [r.date, r.tminC, r.tmaxC])).toEqual([['2025-06-01', 10, 20.5], ['2025-06-02', 0, 10]]);
  });

  it('refuses a file with bad rows, names each row, and writes nothing', async () => {
    const { f, client, path } = await grower();
    const csv = [
      'date,tmin,tmax',
      '2025-02-01,1,8', // row 2: fine
      '2025-02-30,1,8', // row 3: no such date
      '2025-02-03,9,4', // row 4: minimum above maximum
      '2025-02-04,-70,5', // row 5: below −60 °C
      '2025-02-01,2,7', // row 6: the date of row 2 again
      'someday,1,8', // row 7: unreadable
    ].join('\n');
    const res = await uploadImport(client, path, csv);
    expect(res.status).toBe(422);
    const { error } = errorEnvelopeSchema.parse(res.body);
    expect(error.code).toBe('UNPROCESSABLE');
    expect(error.message).toMatch(/5 rows need attention; nothing was imported/);
    const byRow = Object.fromEntries((error.issues ?? []).map((i) => [i.path, i.message]));
    expect(Object.keys(byRow)).toEqual(['rows.3', 'rows.4', 'rows.5', 'rows.6', 'rows.7']);
    expect(byRow['rows.3']).toMatch(/^Row 3: The date "2025-02-30" could not be read/);
    expect(byRow['rows.4']).toMatch(/^Row 4: The minimum \(9 °C\) is above the maximum \(4 °C\)/);
    expect(byRow['rows.5']).toMatch(/^Row 5: The minimum -70 °C is outside −60…60 °C/);
    expect(byRow['rows.6']).toMatch(/^Row 6: 2025-02-01 is also on row 2/);
    expect(await SiteReading.count({ where: { siteId: f.site.id } })).toBe(0);
  });

  it('leaves stored days alone when one row of a mixed file fails', async () => {
    const { f, client, path } = await grower();
    await SiteReading.create({ siteId: f.site.id, date: '2025-03-02', tminC: 4, tmaxC: 12, rainMm: null, source: 'manual' });
    const csv = csvOf(days('2025-03-01', 10, seasonal)).replace(/\n2025-03-07,[^\n]*/, '\n2025-03-07,12,3,');
    const res = await uploadImport(client, path, csv, { onExisting: 'replace' });
    expect(res.status).toBe(422);
    expect(errorEnvelopeSchema.parse(res.body).error.issues?.map((i) => i.path)).toEqual(['rows.8']);
    expect((await stored(f.site.id)).map((r) => [r.date, r.tminC, r.source])).toEqual([['2025-03-02', 4, 'manual']]);
  });

  it('skips or replaces the days already stored, as chosen', async () => {
    const { f, client, path } = await grower();
    await SiteReading.create({ siteId: f.site.id, date: '2025-03-02', tminC: 4, tmaxC: 12, rainMm: null, source: 'manual' });
    const csv = 'date,tmin,tmax\n2025-03-01,1,9\n2025-03-02,2,10\n';
    expect(uploadResultSchema.parse((await uploadImport(client, path, csv)).body)).toMatchObject({ added: 1, replaced: 0, skipped: 1 });
    expect((await SiteReading.findOne({ where: { siteId: f.site.id, date: '2025-03-02' } }))?.tminC).toBe(4);
    expect(uploadResultSchema.parse((await uploadImport(client, path, csv, { onExisting: 'replace' })).body)).toMatchObject({ added: 0, replaced: 2, skipped: 0 });
    expect((await SiteReading.findOne({ where: { siteId: f.site.id, date: '2025-03-02' } }))?.tminC).toBe(2);
  });

  it('reads day-first dates, a decimal comma and a Windows-1252 "°" in a semicolon file', async () => {
    const { f, client, path } = await grower();
    const text = 'Datum;Min (\u00b0C);Max (\u00b0C)\n13/04/2025;3,5;14,2\n14/04/2025;4;15\n';
    const file = Buffer.from(text, 'latin1');
    expect((await uploadImport(client, path, file, { mapping: { date: 0, tmin: 1, tmax: 2, rain: null } })).status).toBe(200);
    expect((await stored(f.site.id)).map((r) => [r.date, r.tminC, r.tmaxC])).toEqual([['2025-04-13', 3.5, 14.2], ['2025-04-14', 4, 15]]);
  });

  it.each([
    ['a spreadsheet workbook', Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2, 3, 4]), 'readings.csv', /spreadsheet workbook/],
    ['a picture', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]), 'readings.csv', /PNG picture/],
    ['binary bytes', Buffer.from([1, 0, 2, 0, 3, 0, 65, 66]), 'data.csv', /not a text file/],
    ['prose', Buffer.from('Dear allotment society, the shed key is under the pot.\n'), 'notes.csv', /does not look like a CSV file of readings/],
    ['an empty file', Buffer.alloc(0), 'empty.csv', /empty/],
  ])('answers 400 to %s and writes nothing', async (_name, file, filename, message) => {
    const { client, path } = await grower();
    for (const call of [uploadPreview, uploadImport]) {
      const res = await call(client, path, file, undefined, filename);
      expect(res.status).toBe(400);
      const { error } = errorEnvelopeSchema.parse(res.body);
      expect(error.code).toBe('VALIDATION_FAILED');
      expect(error.message).toMatch(message);
      expect(error.issues?.[0]?.path).toBe('file');
    }
    expect(await SiteReading.count()).toBe(0);
  });

  it('answers 413 to a file over 5 MB, with the limit in the message, and writes nothing', async () => {
    const { client, path } = await grower();
    const line = '2025-01-01,1.0,9.0\n';
    const big = 'date,tmin,tmax\n' + line.repeat(Math.ceil((UPLOAD_LIMIT_BYTES + 1024) / line.length));
    const res = await uploadImport(client, path, big);
    expect(res.status).toBe(413);
    const { error } = errorEnvelopeSchema.parse(res.body);
    expect(error.code).toBe('PAYLOAD_TOO_LARGE');
    expect(error.message).toMatch(/larger than 5 MB/);
    expect(await SiteReading.count()).toBe(0);
  });

  it('answers 400 when no file is sent, or the options are not JSON', async () => {
    const { client, path } = await grower();
    const none = await client.agent.post(`${path}/upload`).set('x-csrf-token', client.token).field('options', '{}');
    expect(none.status).toBe(400);
    expect(errorEnvelopeSchema.parse(none.body).error.issues?.[0]?.path).toBe('file');
    const bad = await client.agent.post(`${path}/upload`).set('x-csrf-token', client.token).attach('file', Buffer.from('date,tmin,tmax\n2025-01-01,1,2\n'), 'a.csv').field('options', '{nope');
    expect(bad.status).toBe(400);
    expect(errorEnvelopeSchema.parse(bad.body).error.issues?.[0]?.path).toBe('options');
  });

  it('gives the season the same degree-day total as the engine for the same days', async () => {
    const { f, client, path } = await grower();
    const year = days('2025-01-01', 365, seasonal);
    expect((await uploadImport(client, path, csvOf(year))).status).toBe(200);
    const weather = siteWeatherSchema.parse((await client.get(weatherPath(f.group.id, f.site.id, '?season=2025&base=5'))).body);
    const back = readingListSchema.parse((await client.get(`${path}?from=2025-01-01&to=2025-12-31`)).body).items;
    const engine = accumulate(back.map((r) => ({ date: r.date, tmin: r.tminC, tmax: r.tmaxC })), { ...windowDegreeDayMethod, lower: 5 });
    const fromFile = accumulate(year, { ...windowDegreeDayMethod, lower: 5 });
    expect(weather.readingDays).toBe(365);
    expect(weather.degreeDays.season.at(-1)).toBeCloseTo(engine.at(-1)!, 1);
    expect(Math.abs(engine.at(-1)! - fromFile.at(-1)!)).toBeLessThan(0.01); // stored as real: no drift worth the name
  });

  it('imports a year of daily rows in well under a second', async () => {
    const { f, client, path } = await grower();
    const csv = csvOf(days('2024-01-01', 366, seasonal));
    const started = performance.now();
    const res = await uploadImport(client, path, csv);
    const ms = performance.now() - started;
    expect(res.status).toBe(200);
    expect(await SiteReading.count({ where: { siteId: f.site.id } })).toBe(366);
    expect(ms).toBeLessThan(1000);
  });
});
