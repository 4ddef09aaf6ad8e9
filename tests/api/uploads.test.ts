/**
 * Uploads through the ObjectStore into s3rver: studies and models checked with the shared
 * schemas (a bad file is 422 with its JSON paths), size and type limits, list, download,
 * delete, and the bytes really in (and gone from) the bucket.
 */
import { GetObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Upload } from '../../server/db/models/upload.model';
import { FAKE_S3_CREDENTIALS } from '../../server/services/object-store-fake';
import { ObjectNotFound } from '../../server/services/object-store';
import { startServicesApp, type ServicesApp } from './support/services-app';
import { buildWorld, type World } from './support/world';

const LIMIT = 64 * 1024;
let t: ServicesApp;
let w: World;
beforeAll(async () => {
  t = await startServicesApp({ config: { uploadLimitBytes: LIMIT } });
  w = await buildWorld(t);
});
afterAll(() => t.close());

const STUDY = readFileSync(new URL('../../examples/studies/depot-roof-pratt.json', import.meta.url));
const MODEL = readFileSync(new URL('../../examples/models/depot-roof-r3.json', import.meta.url));
const url = () => `/api/projects/${w.project.slug}/uploads`;

const upload = (kind: string, data: Buffer | string, name: string, actor: 'engineer' | 'promoted' | 'viewer' = 'engineer', contentType = 'application/json') =>
  w.as(actor).post(url()).field('kind', kind).attach('file', Buffer.from(data), { filename: name, contentType });

const edited = (edit: (m: Record<string, any>) => void) => { // eslint-disable-line @typescript-eslint/no-explicit-any
  const m = JSON.parse(MODEL.toString());
  edit(m);
  return JSON.stringify(m);
};

describe('uploads', () => {
  it('a study and a model are checked, stored, listed and downloaded byte for byte', async () => {
    const s = (await upload('study', STUDY, 'depot-roof-pratt.json').expect(201)).body;
    expect(s.upload).toMatchObject({ kind: 'study', name: 'depot-roof-pratt.json', size: STUDY.length, contentType: 'application/json', createdBy: { id: w.people.engineer.user.id } });
    expect(s.summary).toMatchObject({ family: 'pratt' });
    const m = (await upload('model', MODEL, 'depot-roof-r3.json').expect(201)).body;
    expect(m.summary).toMatchObject({ joints: expect.any(Number), members: expect.any(Number) });
    expect(m.warnings).toEqual([]);

    const list = (await w.as('viewer').get(url()).expect(200)).body.uploads as { id: number }[];
    expect(list.map((u) => u.id)).toEqual(expect.arrayContaining([s.upload.id, m.upload.id]));
    expect((await w.as('viewer').get(`${url()}?kind=study`).expect(200)).body.uploads.every((u: { kind: string }) => u.kind === 'study')).toBe(true);

    const down = await w.as('viewer').get(`${url()}/${m.upload.id}`).buffer(true).parse((res, cb) => {
      const parts: Buffer[] = [];
      res.on('data', (c: Buffer) => parts.push(c));
      res.on('end', () => cb(null, Buffer.concat(parts)));
    }).expect(200);
    expect(Buffer.compare(down.body as Buffer, MODEL)).toBe(0);
    expect(down.headers['content-disposition']).toMatch(/^attachment; filename="?depot-roof-r3\.json"?$/);
  });

  it('keeps the bytes in the S3 bucket under a uuid key, whatever the file is called; delete removes them', async () => {
    const res = (await upload('model', MODEL, '../../etc/passwd.json').expect(201)).body;
    expect(res.upload.name).toBe('passwd.json');
    const row = (await Upload.findByPk(res.upload.id))!;
    expect(row.storageKey).toMatch(/^uploads\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
    // Read it back with a client of our own: the object is in s3rver, not only in the app.
    const client = new S3Client({ endpoint: t.s3.endpoint, forcePathStyle: true, region: 'us-east-1', credentials: { accessKeyId: FAKE_S3_CREDENTIALS.accessKey, secretAccessKey: FAKE_S3_CREDENTIALS.secretKey } });
    const obj = await client.send(new GetObjectCommand({ Bucket: t.store.bucket, Key: row.storageKey }));
    expect(Buffer.compare(Buffer.from(await obj.Body!.transformToByteArray()), MODEL)).toBe(0);
    expect(obj.ContentType).toBe('application/json');
    client.destroy();

    await w.as('engineer').delete(`${url()}/${res.upload.id}`).expect(204);
    await expect(t.store.get(row.storageKey)).rejects.toBeInstanceOf(ObjectNotFound);
    await w.as('engineer').get(`${url()}/${res.upload.id}`).expect(404);
  });

  it('a bad model is 422 with the JSON paths of every problem', async () => {
    const bad = edited((m) => {
      m.members[0].to = 'NOPE';
      m.nodes[1].x = 'three';
    });
    const res = await upload('model', bad, 'bad.json').expect(422);
    expect(res.body.error.code).toBe('invalid-file');
    expect(res.body.error.details.map((d: { path: string }) => d.path)).toContain('nodes[1].x');
    const res2 = await upload('model', edited((m) => (m.members[0].to = 'NOPE')), 'bad.json').expect(422);
    expect(res2.body.error.details).toContainEqual({ path: 'members[0].to', message: expect.stringContaining('NOPE') });
  });

  it('a bad study is 422 with its paths; malformed JSON says where', async () => {
    const study = JSON.parse(STUDY.toString());
    study.family = 'no-such-family';
    expect((await upload('study', JSON.stringify(study), 's.json').expect(422)).body.error.details).toEqual([{ path: 'family', message: expect.stringMatching(/unknown family/) }]);
    study.family = 'pratt';
    study.vary.panels = 'many';
    expect((await upload('study', JSON.stringify(study), 's.json').expect(422)).body.error.details[0].path).toMatch(/^vary\.panels/);
    const broken = await upload('model', '{\n  "name": "x",\n  "nodes": [,]\n}', 'broken.json').expect(422);
    expect(broken.body.error.details[0].message).toMatch(/not valid JSON \(line 3, column \d+/);
  });

  it('a model without supports is kept with a warning (supports are left to add)', async () => {
    const res = await upload('model', edited((m) => (m.supports = [])), 'no-supports.json').expect(201);
    expect(res.body.warnings).toEqual([{ path: 'supports', message: expect.stringMatching(/no supports/) }]);
  });

  it('limits: size 413, wrong type 415, binary 415, no kind or no file 422', async () => {
    const big = Buffer.alloc(LIMIT + 1, 0x20);
    expect((await upload('model', big, 'big.json').expect(413)).body.error.code).toBe('file-too-large');
    expect((await upload('model', MODEL, 'model.txt').expect(415)).body.error.code).toBe('unsupported-type');
    await upload('model', MODEL, 'model.json', 'engineer', 'image/png').expect(415);
    await upload('dxf', Buffer.concat([Buffer.from('AutoCAD Binary DXF\r\n\x1a\x00'), Buffer.alloc(20)]), 'r3.dxf', 'engineer', 'application/octet-stream').expect(415);
    await upload('dxf', 'not a drawing', 'r3.dxf', 'engineer', 'application/dxf').expect(422);
    expect((await upload('drawing', MODEL, 'm.json').expect(422)).body.error.details).toEqual([{ path: 'kind', message: expect.any(String) }]);
    expect((await w.as('engineer').post(url()).send({ kind: 'model' }).expect(422)).body.error.code).toBe('file-missing');
    await w.as('engineer').post(url()).field('kind', 'model').attach('other', MODEL, 'm.json').expect(422);
  });

  it('reviewers and viewers cannot upload; only the uploader or a project admin deletes', async () => {
    await upload('model', MODEL, 'm.json', 'viewer').expect(403);
    const id = (await upload('model', MODEL, 'm.json').expect(201)).body.upload.id;
    expect((await w.as('promoted').delete(`${url()}/${id}`).expect(403)).body.error.code).toBe('not-your-upload');
    await w.as('admin').delete(`${url()}/${id}`).expect(204);
    await w.as('outsider').get(url()).expect(404);
    await w.as('engineer').get(`${url()}/abc`).expect(404);
  });
});
