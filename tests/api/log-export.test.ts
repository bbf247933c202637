import Papa from 'papaparse';
import { beforeEach, describe, expect, it } from 'vitest';
import { seasonReportSchema } from '../../server/schemas/season-report';
import { createPlant, createSite, resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { feedBody, logPath, pruneBody } from '../helpers/log';

beforeEach(resetDatabase);

describe('GET /api/groups/:groupId/log/export.csv', () => {
  it('escapes cells that a spreadsheet would run as formulas and quotes commas, quotes and line breaks', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    await owner.post(logPath(f.group.id), { kind: 'note', doneOn: '2026-05-01', plantIds: [f.plant.id], details: {}, notes: '=HYPERLINK("http://evil.example","click")' }).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'note', doneOn: '2026-05-02', plantIds: [f.plant.id], details: {}, notes: '+1 more, "big" one\nsecond line' }).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'note', doneOn: '2026-05-03', plantIds: [f.plant.id], details: {}, notes: '-2 degrees' }).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'spray', doneOn: '2026-05-04', plantIds: [f.plant.id], details: { product: '@SUM(A1)', harvestIntervalDays: 7 } }).expect(201);
    const res = await owner.get(logPath(f.group.id, '/export.csv')).buffer(true).expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="spurwood-log-\d{4}-\d{2}-\d{2}\.csv"$/);
    const text = String(res.text);
    // Raw text: the formula cell starts with a quote mark, and the cell with a comma is wrapped in double quotes.
    expect(text).toContain(`"'=HYPERLINK(""http://evil.example"",""click"")"`);
    expect(text).toContain(`"'+1 more, ""big"" one\nsecond line"`);
    const rows = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true }).data;
    expect(rows.map((r) => r.Notes)).toEqual(['', "'-2 degrees", `'+1 more, "big" one\nsecond line`, `'=HYPERLINK("http://evil.example","click")`]);
    expect(rows[0]).toMatchObject({ Date: '2026-05-04', Kind: 'Spray', Details: "'@SUM(A1), 7-day harvest interval", Plants: 'Victoria plum', 'No picking before': '2026-05-11' });
  });

  it('exports only what the filters select', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    await owner.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'water', doneOn: '2026-06-01', plantIds: [f.plant.id], details: { litres: 10 } }).expect(201);
    const res = await owner.get(logPath(f.group.id, '/export.csv?kind=water')).buffer(true).expect(200);
    const rows = Papa.parse<Record<string, string>>(String(res.text).replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true }).data;
    expect(rows.map((r) => r.Kind)).toEqual(['Water']);
  });
});

describe('GET /api/groups/:groupId/log/report', () => {
  it('totals N, P2O5 and K2O per plant from feeds by weight, sharing an entry among its plants', async () => {
    const f = await roleFixture();
    const gage = await createPlant(f.group, f.site, 'Cambridge Gage', 'gage');
    const owner = await signedIn(f.people.owner.email);
    // 280 g of 7-7-7 over two plants: 140 g each, so 9.8 g of each nutrient.
    await owner.post(logPath(f.group.id), feedBody([f.plant.id, gage.id], { details: { product: 'Growmore', npk: { n: 7, p: 7, k: 7 }, amount: 280, unit: 'g', areaM2: 2 } } as never)).expect(201);
    // 0.1 kg of sulphate of potash (0-0-50) on the plum alone: 50 g of K2O.
    await owner.post(logPath(f.group.id), feedBody([f.plant.id], { doneOn: '2026-03-20', details: { product: 'Sulphate of potash', npk: { n: 0, p: 0, k: 50 }, amount: 0.1, unit: 'kg', areaM2: null } } as never)).expect(201);
    // A liquid feed cannot be weighed, so it is listed but not counted.
    await owner.post(logPath(f.group.id), feedBody([f.plant.id], { doneOn: '2026-07-01', details: { product: 'Tomato feed', npk: { n: 4, p: 2, k: 7 }, amount: 500, unit: 'ml', areaM2: null } } as never)).expect(201);
    const report = seasonReportSchema.parse((await owner.get(logPath(f.group.id, `/report?siteId=${f.site.id}&season=2026`)).expect(200)).body);
    const plum = report.feeds.find((p) => p.plantName === 'Victoria plum')!;
    expect(plum.totals).toEqual({ nG: 9.8, p2o5G: 9.8, k2oG: 59.8 });
    expect(plum.uncounted).toBe(1);
    expect(report.feeds.find((p) => p.plantName === 'Cambridge Gage')!.totals).toEqual({ nG: 9.8, p2o5G: 9.8, k2oG: 9.8 });
  });

  it('lists prunes with their verdicts, harvest weights by plant and leaves picked, for that site only', async () => {
    const f = await roleFixture();
    const vine = await createPlant(f.group, f.site, 'Black Hamburgh', 'grape-under-cover');
    const elsewhere = await createPlant(f.group, await createSite(f.group, 'Allotment'), 'Opal');
    const owner = await signedIn(f.people.owner.email);
    await owner.post(logPath(f.group.id), pruneBody([f.plant.id], '2026-07-20')).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'harvest', doneOn: '2026-08-20', plantIds: [f.plant.id], details: { weightKg: 4.5, count: null } }).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'harvest', doneOn: '2026-08-27', plantIds: [f.plant.id], details: { weightKg: 2, count: null } }).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'harvest', doneOn: '2026-08-27', plantIds: [elsewhere.id], details: { weightKg: 9, count: null } }).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'leaf-pick', doneOn: '2026-06-10', plantIds: [vine.id], details: { leafCount: 40, sizeBand: '10-15' } }).expect(201);
    await owner.post(logPath(f.group.id), { kind: 'leaf-pick', doneOn: '2025-06-10', plantIds: [vine.id], details: { leafCount: 99, sizeBand: '10-15' } }).expect(201);
    const report = seasonReportSchema.parse((await owner.get(logPath(f.group.id, `/report?siteId=${f.site.id}&season=2026`)).expect(200)).body);
    expect(report).toMatchObject({ site: { name: 'Top plot' }, season: 2026, from: '2026-01-01', to: '2026-12-31' });
    expect(report.prunes).toEqual([expect.objectContaining({ doneOn: '2026-07-20', plantName: 'Victoria plum', pruneType: 'summer', verdict: 'ok', doneBy: 'owner' })]);
    expect(report.harvests).toEqual([{ plantId: f.plant.id, plantName: 'Victoria plum', weightKg: 6.5, count: 0, picks: 2 }]);
    expect(report.leaves).toEqual([{ plantId: vine.id, plantName: 'Black Hamburgh grape vine (under cover)', leafCount: 40, picks: 1, sizeBands: ['10-15'] }]);
  });

  it('lists what was stored in the season from this site’s plants, and nothing from other sites', async () => {
    const f = await roleFixture();
    const vine = await createPlant(f.group, f.site, 'Black Hamburgh', 'grape-under-cover');
    const elsewhere = await createPlant(f.group, await createSite(f.group, 'Allotment'), 'Opal');
    const owner = await signedIn(f.people.owner.email);
    const store = `/api/groups/${f.group.id}/store`;
    await owner.post(store, { item: 'vine-leaves', plantIds: [vine.id], quantity: 40, unit: 'leaves', method: 'frozen', storedOn: '2026-06-11' }).expect(201);
    await owner.post(store, { item: 'stone-fruit', plantIds: [elsewhere.id], quantity: 3, unit: 'kg', method: 'frozen', storedOn: '2026-08-28' }).expect(201);
    await owner.post(store, { item: 'vine-leaves', plantIds: [vine.id], quantity: 30, unit: 'leaves', method: 'frozen', storedOn: '2025-06-11' }).expect(201);
    const report = seasonReportSchema.parse((await owner.get(logPath(f.group.id, `/report?siteId=${f.site.id}&season=2026`)).expect(200)).body);
    expect(report.stored).toEqual([expect.objectContaining({ item: 'vine-leaves', quantity: 40, method: 'frozen', storedOn: '2026-06-11', plantNames: ['Black Hamburgh grape vine (under cover)'] })]);
  });

  it('answers 404 for a site of another group', async () => {
    const f = await roleFixture();
    const theirs = await createSite(f.otherGroup);
    await (await signedIn(f.people.owner.email)).get(logPath(f.group.id, `/report?siteId=${theirs.id}`)).expect(404);
  });
});
