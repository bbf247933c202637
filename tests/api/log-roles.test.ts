import { beforeEach, describe } from 'vitest';
import { CareWindow, LogEntry, LogEntryPlant, Photo } from '../../server/models';
import { resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { feedBody, filesOf, imageBytes, logPath, upload } from '../helpers/log';
import { members, roleMatrix, type MatrixAction, type Who } from '../helpers/role-matrix';

// DESIGN.md §2 and issue 6: helpers and above log work; viewers see the log and change nothing; an
// entry is deleted, or given photos, by its author or an owner. An outsider gets 404 everywhere.
type Fixture = Awaited<ReturnType<typeof roleFixture>> & { entryId: string; photoId: string };

const loggers: Who[] = ['owner', 'grower', 'helper'];
const plantPhotos = (f: Fixture) => `/api/groups/${f.group.id}/plants/${f.plant.id}/photos`;
const photo = (f: Fixture) => `/api/groups/${f.group.id}/photos/${f.photoId}`;

const actions: MatrixAction<Fixture>[] = [
  { name: 'list the log', allowed: members, call: (c, f) => c.get(logPath(f.group.id)) },
  { name: 'read an entry', allowed: members, call: (c, f) => c.get(logPath(f.group.id, `/${f.entryId}`)) },
  { name: 'export the log', allowed: members, call: (c, f) => c.get(logPath(f.group.id, '/export.csv')) },
  { name: 'read the season report', allowed: members, call: (c, f) => c.get(logPath(f.group.id, `/report?siteId=${f.site.id}&season=2026`)) },
  { name: 'check a cut', allowed: members, call: (c, f) => c.get(logPath(f.group.id, `/stone-fruit-check?date=2026-07-01&plantIds=${f.plant.id}`)) },
  { name: 'log work', allowed: loggers, call: (c, f) => c.post(logPath(f.group.id), feedBody([f.plant.id])) },
  // The entry in the fixture was recorded by the helper: the grower is not its author.
  { name: 'delete an entry', allowed: ['owner', 'helper'], call: (c, f) => c.delete(logPath(f.group.id, `/${f.entryId}`)) },
  { name: 'add a photo to an entry', allowed: ['owner', 'helper'], call: async (c, f) => upload(c, logPath(f.group.id, `/${f.entryId}/photos`), await imageBytes('image/png'), 'a.png', 'image/png') },
  { name: 'list a plant’s photos', allowed: members, call: (c, f) => c.get(plantPhotos(f)) },
  { name: 'add a photo to a plant', allowed: loggers, call: async (c, f) => upload(c, plantPhotos(f), await imageBytes('image/png'), 'a.png', 'image/png') },
  { name: 'see a photo', allowed: members, call: (c, f) => c.get(photo(f)) },
  // The fixture's photo was added by the helper.
  { name: 'delete a photo', allowed: ['owner', 'helper'], call: (c, f) => c.delete(photo(f)) },
];

async function fixture(): Promise<Fixture> {
  const f = await roleFixture();
  const helper = await signedIn(f.people.helper.email);
  const { body } = await helper.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
  const { body: added } = await upload(helper, `/api/groups/${f.group.id}/plants/${f.plant.id}/photos`, await imageBytes('image/png'), 'p.png', 'image/png').expect(201);
  return { ...f, entryId: body.id as string, photoId: added.id as string };
}

// Everything a refused call could have touched, files included.
async function snapshot(f: Fixture) {
  const [entries, links, photos, windows] = await Promise.all([
    LogEntry.findAll({ raw: true, order: [['id', 'ASC']] }), LogEntryPlant.findAll({ raw: true }), Photo.findAll({ raw: true, order: [['id', 'ASC']] }), CareWindow.findAll({ raw: true }),
  ]);
  return JSON.stringify({ entries, links, photos, windows, files: filesOf(f.group.id).sort() });
}

beforeEach(resetDatabase);

describe('role × action matrix for the work log and photos', () => {
  roleMatrix(actions, fixture, snapshot);
});
