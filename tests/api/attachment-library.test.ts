import { attachmentProductSchema } from '@shared/schemas/attachment-library';
import { apiErrorSchema } from '@shared/schemas/common';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

/*
 * The firm library of attachment data for the wind check: panel load–span tables and clip capacities with
 * their source and data sheet. Values here are placeholders for the API's behaviour, not design values.
 */

const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};
const PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
  'latin1',
);

const panel = {
  kind: 'panel',
  name: 'Test panel',
  source: 'Test data sheet, rev. 1',
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

describe.each(testDatabases())('firm attachment library on %s', (kind) => {
  let t: TestApp;
  let engineerFirm: string;
  beforeAll(async () => {
    t = await createTestApp(kind);
    engineerFirm = (await (await t.as(demoEmail('engineer'))).get('/api/me')).body.organisations[0].id;
  });
  afterAll(async () => {
    await t?.close();
  });
  const url = (rest = '') => `/api/organisations/${engineerFirm}/attachment-products${rest}`;

  it('seeds the demo firm with a panel table and clips, each with its source', async () => {
    const res = await (await t.as(demoEmail('engineer'))).get(url());
    expect(res.status).toBe(200);
    const products = res.body.products.map((p: unknown) => attachmentProductSchema.parse(p));
    expect(products.map((p: { kind: string }) => p.kind).sort()).toEqual(['clip', 'clip', 'panel']);
    for (const p of products) expect(p.source).toMatch(/invented/);
  });

  it('adds a panel table and a clip, and lists them', async () => {
    const engineer = await t.as(demoEmail('engineer'));
    const added = await engineer.post(url()).send(panel);
    expect(added.status).toBe(201);
    expect(attachmentProductSchema.parse(added.body)).toMatchObject({ ...panel, notes: '', dataSheet: null });
    const clip = await engineer.post(url()).send({
      kind: 'clip',
      name: 'Test clip',
      source: 'Test report 7',
      clip: { fastenerCapacity: 900, fastenersPerClip: 3 },
    });
    expect(clip.status).toBe(201);
    const names = (await engineer.get(url())).body.products.map((p: { name: string }) => p.name);
    expect(names).toEqual(expect.arrayContaining(['Test panel', 'Test clip']));
  });

  it('refuses a table the engine would refuse, naming the row and the reason', async () => {
    const engineer = await t.as(demoEmail('engineer'));
    const rows = [panel.loadSpanTable.rows[1], panel.loadSpanTable.rows[0]];
    const res = await engineer
      .post(url())
      .send({ ...panel, loadSpanTable: { ...panel.loadSpanTable, rows } });
    expect(res.status).toBe(400);
    const body = apiErrorSchema.parse(res.body);
    expect(body.error.fields?.['loadSpanTable.rows.1.span']).toMatch(/spans must increase/);
    const rising = [
      { span: 1.5, allowableInward: 900, allowableOutward: 800 },
      { span: 3, allowableInward: 2000, allowableOutward: 800 },
    ];
    const res2 = await engineer
      .post(url())
      .send({ ...panel, loadSpanTable: { ...panel.loadSpanTable, rows: rising } });
    expect(res2.status).toBe(400);
    expect(res2.body.error.fields['loadSpanTable.rows.1.allowableInward']).toMatch(/must not increase/);
    const noSource = await engineer.post(url()).send({ ...panel, source: '  ' });
    expect(noSource.status).toBe(400);
    expect(noSource.body.error.fields.source).toMatch(/name the source/);
  });

  it('stores the data sheet by content, replaces it, and gives it back byte for byte', async () => {
    const engineer = await t.as(demoEmail('engineer'));
    const id = (await engineer.post(url()).send(panel)).body.id as string;
    const up = await engineer.post(url(`/${id}/data-sheet`)).attach('files', PDF, 'DS-80 rev B.pdf');
    expect(up.status).toBe(201);
    expect(up.body.dataSheet).toMatchObject({ name: 'DS-80 rev B.pdf', contentType: 'application/pdf' });
    const down = await engineer
      .get(url(`/${id}/data-sheet`))
      .buffer(true)
      .parse(binary);
    expect(down.status).toBe(200);
    expect(Buffer.compare(down.body as Buffer, PDF)).toBe(0);
    expect(down.headers['content-disposition']).toContain('DS-80 rev B.pdf');

    const text = await engineer
      .post(url(`/${id}/data-sheet`))
      .attach('files', Buffer.from('not a pdf at all'), 'sheet.pdf');
    expect(text.status).toBe(415);
    const two = await engineer
      .post(url(`/${id}/data-sheet`))
      .attach('files', PDF, 'a.pdf')
      .attach('files', PDF, 'b.pdf');
    expect(two.status).toBe(400);
    expect(two.body.error.fields.files).toMatch(/2 files/);
    // The refused uploads left the first data sheet in place.
    const still = (await engineer.get(url())).body.products.find((p: { id: string }) => p.id === id);
    expect(still.dataSheet.name).toBe('DS-80 rev B.pdf');

    const before = (await t.storage.list('organisations/')).length;
    const again = await engineer.post(url(`/${id}/data-sheet`)).attach('files', PDF, 'rev C.pdf');
    expect(again.body.dataSheet.name).toBe('rev C.pdf');
    expect((await t.storage.list('organisations/')).length).toBe(before);
  });

  it('lets only a firm administrator remove an entry, and removes its data sheet with it', async () => {
    const engineer = await t.as(demoEmail('engineer'));
    const id = (await engineer.post(url()).send(panel)).body.id as string;
    await engineer.post(url(`/${id}/data-sheet`)).attach('files', PDF, 'x.pdf');
    const before = (await t.storage.list('organisations/')).length;
    const removed = await engineer.delete(url(`/${id}`));
    expect(removed.status).toBe(204);
    expect((await t.storage.list('organisations/')).length).toBe(before - 1);
    expect((await engineer.get(url(`/${id}/data-sheet`))).status).toBe(404);
    expect((await engineer.delete(url(`/${id}`))).status).toBe(404);
  });

  it('hides the firm library from people outside the firm, even on a shared project', async () => {
    const architect = await t.as(demoEmail('architect'));
    expect((await architect.get(url())).status).toBe(404);
    expect((await architect.post(url()).send(panel)).status).toBe(404);
  });
});
