import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { crc32 } from 'node:zlib';
import piexif from 'piexifjs';
import request from 'supertest';
import { ownValue } from '@/shared/keys/record';
import { makeTestApp, signInAs, type Agent, type TestApp } from './helpers/app';
import { buildPath, JPEG_8X8, jpegWithLocation, newClientId, PNG_8X8, WEBP_1X1 } from './helpers/build';
import { designId, signInQuaysideAdmin } from './helpers/designs';

/** Photo uploads to the approved Harbor Road v2 and reading them back (docs/api.md). */
let t: TestApp;
let id: number;
let ines: Agent;
let folder: string;
beforeAll(async () => {
  t = await makeTestApp();
  id = await designId(t);
  ines = await signInAs(t.app, 'installer');
  folder = t.config.photosDir!;
});
afterAll(() => t.close());

const upload = (bytes: Buffer, fileName: string, fields: Record<string, string> = { cableId: 'cable-a-01' }, contentType?: string) => {
  let req = ines.post(buildPath(id, 2, '/photos'));
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('photo', bytes, contentType ? { filename: fileName, contentType } : fileName);
};

function binary(res: request.Response, done: (error: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}
const download = (agent: Agent, photoId: string) => agent.get(`/api/photos/${photoId}`).buffer(true).parse(binary);
const storedFiles = () => (existsSync(folder) ? readdirSync(folder) : []);

/** A PNG chunk with its CRC (ISO/IEC 15948 §5.3). */
function pngChunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
  return Buffer.concat([head, data, crc]);
}

describe('what an upload may be', () => {
  it('refuses a text file named .jpg and sent as image/jpeg with 415, storing nothing', async () => {
    const before = { rows: await t.models.BuildPhoto.count(), files: storedFiles().length };
    const res = await upload(Buffer.from('Cable HR-A-01 checked, all good.\n'), 'cable.jpg', undefined, 'image/jpeg');
    expect(res.status).toBe(415); // RFC 9110 §15.5.16
    expect(res.body).toEqual({ error: 'This file is not a JPEG, PNG or WebP image. Take the photo with the camera, or choose a JPEG, PNG or WebP file.' });
    expect({ rows: await t.models.BuildPhoto.count(), files: storedFiles().length }).toEqual(before);
  });

  it('refuses an 11 MB image with 413, storing nothing', async () => {
    const before = { rows: await t.models.BuildPhoto.count(), files: storedFiles().length };
    const big = Buffer.concat([PNG_8X8, Buffer.alloc(11 * 1024 * 1024)]);
    const res = await upload(big, 'rack.png');
    expect(res.status).toBe(413); // RFC 9110 §15.5.14
    expect(res.body).toEqual({ error: 'The photo is larger than 10 MB. Send a smaller photo, or take it again at a lower resolution.' });
    expect({ rows: await t.models.BuildPhoto.count(), files: storedFiles().length }).toEqual(before);
  });

  it('judges the type by content: a PNG named .jpg and sent as image/jpeg is stored and served as a PNG', async () => {
    const res = await upload(PNG_8X8, 'photo.jpg', undefined, 'image/jpeg').expect(201);
    expect(res.body.photo.contentType).toBe('image/png');
    const back = await download(ines, res.body.photo.id).expect(200);
    expect(back.headers['content-type']).toBe('image/png');
    expect((back.body as Buffer).equals(PNG_8X8)).toBe(true); // the demo PNG carries no metadata chunk
  });

  it('takes WebP and attaches a photo to a rack', async () => {
    const res = await upload(WEBP_1X1, 'rack-a01.webp', { rackId: 'rk-a01' }).expect(201);
    expect(res.body.photo).toMatchObject({ cableId: null, rackId: 'rk-a01', contentType: 'image/webp', by: { name: 'Ines Duarte' } });
  });

  it('answers 400 for a missing file, a wrong field, no or two targets and a target the version lacks', async () => {
    const noFile = await ines.post(buildPath(id, 2, '/photos')).field('cableId', 'cable-a-01');
    expect(noFile.status).toBe(400);
    expect(noFile.body.issues).toEqual([{ path: 'photo', message: 'Attach the image in the multipart field "photo"' }]);
    const wrongField = await ines.post(buildPath(id, 2, '/photos')).field('cableId', 'cable-a-01').attach('image', JPEG_8X8, 'a.jpg');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error).toBe('Send the photo in the multipart field "photo", one photo per request.');
    for (const fields of [{}, { cableId: 'cable-a-01', rackId: 'rk-a01' }] as Array<Record<string, string>>) {
      const res = await upload(JPEG_8X8, 'a.jpg', fields);
      expect(res.status).toBe(400);
      expect(res.body.issues).toEqual([{ path: 'cableId', message: 'Attach the photo to one cable (cableId) or one rack (rackId)' }]);
    }
    const lacking = await upload(JPEG_8X8, 'a.jpg', { rackId: 'rk-z99' });
    expect(lacking.status).toBe(400);
    expect(lacking.body.issues).toEqual([{ path: 'rackId', message: 'Version 2 has no rack "rk-z99"' }]);
    const damaged = await upload(Buffer.concat([JPEG_8X8.subarray(0, 40)]), 'cut.jpg');
    expect(damaged.status).toBe(400);
    expect(damaged.body.issues[0].message).toBe('The JPEG file is damaged or cut short. Take the photo again.');
  });
});

describe('where a photo is stored', () => {
  it('ignores the client’s file name: a name with ../ is stored under a random name inside the photo folder', async () => {
    const before = new Set(storedFiles());
    const res = await upload(JPEG_8X8, '../../../../etc/cablewright-escape.jpg').expect(201);
    const row = await t.models.BuildPhoto.findByPk(res.body.photo.id);
    expect(row!.storedName).toMatch(/^[0-9a-f]{32}\.jpg$/);
    const added = storedFiles().filter((f) => !before.has(f));
    expect(added).toEqual([row!.storedName]);
    const stored = path.resolve(folder, row!.storedName);
    expect(path.dirname(stored)).toBe(path.resolve(folder));
    for (const up of ['..', '../..', '../../..', '../../../..']) expect(existsSync(path.resolve(folder, up, 'etc/cablewright-escape.jpg'))).toBe(false);
    expect(existsSync('/etc/cablewright-escape.jpg')).toBe(false);
    expect(path.relative(t.config.webDir, stored).startsWith('..')).toBe(true);
  });
});

describe('reading a photo back', () => {
  it('has no location left in a JPEG, keeps its orientation, and is served with nosniff and private caching', async () => {
    const original = jpegWithLocation();
    // The original really has the tags this test expects to see removed.
    expect(Object.keys(piexif.load(original.toString('latin1')).GPS).length).toBeGreaterThan(0);
    const res = await upload(original, 'IMG_0001.jpg').expect(201);
    const back = await download(ines, res.body.photo.id).expect(200);
    expect(back.headers['content-type']).toBe('image/jpeg');
    expect(back.headers['x-content-type-options']).toBe('nosniff');
    expect(back.headers['cache-control']).toMatch(/^private/);
    const body = back.body as Buffer;
    expect(res.body.photo.bytes).toBe(body.length);
    const exif = piexif.load(body.toString('latin1'));
    expect(exif.GPS).toEqual({});
    expect(exif['0th'][piexif.ImageIFD.GPSTag]).toBeUndefined();
    expect(exif['0th'][piexif.ImageIFD.Orientation]).toBe(6); // EXIF 2.3 tag 274: 6 = rotate 90° clockwise
    expect(exif['0th'][piexif.ImageIFD.Make]).toBeUndefined();
    expect(body.includes(Buffer.from('ns.adobe.com/xap'))).toBe(false);
    expect(body.includes(Buffer.from('GPSLatitude'))).toBe(false);
    // The picture itself is untouched: the same scan data as the original.
    const scan = (jpeg: Buffer) => jpeg.subarray(jpeg.indexOf(Buffer.from([0xff, 0xda])));
    expect(scan(body).equals(scan(JPEG_8X8))).toBe(true);
  });

  it('drops eXIf and text chunks from a PNG', async () => {
    const iend = PNG_8X8.length - 12;
    const withText = Buffer.concat([
      PNG_8X8.subarray(0, iend),
      pngChunk('tEXt', Buffer.from('Location\0Harbor Road, 10.34N 40.83W', 'latin1')),
      pngChunk('eXIf', Buffer.from('MM\0*\0\0\0\x08\0\0\0\0\0\0', 'latin1')),
      PNG_8X8.subarray(iend),
    ]);
    const res = await upload(withText, 'rack.png', { rackId: 'rk-a02' }).expect(201);
    const back = (await download(ines, res.body.photo.id).expect(200)).body as Buffer;
    expect(back.equals(PNG_8X8)).toBe(true);
  });

  it('is 404 for another team, even with the right id', async () => {
    const res = await upload(JPEG_8X8, 'a.jpg').expect(201);
    const quinn = await signInQuaysideAdmin(t);
    const sam = await signInAs(t.app, 'otherTeam');
    for (const agent of [quinn, sam]) expect((await agent.get(`/api/photos/${res.body.photo.id}`)).status).toBe(404);
    expect((await ines.get(`/api/photos/${newClientId()}`)).status).toBe(404);
  });

  it('lists the photos in the build record, per cable and per rack, with who, when and how big', async () => {
    const cable = await upload(JPEG_8X8, 'a.jpg', { cableId: 'cable-b-02' }).expect(201);
    const rack = await upload(PNG_8X8, 'b.png', { rackId: 'rk-a02' }).expect(201);
    const build = (await ines.get(buildPath(id, 2)).expect(200)).body.build;
    expect(ownValue(build.photos.cables, 'cable-b-02')).toEqual([cable.body.photo]);
    expect(ownValue(build.photos.racks, 'rk-a02')).toContainEqual(rack.body.photo);
    expect(cable.body.photo).toEqual({ id: expect.any(String), cableId: 'cable-b-02', rackId: null, by: { id: expect.any(Number), name: 'Ines Duarte' }, at: expect.any(String), bytes: JPEG_8X8.length, contentType: 'image/jpeg' });
  });
});
