import { beforeEach, describe, expect, it } from 'vitest';
import { Photo } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { photoSchema } from '../../server/schemas/log';
import { PHOTO_LIMIT_BYTES } from '../../server/schemas/photos';
import { resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { feedBody, filesOf, imageBytes, logPath, upload } from '../helpers/log';

beforeEach(resetDatabase);

const plantPhotos = (groupId: string, plantId: string) => `/api/groups/${groupId}/plants/${plantId}/photos`;
const envelope = (body: unknown) => errorEnvelopeSchema.parse(body).error;

describe('POST /api/groups/:groupId/plants/:plantId/photos', () => {
  it('keeps a PNG under a random name and serves it to members with its type, privately', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const bytes = await imageBytes('image/png');
    const photo = photoSchema.parse((await upload(helper, plantPhotos(f.group.id, f.plant.id), bytes, 'Victoria.png', 'image/png').expect(201)).body);
    const [file, thumb] = filesOf(f.group.id).sort((a, b) => a.length - b.length);
    expect(file).toMatch(/^[0-9a-f]{32}$/);
    expect(thumb).toMatch(/^[0-9a-f]{32}-thumb$/);
    const viewer = await signedIn(f.people.viewer.email);
    const full = await viewer.get(photo.url).buffer(true).expect(200);
    expect(full.headers['content-type']).toBe('image/png');
    expect(full.headers['cache-control']).toBe('private, max-age=86400');
    expect(Buffer.compare(full.body as Buffer, bytes)).toBe(0);
    const small = await viewer.get(photo.thumbUrl).buffer(true).expect(200);
    expect(small.headers['content-type']).toBe('image/jpeg');
  });

  it('makes a thumbnail no more than 480 px across from a large JPEG', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const photo = photoSchema.parse((await upload(owner, plantPhotos(f.group.id, f.plant.id), await imageBytes('image/jpeg', 1600, 1200), 'a.jpg', 'image/jpeg').expect(201)).body);
    const { Jimp } = await import('jimp');
    const thumb = await Jimp.read((await owner.get(photo.thumbUrl).buffer(true).expect(200)).body as Buffer);
    expect([thumb.width, thumb.height]).toEqual([480, 360]);
  });

  it('answers 400 for a text file named .jpg and sent as image/jpeg, writing no row and no file', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const res = await upload(owner, plantPhotos(f.group.id, f.plant.id), Buffer.from('not a picture at all\n'), 'plum.jpg', 'image/jpeg').expect(400);
    expect(envelope(res.body).issues).toEqual([{ path: 'file', message: 'Send a JPEG, PNG or WebP photo' }]);
    expect(await Photo.count()).toBe(0);
    expect(filesOf(f.group.id)).toEqual([]);
  });

  it('answers 400 for a file that starts like a JPEG but is not a whole image, writing nothing', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const res = await upload(owner, plantPhotos(f.group.id, f.plant.id), Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(200, 7)]), 'x.jpg', 'image/jpeg').expect(400);
    expect(envelope(res.body).message).toBe('The photo could not be read');
    expect(await Photo.count()).toBe(0);
    expect(filesOf(f.group.id)).toEqual([]);
  });

  it('answers 413 in the envelope for a photo over 8 MB, writing nothing', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const big = Buffer.concat([await imageBytes('image/jpeg'), Buffer.alloc(PHOTO_LIMIT_BYTES)]);
    const res = await upload(owner, plantPhotos(f.group.id, f.plant.id), big, 'big.jpg', 'image/jpeg').expect(413);
    expect(envelope(res.body)).toMatchObject({ code: 'PAYLOAD_TOO_LARGE', issues: [{ path: 'file', message: 'Larger than 8 MB' }] });
    expect(await Photo.count()).toBe(0);
    expect(filesOf(f.group.id)).toEqual([]);
  });

  it('keeps a WebP photo without a thumbnail, serving the photo itself in its place', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    // The smallest lossless WebP container: RIFF header, "WEBP", a VP8L chunk for one pixel.
    const webp = Buffer.from('UklGRhoAAABXRUJQVlA4TA0AAAAvAAAAEAcQERGIiP4HAA==', 'base64');
    const photo = photoSchema.parse((await upload(owner, plantPhotos(f.group.id, f.plant.id), webp, 'a.webp', 'image/webp').expect(201)).body);
    expect((await owner.get(photo.thumbUrl).expect(200)).headers['content-type']).toBe('image/webp');
    expect(filesOf(f.group.id)).toHaveLength(1);
  });
});

describe('photos on log entries', () => {
  it('shows a photo added to an entry in that entry, and deletes its files with it', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const { body: entry } = await helper.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    await upload(helper, logPath(f.group.id, `/${entry.id}/photos`), await imageBytes('image/jpeg'), 'feed.jpg', 'image/jpeg').expect(201);
    const { body: again } = await helper.get(logPath(f.group.id, `/${entry.id}`)).expect(200);
    expect(again.photos).toHaveLength(1);
    await helper.delete(logPath(f.group.id, `/${entry.id}`)).expect(204);
    expect(await Photo.count()).toBe(0);
    expect(filesOf(f.group.id)).toEqual([]);
  });

  it('answers 403 when another helper adds a photo to someone’s entry, writing nothing', async () => {
    const f = await roleFixture();
    const grower = await signedIn(f.people.grower.email);
    const { body: entry } = await grower.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    const helper = await signedIn(f.people.helper.email);
    await upload(helper, logPath(f.group.id, `/${entry.id}/photos`), await imageBytes('image/jpeg'), 'x.jpg', 'image/jpeg').expect(403);
    expect(filesOf(f.group.id)).toEqual([]);
  });
});

describe('GET and DELETE /api/groups/:groupId/photos/:photoId', () => {
  it('answers 404 to someone outside the group, whatever the photo id', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const photo = photoSchema.parse((await upload(owner, plantPhotos(f.group.id, f.plant.id), await imageBytes('image/png'), 'a.png', 'image/png').expect(201)).body);
    const outsider = await signedIn(f.people.outsider.email);
    await outsider.get(photo.url).expect(404);
    // Asking through their own group does not find another group's photo either.
    await outsider.get(`/api/groups/${f.otherGroup.id}/photos/${photo.id}`).expect(404);
  });

  it('lets the uploader delete a photo and its files; another helper gets 403', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const photo = photoSchema.parse((await upload(helper, plantPhotos(f.group.id, f.plant.id), await imageBytes('image/png'), 'a.png', 'image/png').expect(201)).body);
    await (await signedIn(f.people.grower.email)).delete(`/api/groups/${f.group.id}/photos/${photo.id}`).expect(403);
    expect(filesOf(f.group.id)).toHaveLength(2);
    await helper.delete(`/api/groups/${f.group.id}/photos/${photo.id}`).expect(204);
    expect(filesOf(f.group.id)).toEqual([]);
  });

  it('removes a plant’s photo files when the owner deletes the plant', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    await upload(helper, plantPhotos(f.group.id, f.plant.id), await imageBytes('image/png'), 'a.png', 'image/png').expect(201);
    expect(filesOf(f.group.id)).toHaveLength(2);
    await (await signedIn(f.people.owner.email)).delete(`/api/groups/${f.group.id}/plants/${f.plant.id}`).expect(204);
    expect(await Photo.count()).toBe(0);
    expect(filesOf(f.group.id)).toEqual([]);
  });
});
