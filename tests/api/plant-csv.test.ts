import { beforeEach, describe, expect, it } from 'vitest';
import { Plant, Site } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { plantCsvImportResultSchema, plantCsvPreviewSchema } from '../../server/schemas/plant-csv';
import { createPlant, createSite, resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { groupPath } from '../helpers/team';

beforeEach(resetDatabase);

const envelope = (body: unknown) => errorEnvelopeSchema.parse(body).error;

const goodFile = [
  'Site,Type,Cultivar,Rootstock,Form,Planted year,Height m,Position,Notes',
  'Top plot,Apple,Egremont Russet,M26,Espalier,2014,"1,8",South wall,',
  'top plot,sweet cherry,Stella,Gisela 5,bush,2018,3,Row A,Gummy patch',
  'Top plot,blackcurrant,,,stool,,,,',
].join('\n');

describe('GET /api/groups/:groupId/plants/csv', () => {
  it('exports the plants as CSV, with formula-like cells escaped so a spreadsheet shows them as text', async () => {
    const f = await roleFixture();
    const p = await createPlant(f.group, f.site, '=HYPERLINK("http://evil.example","click")');
    await p.update({ notes: '@SUM(A1:A9)', positionLabel: '-1 row, by the gate' });
    const res = await (await signedIn(f.people.viewer.email)).get(groupPath(f.group.id, '/plants/csv')).expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="spurwood-plants-\d{4}-\d{2}-\d{2}\.csv"$/);
    const lines = res.text.replace(/^\uFEFF/, '').split('\r\n');
    expect(lines[0]).toBe('site,type,cultivar,rootstock,form,planted year,height m,position,health,notes');
    expect(lines).toContain(`Top plot,plum,"'=HYPERLINK(""http://evil.example"",""click"")",,bush,2015,2.5,"'-1 row, by the gate",,'@SUM(A1:A9)`);
    expect(lines).toContain('Top plot,plum,Victoria,,bush,2015,2.5,,,');
  });

  it('imports its own export back as it was', async () => {
    const f = await roleFixture();
    await createPlant(f.group, f.site, '+plus sign');
    const owner = await signedIn(f.people.owner.email);
    const exported = (await owner.get(groupPath(f.group.id, '/plants/csv'))).text;
    const preview = plantCsvPreviewSchema.parse((await owner.post(groupPath(f.group.id, '/plants/csv/preview'), { csv: exported }).expect(200)).body);
    expect(preview.rows.map((r) => r.cultivar).sort()).toEqual(['+plus sign', 'Victoria']);
  });
});

describe('POST /api/groups/:groupId/plants/csv/preview', () => {
  it('reads codes or labels in any case, and writes nothing', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.grower.email)).post(groupPath(f.group.id, '/plants/csv/preview'), { csv: goodFile }).expect(200);
    const preview = plantCsvPreviewSchema.parse(res.body);
    expect(preview).toMatchObject({ total: 3, valid: 3, columns: { ignored: [] } });
    expect(preview.rows.map((r) => [r.row, r.site, r.typeCode, r.form, r.heightM])).toEqual([
      [2, 'Top plot', 'apple', 'espalier', 1.8], [3, 'Top plot', 'cherry-sweet', 'bush', 3], [4, 'Top plot', 'blackcurrant', 'stool', null],
    ]);
    expect(await Plant.count()).toBe(1);
  });

  it('names each problem by row number and column', async () => {
    const f = await roleFixture();
    await Site.update({ archivedAt: new Date() }, { where: { id: (await createSite(f.group, 'Old orchard')).id } });
    const csv = ['site,type,form,planted year,height m', 'Nowhere,apple,bush,,', 'Top plot,banana,bush,,', 'Top plot,apple,bush,3000,40', 'Old orchard,pear,cordon,,'].join('\n');
    const preview = plantCsvPreviewSchema.parse((await (await signedIn(f.people.owner.email)).post(groupPath(f.group.id, '/plants/csv/preview'), { csv }).expect(200)).body);
    expect(preview.valid).toBe(0);
    expect(preview.rows.map((r) => [r.row, r.issues.map((i) => `${i.column}: ${i.message}`)])).toEqual([
      [2, ['site: No site called “Nowhere” in this group; add it first or fix the name']],
      [3, ['type: “banana” is not a plant type we know']],
      [4, ['planted year: Planted year cannot be in the future', 'height m: Height must be 30 m or less']],
      [5, ['site: Old orchard is archived; restore it first']],
    ]);
  });

  it('answers 400 when the header lacks a required column', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.owner.email)).post(groupPath(f.group.id, '/plants/csv/preview'), { csv: 'site,cultivar\nTop plot,Opal' }).expect(400);
    expect(envelope(res.body).issues?.[0]).toEqual({ path: 'csv', message: expect.stringMatching(/type, form are missing/) });
  });
});

describe('POST /api/groups/:groupId/plants/csv/import', () => {
  it('adds every row in one go', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.grower.email)).post(groupPath(f.group.id, '/plants/csv/import'), { csv: goodFile }).expect(201);
    expect(plantCsvImportResultSchema.parse(res.body)).toEqual({ added: 3 });
    const stella = await Plant.findOne({ where: { cultivar: 'Stella' } });
    expect(stella).toMatchObject({ groupId: f.group.id, siteId: f.site.id, typeCode: 'cherry-sweet', rootstock: 'Gisela 5', plantedYear: 2018, heightM: 3, notes: 'Gummy patch' });
  });

  it('writes nothing when any row is wrong: 422 with an issue per bad row', async () => {
    const f = await roleFixture();
    const csv = `${goodFile}\nTop plot,apple,,,bonsai,,,,`;
    const res = await (await signedIn(f.people.owner.email)).post(groupPath(f.group.id, '/plants/csv/import'), { csv }).expect(422);
    expect(envelope(res.body)).toMatchObject({
      code: 'UNPROCESSABLE', message: '1 of 4 rows need attention; nothing was imported', issues: [{ path: 'rows.5', message: 'Row 5: form: “bonsai” is not a form we know' }],
    });
    expect(await Plant.count()).toBe(1);
  });

  it('cannot reach another group’s site by its name', async () => {
    const f = await roleFixture();
    await createSite(f.otherGroup, 'Their plot');
    const res = await (await signedIn(f.people.owner.email)).post(groupPath(f.group.id, '/plants/csv/import'), { csv: 'site,type,form\nTheir plot,apple,bush' }).expect(422);
    expect(envelope(res.body).issues?.[0]?.message).toMatch(/No site called “Their plot”/);
    expect(await Plant.count()).toBe(1);
  });
});
