import {
  deficiencySchema,
  type Inspection,
  inspectionCloseResultSchema,
  inspectionItemSchema,
  inspectionListSchema,
  inspectionSchema,
  itemAnswerResultSchema,
  photoUploadResultSchema,
} from '@shared/inspections/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { PNG_PIXEL } from '../setup/inspections';
import { readPdf } from '../setup/pdf';

const PNG = PNG_PIXEL;
const PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
  'latin1',
);
const TEXT = Buffer.from('not an image at all, whatever its name says\n');

describe.each(testDatabases())('field inspections on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  let assemblyId: string;
  let runId: string;
  const users: Record<string, string> = {};
  const as = (who: string) => t.as(demoEmail(who));

  const start = async (who = 'consultant', area: unknown = { kind: 'zone', zone: 'field' }) => {
    const res = await (await as(who))
      .post(`/api/projects/${projectId}/inspections`)
      .send({ assemblyId, elevation: 'North elevation', area });
    expect(res.status, res.text).toBe(201);
    return inspectionSchema.parse(res.body);
  };
  const itemOf = (i: Inspection, kind: string) => i.items.find((x) => x.kind === kind)!;
  const answer = async (who: string, itemId: string, body: Record<string, unknown>) =>
    (await as(who)).put(`/api/inspection-items/${itemId}`).send(body);
  const photo = async (who: string, itemId: string, bytes: Buffer, name = 'photo.jpg') =>
    (await as(who))
      .post(`/api/inspection-items/${itemId}/photos`)
      .attach('files', bytes, { filename: name, contentType: 'image/jpeg' });

  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const members = (await (await as('admin')).get(`/api/projects/${projectId}/members`)).body.members as {
      userId: string;
      role: string;
    }[];
    for (const m of members) users[m.role === 'envelope_consultant' ? 'consultant' : m.role] = m.userId;
    const sub = await as('subcontractor');
    const list = (await sub.get(`/api/projects/${projectId}/assemblies`)).body.assemblies as {
      id: string;
      name: string;
    }[];
    assemblyId = list.find((a) => a.name.startsWith('Metal rainscreen'))?.id ?? list[0]!.id;
    const sets = (await sub.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets as {
      id: string;
    }[];
    runId = (await sub.post(`/api/assemblies/${assemblyId}/check-runs`).send({ criteriaSetId: sets[0]!.id }))
      .body.id;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('generates the checklist from the demo assembly, citing its latest check run and sheet code', async () => {
    const i = await start();
    expect(i.status).toBe('in_progress');
    expect(i.checkRunId).toBe(runId);
    expect(i.sheetCode).toMatch(/^[A-Z2-7]{10}$/);
    for (const k of [
      'girt_spacing',
      'clip_spacing',
      'joint_width',
      'backer_rod',
      'insulation_thickness',
      'sill_flashing',
    ])
      expect(i.items.map((x) => x.kind)).toContain(k);
    const girt = itemOf(i, 'girt_spacing');
    expect(girt).toMatchObject({ designValue: 1.2, quantity: 'shortLength', state: 'unseen', version: 1 });
    expect(girt.source).toMatchObject({ checkRunId: runId, sheetCode: i.sheetCode, page: 'attachment' });
    expect(i.counts.unseen).toBe(i.items.length);
    const list = inspectionListSchema.parse(
      (await (await as('viewer')).get(`/api/projects/${projectId}/inspections`)).body,
    );
    expect(list.inspections.some((x) => x.id === i.id)).toBe(true);
    // The demo project's seeded inspection in progress: two spacings answered.
    expect(list.inspections.at(-1)).toMatchObject({ number: 1, status: 'in_progress', counts: { pass: 2 } });
    // The crew and the inspectors are told.
    expect(
      (await t.mailTo(demoEmail('subcontractor'), `Inspection ${i.number}: new inspection`)).text,
    ).toContain('North elevation');
  });

  it('refuses an assembly of no project of this one and a revision that does not exist, naming the field', async () => {
    const c = await as('consultant');
    const bad = await c.post(`/api/projects/${projectId}/inspections`).send({
      assemblyId: '00000000-0000-4000-8000-000000000000',
      elevation: 'N',
      area: { kind: 'zone', zone: 'edge' },
    });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.assemblyId).toBeDefined();
    const rev = await c
      .post(`/api/projects/${projectId}/inspections`)
      .send({ assemblyId, revision: 999, elevation: 'N', area: { kind: 'zone', zone: 'edge' } });
    expect(rev.status).toBe(422);
    expect(rev.body.error.fields.revision).toBeDefined();
    const area = await c
      .post(`/api/projects/${projectId}/inspections`)
      .send({ assemblyId, elevation: 'N', area: { kind: 'zone', zone: 'roof' } });
    expect(area.status).toBe(400);
    expect(Object.keys(area.body.error.fields).join()).toContain('area');
  });

  it('answers an item; a stale version gets 409 with the current item; a pass outside the tolerance is 422', async () => {
    const i = await start('subcontractor');
    const girt = itemOf(i, 'girt_spacing');
    const ok = await answer('subcontractor', girt.id, {
      version: 1,
      state: 'pass',
      measured: 1.19,
      location: 'Grid B',
    });
    expect(ok.status, ok.text).toBe(200);
    const done = itemAnswerResultSchema.parse(ok.body);
    expect(done.item).toMatchObject({ state: 'pass', measured: 1.19, version: 2, location: 'Grid B' });
    expect(done.item.check.status).toBe('within');
    expect(done.openedDeficiency).toBeNull();

    const stale = await answer('consultant', girt.id, { version: 1, state: 'fail' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect(inspectionItemSchema.parse(stale.body.current)).toMatchObject({
      version: 2,
      state: 'pass',
      measured: 1.19,
    });

    const outside = await answer('consultant', girt.id, { version: 2, state: 'pass', measured: 1.5 });
    expect(outside.status).toBe(422);
    expect(outside.body.error.fields.state).toMatch(/tolerance|accepted/);
    const seenOnly = await answer('consultant', itemOf(i, 'clip_type').id, {
      version: 1,
      state: 'pass',
      measured: 3,
    });
    expect(seenOnly.status).toBe(422);
    expect(seenOnly.body.error.fields.measured).toBeDefined();
    const nan = await answer('consultant', girt.id, { version: 2, state: 'pass', measured: 'x' });
    expect(nan.status).toBe(400);
    expect(nan.body.error.fields.measured).toBeDefined();
    const long = await answer('consultant', girt.id, { version: 2, state: 'pass', note: 'x'.repeat(5001) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.note).toMatch(/5000/);
    // The viewer and the architect only read.
    expect((await answer('viewer', girt.id, { version: 2, state: 'na' })).status).toBe(403);
    expect((await answer('architect', girt.id, { version: 2, state: 'na' })).status).toBe(403);
  });

  it('takes photos of an item: images by their bytes only', async () => {
    const i = await start();
    const item = itemOf(i, 'sill_flashing');
    const ok = await photo('subcontractor', item.id, PNG, 'sill.png');
    expect(ok.status, ok.text).toBe(201);
    const up = photoUploadResultSchema.parse(ok.body);
    expect(up.photos[0]).toMatchObject({ contentType: 'image/png', size: PNG.length });
    expect(up.item.photos).toHaveLength(1);
    const back = await (await as('viewer')).get(up.photos[0]!.url).buffer(true);
    expect(back.status).toBe(200);
    expect(Buffer.compare(back.body as Buffer, PNG)).toBe(0);

    for (const [bytes, name] of [
      [PDF, 'looks-like.jpg'],
      [TEXT, 'photo.jpg'],
    ] as const) {
      const refused = await photo('subcontractor', item.id, bytes, name);
      expect(refused.status, name).toBe(415);
      expect(refused.body.error.code).toBe('unsupported_type');
      expect(refused.body.error.message).toContain('PNG or JPEG');
    }
    expect((await photo('viewer', item.id, PNG)).status).toBe(403);
  });

  it('takes a deficiency through its states: opened by a failure, corrected with a photo, reopened, accepted', async () => {
    const i = await start();
    const item = itemOf(i, 'joint_width');
    const failed = itemAnswerResultSchema.parse(
      (
        await answer('consultant', item.id, {
          version: 1,
          state: 'fail',
          measured: 0.012,
          note: 'Joint too narrow at grid C',
        })
      ).body,
    );
    const d = failed.openedDeficiency!;
    expect(d).toMatchObject({
      state: 'open',
      number: 1,
      ownerId: users.subcontractor,
      description: 'Joint too narrow at grid C',
    });
    expect((await t.mailTo(demoEmail('subcontractor'), `deficiency ${d.number} opened`)).text).toContain(
      'Joint too narrow',
    );

    const owner = await (await as('consultant'))
      .put(`/api/deficiencies/${d.id}`)
      .send({ version: 1, dueDate: '2027-02-01' });
    expect(owner.status, owner.text).toBe(200);
    expect(owner.body.dueDate).toBe('2027-02-01');
    const notMember = await (await as('consultant'))
      .put(`/api/deficiencies/${d.id}`)
      .send({ version: 2, ownerId: 'nobody' });
    expect(notMember.status).toBe(422);
    expect(notMember.body.error.fields.ownerId).toBeDefined();

    const sub = await as('subcontractor');
    const noPhoto = await sub
      .post(`/api/deficiencies/${d.id}/correct`)
      .send({ version: 2, photoId: '00000000-0000-4000-8000-000000000000' });
    expect(noPhoto.status).toBe(422);
    expect(noPhoto.body.error.fields.photoId).toBeDefined();
    const pic = photoUploadResultSchema.parse((await photo('subcontractor', item.id, PNG)).body).photos[0]!;
    expect(
      (
        await (
          await as('consultant')
        )
          .post(`/api/deficiencies/${d.id}/correct`)
          .send({ version: 2, photoId: pic.id })
      ).status,
    ).toBe(403);
    const corrected = await sub
      .post(`/api/deficiencies/${d.id}/correct`)
      .send({ version: 2, photoId: pic.id, note: 'Re-cut' });
    expect(corrected.status, corrected.text).toBe(200);
    expect(deficiencySchema.parse(corrected.body)).toMatchObject({
      state: 'corrected',
      correctionPhotoId: pic.id,
      version: 3,
    });
    expect((await sub.post(`/api/deficiencies/${d.id}/accept`).send({ version: 3 })).status).toBe(403);

    const emptyReopen = await (await as('engineer'))
      .post(`/api/deficiencies/${d.id}/reopen`)
      .send({ version: 3, note: ' ' });
    expect(emptyReopen.status).toBe(400);
    expect(emptyReopen.body.error.fields.note).toBeDefined();
    const reopened = await (await as('engineer'))
      .post(`/api/deficiencies/${d.id}/reopen`)
      .send({ version: 3, note: 'Still short at the head' });
    expect(reopened.body.state).toBe('reopened');
    const wrong = await (await as('consultant'))
      .post(`/api/deficiencies/${d.id}/accept`)
      .send({ version: 4 });
    expect(wrong.status).toBe(409);
    expect(wrong.body.error.code).toBe('wrong_state');
    expect(
      (await sub.post(`/api/deficiencies/${d.id}/correct`).send({ version: 4, photoId: pic.id })).body.state,
    ).toBe('corrected');
    const stale = await (await as('consultant'))
      .post(`/api/deficiencies/${d.id}/accept`)
      .send({ version: 4 });
    expect(stale.status).toBe(409);
    expect(deficiencySchema.parse(stale.body.current).version).toBe(5);
    const accepted = await (await as('consultant'))
      .post(`/api/deficiencies/${d.id}/accept`)
      .send({ version: 5 });
    expect(accepted.body.state).toBe('accepted');
  });

  it('closes only when every item has a state; the answer lists the open deficiencies; then answers are refused', async () => {
    const i = await start();
    const early = await (await as('architect')).post(`/api/inspections/${i.id}/close`).send({ version: 1 });
    expect(early.status).toBe(422);
    expect(early.body.error.code).toBe('items_unseen');
    expect(early.body.error.fields.items).toBeDefined();
    const [first, ...rest] = i.items;
    await answer('consultant', first!.id, { version: 1, state: 'fail', note: 'Missing' });
    for (const item of rest)
      expect((await answer('subcontractor', item.id, { version: 1, state: 'na' })).status).toBe(200);
    expect(
      (await (await as('subcontractor')).post(`/api/inspections/${i.id}/close`).send({ version: 1 })).status,
    ).toBe(403);
    const closed = await (await as('architect')).post(`/api/inspections/${i.id}/close`).send({ version: 1 });
    expect(closed.status, closed.text).toBe(200);
    const body = inspectionCloseResultSchema.parse(closed.body);
    expect(body.inspection.status).toBe('closed');
    expect(body.openDeficiencies.map((d) => d.itemLabel)).toEqual([first!.label]);
    expect(body.inspection.signatures.map((s) => s.what)).toEqual(['created', 'closed']);
    const after = await answer('consultant', rest[0]!.id, { version: 2, state: 'pass' });
    expect(after.status).toBe(409);
    expect(after.body.error.code).toBe('closed');
    const audit = (await (await as('admin')).get(`/api/projects/${projectId}/audit`)).body.entries as {
      entity: string;
      action: string;
      entityName: string | null;
    }[];
    expect(audit.find((e) => e.entity === 'inspection')?.entityName).toMatch(/^Inspection \d+ — /);
    expect(audit.filter((e) => e.entity === 'inspection').map((e) => e.action)).toEqual(
      expect.arrayContaining(['create', 'answer', 'close', 'deficiency_open']),
    );
  });
  it('prints the field report: items with design and measured values, the photo beside its item, open deficiencies, code', async () => {
    const i = await start();
    const girt = itemOf(i, 'girt_spacing');
    await answer('consultant', girt.id, { version: 1, state: 'pass', measured: 1.19, location: 'Grid B' });
    const sill = itemOf(i, 'sill_flashing');
    await answer('consultant', sill.id, { version: 1, state: 'fail', note: 'No end dam at W1' });
    expect((await photo('subcontractor', sill.id, PNG, 'sill.png')).status).toBe(201);
    const res = await (await as('viewer'))
      .get(`/api/inspections/${i.id}/report.pdf?units=SI`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(res.status, String(res.body)).toBe(200);
    expect(res.headers['content-type']).toContain('application/pdf');
    const code = res.headers['x-verification-code'] as string;
    expect(code).toMatch(/^[A-Z2-7]{10}$/);
    const pdf = res.body as Buffer;
    const { text } = await readPdf(pdf);
    expect(text).toContain('Field inspection report');
    expect(text).toContain('Girt spacing');
    expect(text).toContain('Measured 1.19 m — within the tolerance'); // as the compliance sheet words a length
    expect(text).toContain('No end dam at W1');
    expect(text).toContain('Open deficiencies');
    expect(text).toContain(`${code.slice(0, 5)}-${code.slice(5)}`);
    expect(text).toContain('never a substitute');
    // The photo is embedded as an image, drawn on a page.
    const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
    const doc = await pdfjs.getDocument({ data: new Uint8Array(pdf), isEvalSupported: false, verbosity: 0 })
      .promise;
    let images = 0;
    for (let p = 1; p <= doc.numPages; p++) {
      const ops = await (await doc.getPage(p)).getOperatorList();
      images += ops.fnArray.filter(
        (f) => f === pdfjs.OPS.paintImageXObject || f === pdfjs.OPS.paintInlineImageXObject,
      ).length;
    }
    await doc.destroy();
    expect(images).toBe(1);
    // Same content → same bytes.
    const again = await (await as('viewer'))
      .get(`/api/inspections/${i.id}/report.pdf?units=SI`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(Buffer.compare(again.body as Buffer, pdf)).toBe(0);

    // Anyone can confirm the code on the public verification page: what this report stated, and who issued it.
    expect(text).toContain(`/verify/${code}`);
    const verified = await t.anonymous().get(`/api/verify/${code}`);
    expect(verified.status, verified.text).toBe(200);
    expect(verified.body).toMatchObject({
      kind: 'field report',
      code,
      project: { name: expect.any(String) },
      inspection: { number: i.number, elevation: i.scope.elevation, status: 'in_progress' },
      assembly: { revision: i.scope.revision },
      issuedBy: { emailDomain: expect.any(String) },
    });
    expect(verified.body.inspection.counts).toMatchObject({ pass: 1, fail: 1, openDeficiencies: 1 });
    expect(verified.body.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(verified.body.issuer.handle).toMatch(/^@/);
    // One more answer is a new report with a new code; the first code still confirms the first report.
    await answer('consultant', itemOf(i, 'clip_spacing').id, { version: 1, state: 'na' });
    const later = await (await as('viewer')).get(`/api/inspections/${i.id}/report.pdf?units=SI`);
    const laterCode = later.headers['x-verification-code'] as string;
    expect(laterCode).not.toBe(code);
    expect((await t.anonymous().get(`/api/verify/${laterCode}`)).body.inspection.counts.na).toBe(1);
    expect((await t.anonymous().get(`/api/verify/${code}`)).body.inspection.counts.na).toBe(0);
  });
  it('adds the firm’s template items; a template used by an inspection is frozen and the next save makes version 2', async () => {
    const admin = await as('admin');
    const orgId = (await admin.get(`/api/projects/${projectId}`)).body.organisationId as string;
    const url = `/api/organisations/${orgId}/inspection-template`;
    expect((await admin.get(url)).body).toEqual({ template: null });
    const first = await admin.put(url).send({ items: [{ label: 'Site left clean, offcuts removed' }] });
    expect(first.status, first.text).toBe(200);
    expect(first.body).toMatchObject({ version: 1, revision: 1, frozen: false });
    const edited = await admin
      .put(url)
      .send({ revision: 1, items: [{ label: 'Site left clean', designText: 'No offcuts in the cavity' }] });
    expect(edited.body).toMatchObject({ version: 1, revision: 2 });
    const stale = await admin.put(url).send({ revision: 1, items: [] });
    expect(stale.status).toBe(409);
    expect(stale.body.current.revision).toBe(2);
    expect((await (await as('viewer')).put(url).send({ revision: 2, items: [] })).status).toBe(403);

    const i = await start();
    expect(i.items.at(-1)).toMatchObject({
      kind: 'firm',
      label: 'Site left clean',
      designText: 'No offcuts in the cavity',
    });
    expect(i.items.at(-1)!.source.text).toContain('version 1');
    const next = await admin
      .put(url)
      .send({ revision: 2, items: [{ label: 'Site left clean' }, { label: 'Protection film removed' }] });
    expect(next.body).toMatchObject({ version: 2, frozen: false });
    expect((await admin.get(url)).body.template.version).toBe(2);
    // The inspection keeps the items it was made with.
    expect(
      inspectionSchema.parse((await admin.get(`/api/inspections/${i.id}`)).body).items.at(-1)!.label,
    ).toBe('Site left clean');
  });
  it('adds the field report to a draft submittal as a PDF file item; an inspection of no project of this one is 422', async () => {
    const i = await start();
    const sub = await as('subcontractor');
    const draft = await sub
      .post(`/api/projects/${projectId}/submittals`)
      .send({ title: 'Field inspection reports', specSection: '07 42 13', specTitle: 'Metal Wall Panels' });
    expect(draft.status, draft.text).toBe(201);
    const added = await sub
      .post(`/api/submittals/${draft.body.id}/inspection-reports`)
      .send({ inspectionId: i.id });
    expect(added.status, added.text).toBe(201);
    const item = added.body.items.at(-1);
    expect(item).toMatchObject({ kind: 'file', file: { contentType: 'application/pdf' } });
    expect(item.file.name).toMatch(new RegExp(`^inspection-${i.number}-[A-Z2-7]{10}\\.pdf$`));
    const file = await sub
      .get(`/api/submittals/${draft.body.id}/items/${item.id}/file`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect((await readPdf(file.body as Buffer)).text).toContain('Field inspection report');
    const stranger = await sub
      .post(`/api/submittals/${draft.body.id}/inspection-reports`)
      .send({ inspectionId: '00000000-0000-4000-8000-000000000000' });
    expect(stranger.status).toBe(422);
    expect(stranger.body.error.fields.inspectionId).toBeDefined();
    expect(
      (
        await (
          await as('consultant')
        )
          .post(`/api/submittals/${draft.body.id}/inspection-reports`)
          .send({ inspectionId: i.id })
      ).status,
    ).toBe(403);
  });
});
