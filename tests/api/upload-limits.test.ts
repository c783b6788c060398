import { createHash } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { Readable } from 'node:stream';
import { submittalSchema, uploadResultSchema } from '@shared/schemas/submittals';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { CONCURRENT_UPLOADS, uploadsInProgress } from '../../server/http/upload';
import { createTestApp, DEMO_PASSWORD, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { inspectionParams } from '../setup/inspections';

/*
 * What keeps uploads from exhausting the server: files stream to object storage (never whole in memory),
 * their type is judged before anything is stored, a project's files and a firm's data sheets have a storage
 * quota, the process receives a few uploads at a time, and racing additions to one revision can neither pass
 * its 40-item limit nor share a position.
 */

const MiB = 1024 * 1024;
const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);
const PDF_HEAD = Buffer.from('%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\n', 'latin1');
/** A PDF of `bytes` bytes (a PDF header, then filler that varies so that every part differs). */
const pdfOf = (bytes: number) => {
  const b = Buffer.alloc(bytes);
  PDF_HEAD.copy(b);
  for (let i = PDF_HEAD.length; i < bytes; i++) b[i] = i % 251;
  return b;
};
const TEXT = Buffer.from('only text, whatever its name says\n');
const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

const panel = {
  kind: 'panel',
  name: 'Quota test panel',
  source: 'Test data sheet, rev. 1 (invented)',
  panelModuleWidth: 1,
  loadSpanTable: {
    spanCondition: 'single',
    deflectionLimit: 'L/180',
    rows: [
      { span: 1.5, allowableInward: 2000, allowableOutward: 1800 },
      { span: 3, allowableInward: 900, allowableOutward: 800 },
    ],
  },
};

async function until(what: string, ok: () => boolean) {
  for (let i = 0; i < 500 && !ok(); i++) await new Promise((r) => setTimeout(r, 20));
  if (!ok()) throw new Error(`timed out waiting until ${what}`);
}

describe.each(testDatabases())('upload limits on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  let assemblyId: string;
  let criteriaSetId: string;

  const as = (who: string) => t.as(demoEmail(who));
  const newSubmittal = async (project = projectId, who = 'subcontractor') => {
    const res = await (await as(who)).post(`/api/projects/${project}/submittals`).send({
      title: 'Upload limits',
      specSection: '07 42 13',
      specTitle: 'Metal Wall Panels',
      reviewerIds: [],
    });
    expect(res.status, res.text).toBe(201);
    return submittalSchema.parse(res.body).id;
  };
  const upload = async (id: string, files: [Buffer, string][], who = 'subcontractor') => {
    let req = (await as(who)).post(`/api/submittals/${id}/files`);
    for (const [bytes, name] of files) req = req.attach('files', bytes, { filename: name });
    return req;
  };
  const items = async (id: string, who = 'subcontractor') =>
    submittalSchema.parse((await (await as(who)).get(`/api/submittals/${id}`)).body).items;
  const keys = (prefix: string) => t.storage.list(prefix);

  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const sub = await as('subcontractor');
    assemblyId = (await sub.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0].id;
    criteriaSetId = (await sub.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets[0].id;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('streams each file to object storage — the store is handed a stream, never a buffer — and keeps it whole', async () => {
    const id = await newSubmittal();
    const put = vi.spyOn(t.storage, 'put');
    try {
      // 12 MiB: larger than two parts of a multipart upload, so it goes up in parts.
      const big = pdfOf(12 * MiB);
      const res = await upload(id, [
        [big, 'drawings.pdf'],
        [PNG, 'photo.png'],
      ]);
      expect(res.status, res.text).toBe(201);
      expect(put).toHaveBeenCalledTimes(2);
      for (const [, body] of put.mock.calls) {
        expect(body).toBeInstanceOf(Readable);
        expect(Buffer.isBuffer(body)).toBe(false);
      }
      const [stored] = uploadResultSchema.parse(res.body).items;
      expect(stored?.kind === 'file' && stored.file).toMatchObject({
        size: big.length,
        sha256: sha256(big),
        contentType: 'application/pdf',
      });
      const back = await (await as('subcontractor'))
        .get(`/api/submittals/${id}/items/${stored!.id}/file`)
        .buffer(true)
        .parse(binary);
      expect(back.status).toBe(200);
      expect(sha256(back.body as Buffer)).toBe(sha256(big));

      // The type is judged from the first bytes before anything is stored: a refused file never reaches the
      // store, and one refused file takes back the others of its upload.
      put.mockClear();
      const before = await keys('projects/');
      const text = await upload(id, [[TEXT, 'specification.pdf']]);
      expect(text.status).toBe(415);
      expect(put).not.toHaveBeenCalled();
      const mixed = await upload(id, [
        [pdfOf(6 * MiB), 'good.pdf'],
        [TEXT, 'bad.pdf'],
      ]);
      expect(mixed.status).toBe(415);
      expect(put).toHaveBeenCalledTimes(1);
      expect(await keys('projects/')).toEqual(before);
      expect(await items(id)).toHaveLength(2);
    } finally {
      put.mockRestore();
    }
  });

  it('keeps each project within its storage quota, also when uploads race', async () => {
    const admin = await as('admin');
    const project = await admin.post('/api/projects').send({
      name: 'Quota test (invented)',
      climateZone: '5A',
      buildingHeightM: 9,
      planLengthM: 40,
      planWidthM: 20,
      indoorTempC: 20,
      indoorRh: 0.4,
      winterDesignTempC: -20,
      summerDesignTempC: 30,
    });
    expect(project.status, project.text).toBe(201);
    const id = await newSubmittal(project.body.id, 'admin');
    const prefix = `projects/${project.body.id}/`;
    const saved = t.config.storage.projectQuotaBytes;
    t.config.storage.projectQuotaBytes = 3 * MiB;
    try {
      const first = await upload(id, [[pdfOf(2 * MiB), 'a.pdf']], 'admin');
      expect(first.status, first.text).toBe(201);
      const over = await upload(id, [[pdfOf(2 * MiB), 'b.pdf']], 'admin');
      expect(over.status).toBe(413);
      expect(over.body.error.code).toBe('storage_quota_exceeded');
      expect(over.body.error.message).toMatch(/storage is full .*2\.0 of 3 MB/);
      expect(await keys(prefix)).toHaveLength(1);
      expect((await upload(id, [[pdfOf(MiB / 2), 'c.pdf']], 'admin')).status).toBe(201);

      // Removing a file makes room again.
      const aId = (await items(id, 'admin')).find((i) => i.kind === 'file' && i.file.name === 'a.pdf')!.id;
      expect((await admin.delete(`/api/submittals/${id}/items/${aId}`)).status).toBe(200);
      expect(await keys(prefix)).toHaveLength(1);

      // Two uploads that each fit the room left, but not both: one is stored, the other refused and removed.
      const racing = await Promise.all([
        upload(id, [[pdfOf(2 * MiB), 'd.pdf']], 'admin'),
        upload(id, [[pdfOf(2 * MiB), 'e.pdf']], 'admin'),
      ]);
      expect(racing.map((r) => r.status).sort()).toEqual([201, 413]);
      expect(await keys(prefix)).toHaveLength(2);
      expect(await items(id, 'admin')).toHaveLength(2);
    } finally {
      t.config.storage.projectQuotaBytes = saved;
    }
  });

  it('counts inspection photos and submittal files against one project quota', async () => {
    const { inspectionItemId } = await inspectionParams(t, projectId);
    const id = await newSubmittal();
    const saved = t.config.storage.projectQuotaBytes;
    const photoBytes = (n: number) => {
      const b = pdfOf(n);
      PNG.copy(b); // a PNG by its first bytes
      return b;
    };
    try {
      // What the project holds now, as the refusal words it (to 0.1 MB).
      t.config.storage.projectQuotaBytes = 0;
      const full = await upload(id, [[pdfOf(1024), 'full.pdf']]);
      expect(full.status).toBe(413);
      const inUse = Number(/full \(([\d.]+) of/.exec(full.body.error.message)![1]) * MiB;
      t.config.storage.projectQuotaBytes = Math.ceil(inUse + 3 * MiB); // room for one 2 MiB file, not two
      const photo = await (await as('subcontractor'))
        .post(`/api/inspection-items/${inspectionItemId}/photos`)
        .attach('files', photoBytes(2 * MiB), { filename: 'wall.png', contentType: 'image/png' });
      expect(photo.status, photo.text).toBe(201);
      // The photo took the room: a 2 MiB submittal file no longer fits, and the refusal says so.
      const over = await upload(id, [[pdfOf(2 * MiB), 'after-photo.pdf']]);
      expect(over.status).toBe(413);
      expect(over.body.error.code).toBe('storage_quota_exceeded');
      // And the other way round: the file room left is too small for another 2 MiB photo.
      const overPhoto = await (await as('subcontractor'))
        .post(`/api/inspection-items/${inspectionItemId}/photos`)
        .attach('files', photoBytes(2 * MiB), { filename: 'wall2.png', contentType: 'image/png' });
      expect(overPhoto.status).toBe(413);
    } finally {
      t.config.storage.projectQuotaBytes = saved;
    }
  });

  it('keeps a firm’s data sheets within the firm’s library quota (a replaced sheet does not count)', async () => {
    const engineer = await as('engineer');
    const firm = (await engineer.get('/api/me')).body.organisations[0].id as string;
    const url = (rest = '') => `/api/organisations/${firm}/attachment-products${rest}`;
    const a = (await engineer.post(url()).send(panel)).body.id as string;
    const b = (await engineer.post(url()).send({ ...panel, name: 'Second quota panel' })).body.id as string;
    const sheet = (id: string, bytes: number) =>
      engineer.post(url(`/${id}/data-sheet`)).attach('files', pdfOf(bytes), 'sheet.pdf');
    const saved = t.config.storage.firmQuotaBytes;
    t.config.storage.firmQuotaBytes = 2 * MiB;
    try {
      expect((await sheet(a, 1.5 * MiB)).status).toBe(201);
      const before = await keys('organisations/');
      const over = await sheet(b, MiB);
      expect(over.status).toBe(413);
      expect(over.body.error.code).toBe('storage_quota_exceeded');
      expect(over.body.error.message).toMatch(/library storage is full/);
      expect(await keys('organisations/')).toEqual(before);
      // Replacing a sheet frees what it held.
      expect((await sheet(a, 1.8 * MiB)).status).toBe(201);
      expect(await keys('organisations/')).toHaveLength(before.length);
    } finally {
      t.config.storage.firmQuotaBytes = saved;
    }
  });

  it(`receives at most ${CONCURRENT_UPLOADS} uploads at once; more get 503 with Retry-After, and a slot frees when an upload ends`, async () => {
    const id = await newSubmittal();
    const server = http.createServer(t.app).listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const { port } = server.address() as AddressInfo;
    try {
      const signIn = await fetch(`http://127.0.0.1:${port}/api/auth/sign-in/email`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: demoEmail('subcontractor'), password: DEMO_PASSWORD }),
      });
      const cookie = signIn.headers
        .getSetCookie()
        .map((c) => c.split(';')[0])
        .join('; ');
      /** An upload whose body arrives slowly: the part header and the first bytes now, the rest on `finish`. */
      const slow = (name: string) => {
        const boundary = 'sw-slow-upload';
        const req = http.request({
          port,
          host: '127.0.0.1',
          method: 'POST',
          path: `/api/submittals/${id}/files`,
          headers: { cookie, 'content-type': `multipart/form-data; boundary=${boundary}` },
        });
        const response = new Promise<number>((resolve) => {
          req.on('response', (res) => {
            res.resume();
            res.on('end', () => resolve(res.statusCode ?? 0));
          });
          req.on('error', () => resolve(0));
        });
        req.write(
          `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="${name}"\r\nContent-Type: image/png\r\n\r\n`,
        );
        req.write(PNG.subarray(0, 16));
        return {
          response,
          finish: () => req.end(Buffer.concat([PNG.subarray(16), Buffer.from(`\r\n--${boundary}--\r\n`)])),
          abandon: () => req.destroy(),
        };
      };
      const before = await keys('projects/');
      const stalled = Array.from({ length: CONCURRENT_UPLOADS }, (_, i) => slow(`slow-${i}.png`));
      await until(
        `${CONCURRENT_UPLOADS} uploads are being received`,
        () => uploadsInProgress() === CONCURRENT_UPLOADS,
      );

      const busy = await upload(id, [[PNG, 'one-too-many.png']]);
      expect(busy.status).toBe(503);
      expect(busy.headers['retry-after']).toMatch(/^\d+$/);
      expect(busy.body.error.code).toBe('uploads_busy');
      expect(busy.body.error.message).toMatch(/try again/);
      // Firm data sheets share the same limit.
      const engineer = await as('engineer');
      const firm = (await engineer.get('/api/me')).body.organisations[0].id as string;
      const entry = (await engineer.post(`/api/organisations/${firm}/attachment-products`).send(panel)).body
        .id as string;
      const sheetBusy = await engineer
        .post(`/api/organisations/${firm}/attachment-products/${entry}/data-sheet`)
        .attach('files', PNG, 'sheet.png');
      expect(sheetBusy.status).toBe(503);
      expect(await keys('projects/')).toEqual(before);

      // A client that gives up frees its slot and leaves nothing behind; the others finish and are stored.
      stalled[0]!.abandon();
      await until('the abandoned upload has ended', () => uploadsInProgress() === CONCURRENT_UPLOADS - 1);
      expect((await upload(id, [[PNG, 'now-there-is-room.png']])).status).toBe(201);
      for (const s of stalled.slice(1)) s.finish();
      expect(await Promise.all(stalled.slice(1).map((s) => s.response))).toEqual(
        Array(CONCURRENT_UPLOADS - 1).fill(201),
      );
      expect(uploadsInProgress()).toBe(0);
      expect((await items(id)).map((i) => i.kind === 'file' && i.file.name).sort()).toEqual(
        ['now-there-is-room.png', ...stalled.slice(1).map((_, i) => `slow-${i + 1}.png`)].sort(),
      );
      expect(await keys('projects/')).toHaveLength(before.length + CONCURRENT_UPLOADS);
    } finally {
      server.close();
    }
  });

  /** A draft with `n` items already (uploads of up to five small files). */
  const draftWith = async (n: number) => {
    const id = await newSubmittal();
    for (let done = 0; done < n; done += 5) {
      const files = Array.from({ length: Math.min(5, n - done) }, (_, j) => [PNG, `before-${done + j}.png`]);
      const res = await upload(id, files as [Buffer, string][]);
      expect(res.status, res.text).toBe(201);
    }
    return id;
  };
  const expectFullAndInOrder = async (id: string) => {
    const now = await items(id);
    expect(now).toHaveLength(40);
    expect(new Set(now.map((i) => i.position)).size).toBe(40);
    return now;
  };
  const expectTooMany = (r: Response) => {
    expect([201, 409, 503], r.text).toContain(r.status);
    if (r.status === 409) {
      expect(r.body.error.code).toBe('too_many_items');
      expect(r.body.error.message).toMatch(/at most 40 items/);
    }
  };

  it('never lets 12 racing uploads pass 40 items or share a position, and keeps nothing of the refused', async () => {
    const id = await draftWith(30);
    const before = await keys('projects/');
    const fiveFiles = (i: number) =>
      Array.from({ length: 5 }, (_, j) => [PNG, `race-${i}-${j}.png`] as [Buffer, string]);
    const racing = await Promise.all(Array.from({ length: 12 }, (_, i) => upload(id, fiveFiles(i))));
    racing.forEach(expectTooMany);
    // Those received at once all found 30 items; the row lock lets exactly two of them in.
    expect(racing.filter((r) => r.status === 201)).toHaveLength(2);
    await expectFullAndInOrder(id);
    expect(await keys('projects/')).toHaveLength(before.length + 10);
  });

  it('never lets racing sheet attachments (and uploads) pass 40 items or share a position', async () => {
    const sub = await as('subcontractor');
    const id = await draftWith(36);
    const runs: string[] = [];
    for (let i = 0; i < 6; i++) {
      const run = await sub.post(`/api/assemblies/${assemblyId}/check-runs`).send({ criteriaSetId });
      expect(run.status, run.text).toBe(201);
      runs.push(run.body.id);
    }
    const before = await keys('projects/');
    const racing = await Promise.all([
      ...runs.map((checkRunId) => sub.post(`/api/submittals/${id}/sheets`).send({ checkRunId })),
      upload(id, [[PNG, 'race-a.png']]),
      upload(id, [[PNG, 'race-b.png']]),
    ]);
    racing.forEach(expectTooMany);
    expect(racing.filter((r) => r.status === 201)).toHaveLength(4);
    const now = await expectFullAndInOrder(id);
    const files = now.filter((i) => i.kind === 'file').length;
    expect(await keys('projects/')).toHaveLength(before.length + files - 36);
  });
});
