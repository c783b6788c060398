import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { apiErrorSchema } from '@shared/schemas/common';
import {
  submittalListSchema,
  submittalSchema,
  UPLOAD_LIMITS,
  uploadResultSchema,
} from '@shared/schemas/submittals';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

/** Small real files: a one-pixel PNG, a minimal PDF, a JPEG header; and things that are not allowed. */
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);
const PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj 2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj 3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 200 200]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
  'latin1',
);
const JPEG = Buffer.concat([
  Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]),
  Buffer.from('JFIF\0'),
  Buffer.alloc(64),
]);
const DWG = Buffer.concat([Buffer.from('AC1027', 'latin1'), Buffer.alloc(120)]);
const TEXT = Buffer.from('just some text pretending to be a PDF\n');
const ZIP = Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0, 0, 0, 8, 0]), Buffer.alloc(100)]);
const EXE = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200)]);

/** Every file under a folder (the local fake S3 keeps objects as files). */
function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = path.join(dir, name);
    return statSync(p).isDirectory() ? filesUnder(p) : [p];
  });
}

describe.each(testDatabases())('submittals on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  let runId: string;
  /** A run of the demo assembly against a code table it cannot meet (U ≤ 0.01 W/(m²·K)): its sheet fails. */
  let failingRunId: string;
  const users: Record<string, string> = {};

  const as = (who: string) => t.as(demoEmail(who));
  const create = async (who = 'subcontractor', over: Record<string, unknown> = {}) => {
    const res = await (await as(who)).post(`/api/projects/${projectId}/submittals`).send({
      title: 'Insulated metal wall panels',
      specSection: '07 42 13',
      specTitle: 'Metal Wall Panels',
      reviewerIds: [users.architect, users.engineer],
      ...over,
    });
    expect(res.status, res.text).toBe(201);
    return submittalSchema.parse(res.body);
  };
  const upload = async (id: string, files: [Buffer, string][], who = 'subcontractor') => {
    let req = (await as(who)).post(`/api/submittals/${id}/files`);
    for (const [bytes, name] of files)
      req = req.attach('files', bytes, { filename: name, contentType: 'application/pdf' });
    return req;
  };
  const stored = async () => ({ keys: await t.storage.list(), files: filesUnder(t.storageDir) });

  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const members = (await (await as('admin')).get(`/api/projects/${projectId}/members`)).body.members as {
      userId: string;
      role: string;
    }[];
    for (const m of members) users[m.role === 'envelope_consultant' ? 'consultant' : m.role] = m.userId;
    const sub = await as('subcontractor');
    const assemblyId = (await sub.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0].id;
    const sets = (await sub.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets as {
      id: string;
    }[];
    runId = (await sub.post(`/api/assemblies/${assemblyId}/check-runs`).send({ criteriaSetId: sets[0]!.id }))
      .body.id;
    const admin = await as('admin');
    const orgId = (await admin.get('/api/me')).body.organisations[0].id as string;
    const wallCategory = (await sub.get(`/api/assemblies/${assemblyId}`)).body.wallCategory as string;
    const strict = await admin.post(`/api/organisations/${orgId}/criteria-sets`).send({
      name: 'Unmeetable table (invented values)',
      rows: [{ climateZone: '*', wallCategory, criterion: 'max_u_factor', value: 0.01, note: 'invented' }],
    });
    expect(strict.status, strict.text).toBe(201);
    const failing = await sub
      .post(`/api/assemblies/${assemblyId}/check-runs`)
      .send({ criteriaSetId: strict.body.id });
    expect(failing.body.verdict).toBe('fail');
    failingRunId = failing.body.id;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('runs the whole workflow: draft → submitted → under review → revise and resubmit → approved', async () => {
    const sub = await as('subcontractor');
    const architect = await as('architect');
    const s = await create();
    expect(s).toMatchObject({ number: '07 42 13-001', revision: 1, status: 'draft', readOnly: false });
    expect(s.submitter?.name).toBe('Rafael Ducharme');

    // Not ready: no item yet.
    const early = await sub.post(`/api/submittals/${s.id}/submit`).send({});
    expect(early.status).toBe(422);
    expect(early.body.error.fields.items).toBeDefined();

    // A compliance sheet and two files.
    const withSheet = await sub.post(`/api/submittals/${s.id}/sheets`).send({ checkRunId: runId });
    expect(withSheet.status).toBe(201);
    const sheetItem = submittalSchema.parse(withSheet.body).items[0]!;
    expect(sheetItem.kind).toBe('sheet');
    expect(sheetItem.kind === 'sheet' && sheetItem.sheet.verificationCode).toMatch(/^[A-Z2-7]{10}$/);
    // The attached sheet's code is issued: the public page confirms it.
    const code = sheetItem.kind === 'sheet' ? sheetItem.sheet.verificationCode : '';
    expect((await t.anonymous().get(`/api/verify/${code}`)).status).toBe(200);
    expect((await sub.post(`/api/submittals/${s.id}/sheets`).send({ checkRunId: runId })).status).toBe(409);
    const up = await upload(s.id, [
      [PDF, 'Panel product data.pdf'],
      [PNG, 'clip-photo.png'],
    ]);
    expect(up.status, up.text).toBe(201);
    const uploaded = uploadResultSchema.parse(up.body);
    expect(uploaded.items.map((i) => i.kind === 'file' && [i.file.name, i.file.contentType])).toEqual([
      ['Panel product data.pdf', 'application/pdf'],
      ['clip-photo.png', 'image/png'],
    ]);

    const mailBefore = (await t.mail()).length;
    const submitted = await sub
      .post(`/api/submittals/${s.id}/submit`)
      .send({ version: uploaded.submittal.version });
    expect(submitted.status, submitted.text).toBe(200);
    expect(submitted.body.status).toBe('submitted');
    // Each reviewer gets an e-mail with a link to the submittal.
    const mail = (await t.mail()).slice(0, (await t.mail()).length - mailBefore);
    const review = mail.filter((m) => m.subject.startsWith('For your review: submittal 07 42 13-001 rev 1'));
    expect(review.map((m) => m.to).sort()).toEqual([demoEmail('architect'), demoEmail('engineer')]);
    expect(review[0]!.text).toContain(`/projects/${projectId}/submittals/${s.id}`);

    // Drafts only are edited: now its items stay as submitted.
    expect((await upload(s.id, [[PDF, 'late.pdf']])).status).toBe(409);

    // A reviewer who is not named may not decide; a named one takes it under review.
    const consultant = await as('consultant');
    const notNamed = await consultant.post(`/api/submittals/${s.id}/review`).send({});
    expect(notNamed.status).toBe(403);
    expect(notNamed.body.error.code).toBe('not_a_reviewer');
    const underReview = await architect.post(`/api/submittals/${s.id}/review`).send({});
    expect(underReview.body.status).toBe('under_review');

    // Comments per item and on the whole submittal.
    const engineer = await as('engineer');
    const onItem = await engineer
      .post(`/api/submittals/${s.id}/comments`)
      .send({ body: 'Clip spacing at the corners?', itemId: sheetItem.id });
    expect(onItem.status).toBe(201);
    expect(
      (await architect.post(`/api/submittals/${s.id}/comments`).send({ body: 'See my note.' })).status,
    ).toBe(201);
    const viewer = await as('viewer');
    expect((await viewer.post(`/api/submittals/${s.id}/comments`).send({ body: 'hello' })).status).toBe(403);

    // Revise and resubmit needs a note. Every named reviewer decides: the architect's decision alone leaves
    // the revision under review; the engineer's closes it with the more severe of the two, which opens
    // revision 2 as a draft with the items.
    expect(
      (await architect.post(`/api/submittals/${s.id}/decision`).send({ decision: 'revise_and_resubmit' }))
        .status,
    ).toBe(400);
    const first = await architect
      .post(`/api/submittals/${s.id}/decision`)
      .send({ decision: 'revise_and_resubmit', note: 'Add the clip test report.' });
    expect(first.status, first.text).toBe(200);
    expect(first.body).toMatchObject({ status: 'under_review', decision: null, readOnly: false });
    const decided = await engineer
      .post(`/api/submittals/${s.id}/decision`)
      .send({ decision: 'approved', failingSheetConfirmation: 'APPROVE' });
    expect(decided.status, decided.text).toBe(200);
    const rev1 = submittalSchema.parse(decided.body);
    expect(rev1).toMatchObject({ status: 'revise_and_resubmit', readOnly: true });
    expect(rev1.decision?.decision).toBe('revise_and_resubmit');
    expect(rev1.decision?.note).toContain('Add the clip test report.');
    expect(rev1.revisions.map((r) => [r.revision, r.status])).toEqual([
      [1, 'revise_and_resubmit'],
      [2, 'draft'],
    ]);
    const decisionMail = (await t.mail()).find(
      (m) => m.subject === 'Submittal 07 42 13-001 rev 1: Revise and resubmit',
    );
    expect(decisionMail?.to).toBe(demoEmail('subcontractor'));
    expect(decisionMail?.text).toContain('Add the clip test report.');

    // Revision 1 is read-only from now on.
    const frozen = await sub.put(`/api/submittals/${s.id}`).send({
      version: rev1.version,
      changes: { title: 'x', specSection: '07 42 13', specTitle: 'Metal Wall Panels' },
    });
    expect(frozen.status).toBe(409);
    expect(frozen.body.error.code).toBe('read_only');
    expect((await architect.post(`/api/submittals/${s.id}/comments`).send({ body: 'late' })).status).toBe(
      409,
    );

    // Revision 2: the same number, reviewers and items; one more file, submitted, approved.
    const rev2Id = rev1.revisions[1]!.id;
    const rev2 = submittalSchema.parse((await sub.get(`/api/submittals/${rev2Id}`)).body);
    expect(rev2).toMatchObject({ number: '07 42 13-001', revision: 2, status: 'draft', lineageId: s.id });
    expect(rev2.items.length).toBe(3);
    expect(rev2.reviewers.map((r) => r.role).sort()).toEqual(['architect', 'engineer']);
    expect((await upload(rev2Id, [[JPEG, 'clip test report scan.jpg']])).status).toBe(201);
    expect((await sub.post(`/api/submittals/${rev2Id}/submit`).send({})).status).toBe(200);
    // Revision 2's reviewers start undecided.
    expect(
      submittalSchema
        .parse((await sub.get(`/api/submittals/${rev2Id}`)).body)
        .reviewers.map((r) => r.decision),
    ).toEqual([null, null]);
    for (const reviewer of [architect, engineer])
      expect(
        (
          await reviewer
            .post(`/api/submittals/${rev2Id}/decision`)
            .send({ decision: 'approved', failingSheetConfirmation: 'APPROVE' })
        ).status,
      ).toBe(200);
    const approved = await sub.get(`/api/submittals/${rev2Id}`);
    expect(approved.body.status).toBe('approved');
    expect((await t.mail()).some((m) => m.subject === 'Submittal 07 42 13-001 rev 2: Approved')).toBe(true);

    // The list shows the latest revision of each submittal; filter by status.
    const list = submittalListSchema.parse((await viewer.get(`/api/projects/${projectId}/submittals`)).body);
    const mine = list.submittals.filter((x) => x.lineageId === s.id);
    expect(mine.map((x) => [x.revision, x.status, x.itemCount])).toEqual([[2, 'approved', 4]]);
    const onlyApproved = submittalListSchema.parse(
      (await viewer.get(`/api/projects/${projectId}/submittals?status=approved`)).body,
    );
    expect(onlyApproved.submittals.every((x) => x.status === 'approved')).toBe(true);
    expect((await viewer.get(`/api/projects/${projectId}/submittals?status=lost`)).status).toBe(400);

    // Every step is in the activity log.
    const audit = (await (await as('admin')).get(`/api/projects/${projectId}/audit`)).body.entries as {
      entity: string;
      action: string;
    }[];
    const actions = audit.filter((a) => a.entity === 'submittal').map((a) => a.action);
    for (const a of [
      'create',
      'add_sheet',
      'upload',
      'submit',
      'start_review',
      'comment',
      'decide',
      'close_review',
      'open_revision',
    ])
      expect(actions).toContain(a);
  });

  it('keeps edits safe with versions and checks the reviewers', async () => {
    const sub = await as('subcontractor');
    const s = await create('subcontractor', { specSection: '07 42 93', specTitle: 'Soffit Panels' });
    expect(s.number).toBe('07 42 93-001');
    const changes = {
      title: 'Soffit panels',
      specSection: '07 42 93',
      specTitle: 'Soffit Panels',
      dueDate: '2027-02-01',
      reviewerIds: [users.consultant],
    };
    const ok = await sub.put(`/api/submittals/${s.id}`).send({ version: s.version, changes });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body).toMatchObject({ title: 'Soffit panels', dueDate: '2027-02-01', version: s.version + 1 });
    const stale = await sub
      .put(`/api/submittals/${s.id}`)
      .send({ version: s.version, changes: { ...changes, title: 'Mine' } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect(submittalSchema.parse(stale.body.current).title).toBe('Soffit panels');
    // A subcontractor does not review; an outsider is not on the project.
    const bad = await sub.put(`/api/submittals/${s.id}`).send({
      version: s.version + 1,
      changes: { ...changes, reviewerIds: [users.subcontractor, 'nobody'] },
    });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.error.fields)).toEqual(['reviewerIds.0', 'reviewerIds.1']);
    // Numbers are unique on the project; spec sections are MasterFormat numbers.
    expect(
      (await sub.post(`/api/projects/${projectId}/submittals`).send({ ...changes, number: '07 42 93-001' }))
        .status,
    ).toBe(409);
    expect(
      (await sub.post(`/api/projects/${projectId}/submittals`).send({ ...changes, specSection: '7421' }))
        .status,
    ).toBe(400);
    // Not ready: no reviewer and no item.
    const bare = await create('subcontractor', { reviewerIds: [] });
    const r = await sub.post(`/api/submittals/${bare.id}/submit`).send({});
    expect(r.status).toBe(422);
    expect(Object.keys(r.body.error.fields).sort()).toEqual(['items', 'reviewerIds']);
    // A run of another project is not attachable (and not revealed).
    expect(
      (
        await sub
          .post(`/api/submittals/${bare.id}/sheets`)
          .send({ checkRunId: '00000000-0000-4000-8000-000000000000' })
      ).status,
    ).toBe(404);
    // Steps on a stale version are refused too, with the submittal as it is now.
    const staleStep = await sub.post(`/api/submittals/${bare.id}/submit`).send({ version: 99 });
    expect(staleStep.status).toBe(409);
    expect(staleStep.body.error.code).toBe('version_conflict');
    expect(submittalSchema.parse(staleStep.body.current)).toMatchObject({ id: bare.id, status: 'draft' });
  });

  it('answers every stale version with 409 and the current submittal, also when two steps race', async () => {
    const sub = await as('subcontractor');
    const s = await create();
    await sub.post(`/api/submittals/${s.id}/sheets`).send({ checkRunId: runId });
    const { version } = submittalSchema.parse((await sub.get(`/api/submittals/${s.id}`)).body);
    const submitted = await sub.post(`/api/submittals/${s.id}/submit`).send({ version });
    expect(submitted.status, submitted.text).toBe(200);
    // Two reviewers start the review from the same version at once: one applies, the other is stale.
    const [a, b] = await Promise.all(
      ['architect', 'engineer'].map(async (who) =>
        (await as(who)).post(`/api/submittals/${s.id}/review`).send({ version: version + 1 }),
      ),
    );
    expect([a!.status, b!.status].sort()).toEqual([200, 409]);
    const lost = a!.status === 409 ? a! : b!;
    expect(lost.body.error.code).toBe('version_conflict');
    expect(submittalSchema.parse(lost.body.current)).toMatchObject({ id: s.id, status: 'under_review' });
    // A decision on a version read before the review started is stale too.
    const stale = await (await as('architect'))
      .post(`/api/submittals/${s.id}/decision`)
      .send({ decision: 'approved', note: '', version });
    expect(stale.status).toBe(409);
    expect(submittalSchema.parse(stale.body.current).version).toBe(version + 2);
  });

  // The rule for several reviewers (DEVELOPERS.md "Submittal workflow"): every named reviewer decides; the
  // revision closes on the last decision, with the most severe one (rejected > revise and resubmit >
  // approved as noted > approved); the submitter is e-mailed once, when it closes.
  it('waits for every named reviewer and closes with the most severe decision', async () => {
    const sub = await as('subcontractor');
    const architect = await as('architect');
    const engineer = await as('engineer');
    const s = await create('subcontractor', { specSection: '07 42 16', specTitle: 'Metal Composite Panels' });
    expect((await upload(s.id, [[PDF, 'Product data.pdf']])).status).toBe(201);
    expect((await sub.post(`/api/submittals/${s.id}/submit`).send({})).status).toBe(200);
    const subject = `Submittal ${s.number} rev 1:`;
    const closingMail = async () => (await t.mail()).filter((m) => m.subject.startsWith(subject));

    // One of two decides (without starting the review first): still under review, nobody e-mailed.
    const one = await architect.post(`/api/submittals/${s.id}/decision`).send({ decision: 'approved' });
    expect(one.status, one.text).toBe(200);
    const half = submittalSchema.parse(one.body);
    expect(half).toMatchObject({ status: 'under_review', decision: null, readOnly: false });
    expect(half.reviewers.map((r) => [r.role, r.decision?.decision ?? null])).toEqual([
      ['architect', 'approved'],
      ['engineer', null],
    ]);
    expect(await closingMail()).toEqual([]);
    // A reviewer may change their own decision while the others have not decided.
    const changed = await architect
      .post(`/api/submittals/${s.id}/decision`)
      .send({ decision: 'approved_as_noted', note: 'Seal the panel joints at the parapet.' });
    expect(changed.body.status).toBe('under_review');
    // Comments are still open.
    expect((await engineer.post(`/api/submittals/${s.id}/comments`).send({ body: 'Looking.' })).status).toBe(
      201,
    );

    // The second closes it: rejected is more severe than approved as noted.
    const two = await engineer
      .post(`/api/submittals/${s.id}/decision`)
      .send({ decision: 'rejected', note: 'The clip capacity is not shown.' });
    expect(two.status, two.text).toBe(200);
    const closed = submittalSchema.parse(two.body);
    expect(closed).toMatchObject({ status: 'rejected', readOnly: true });
    expect(closed.decision?.decision).toBe('rejected');
    expect(closed.decision?.by).toBe(closed.reviewers.map((r) => r.name).join(', '));
    expect(closed.decision?.note).toContain('Seal the panel joints at the parapet.');
    expect(closed.decision?.note).toContain('The clip capacity is not shown.');
    expect(closed.reviewers.map((r) => [r.role, r.decision?.decision, r.decision?.note])).toEqual([
      ['architect', 'approved_as_noted', 'Seal the panel joints at the parapet.'],
      ['engineer', 'rejected', 'The clip capacity is not shown.'],
    ]);
    // One e-mail to the submitter, with each reviewer's decision and note.
    const mail = await closingMail();
    expect(mail.map((m) => [m.to, m.subject])).toEqual([[demoEmail('subcontractor'), `${subject} Rejected`]]);
    expect(mail[0]!.text).toContain('Approved as noted\nSeal the panel joints at the parapet.');
    expect(mail[0]!.text).toContain('Rejected\nThe clip capacity is not shown.');
    // Closed: nobody decides again.
    const late = await architect.post(`/api/submittals/${s.id}/decision`).send({ decision: 'approved' });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('read_only');
  });

  it('approves a package whose sheet fails only with a typed confirmation', async () => {
    const sub = await as('subcontractor');
    const architect = await as('architect');
    const s = await create('subcontractor', {
      specSection: '07 42 43',
      specTitle: 'Composite Wall Panels',
      reviewerIds: [users.architect],
    });
    expect((await sub.post(`/api/submittals/${s.id}/sheets`).send({ checkRunId: failingRunId })).status).toBe(
      201,
    );
    expect((await sub.post(`/api/submittals/${s.id}/submit`).send({})).status).toBe(200);
    for (const body of [
      { decision: 'approved' },
      { decision: 'approved_as_noted', note: 'Fine.' },
      { decision: 'approved', failingSheetConfirmation: 'yes' },
    ]) {
      const refused = await architect.post(`/api/submittals/${s.id}/decision`).send(body);
      expect(refused.status, JSON.stringify(body)).toBe(422);
      expect(refused.body.error.code).toBe('confirmation_required');
      expect(Object.keys(refused.body.error.fields)).toEqual(['failingSheetConfirmation']);
    }
    // Nothing was recorded by the refusals.
    const still = submittalSchema.parse((await architect.get(`/api/submittals/${s.id}`)).body);
    expect(still.reviewers[0]!.decision).toBeNull();
    expect(still.status).toBe('submitted');
    const ok = await architect
      .post(`/api/submittals/${s.id}/decision`)
      .send({ decision: 'approved', failingSheetConfirmation: 'APPROVE' });
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body.status).toBe('approved');
  });

  it('needs no confirmation to send a failing sheet back', async () => {
    const sub = await as('subcontractor');
    const s = await create('subcontractor', {
      specSection: '07 42 46',
      specTitle: 'Fiber-Cement Siding',
      reviewerIds: [users.architect],
    });
    await sub.post(`/api/submittals/${s.id}/sheets`).send({ checkRunId: failingRunId });
    await sub.post(`/api/submittals/${s.id}/submit`).send({});
    const back = await (await as('architect'))
      .post(`/api/submittals/${s.id}/decision`)
      .send({ decision: 'revise_and_resubmit', note: 'The U-factor fails the table.' });
    expect(back.status, back.text).toBe(200);
    expect(back.body.status).toBe('revise_and_resubmit');
  });

  describe('uploads', () => {
    let draftId: string;
    beforeAll(async () => {
      draftId = (
        await create('subcontractor', { specSection: '07 62 00', specTitle: 'Sheet Metal Flashing and Trim' })
      ).id;
    });

    const refusedAndNothingStored = async (res: Response, status: number, code: string) => {
      expect(res.status, res.text).toBe(status);
      expect(apiErrorSchema.parse(res.body).error.code).toBe(code);
    };

    it('stores by content type, with safe names, and returns the bytes unchanged', async () => {
      const before = await stored();
      const res = await upload(draftId, [
        [PDF, '../../etc/passwd.pdf'],
        [PNG, 'C:\\Users\\rafael\\Desktop\\site photo.png'],
        [JPEG, 'report\u202egpj.exe.jpg'],
        [DWG, 'shop drawing A-101.dwg'],
        [PNG, 'photo-named-as.pdf'],
      ]);
      expect(res.status, res.text).toBe(201);
      const items = uploadResultSchema.parse(res.body).items;
      expect(items.map((i) => i.kind === 'file' && [i.file.name, i.file.contentType, i.file.size])).toEqual([
        ['passwd.pdf', 'application/pdf', PDF.length],
        ['site photo.png', 'image/png', PNG.length],
        ['reportgpj.exe.jpg', 'image/jpeg', JPEG.length],
        ['shop drawing A-101.dwg', 'image/vnd.dwg', DWG.length],
        ['photo-named-as.pdf.png', 'image/png', PNG.length],
      ]);
      const after = await stored();
      expect(after.keys.length - before.keys.length).toBe(5);
      // Keys are ours: uuids under the project, never the client's name.
      for (const k of after.keys) expect(k).toMatch(/^projects\/[0-9a-f-]{36}\/submittals\/[0-9a-f-]{36}$/);

      // Downloads: identical bytes, the detected type, a safe attachment name, for project members only.
      for (const [i, original] of [PDF, PNG, JPEG, DWG].entries()) {
        const item = items[i]!;
        const got = await (await as('viewer'))
          .get(`/api/submittals/${draftId}/items/${item.id}/file`)
          .buffer(true)
          .parse(binary);
        expect(got.status).toBe(200);
        expect(Buffer.compare(got.body as Buffer, original)).toBe(0);
        expect(got.headers['content-type']).toBe(item.kind === 'file' ? item.file.contentType : '');
        expect(got.headers['content-disposition']).toMatch(/^attachment; filename=/);
        expect(got.headers['x-content-type-options']).toBe('nosniff');
      }
      expect(
        (await (await as('outsider')).get(`/api/submittals/${draftId}/items/${items[0]!.id}/file`)).status,
      ).toBe(404);
      expect((await t.anonymous().get(`/api/submittals/${draftId}/items/${items[0]!.id}/file`)).status).toBe(
        401,
      );

      // Control characters can only arrive percent-encoded (RFC 5987 filename*); raw ones break the part header.
      const boundary = 'sw-boundary-1';
      const raw = Buffer.concat([
        Buffer.from(
          `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename*=UTF-8''..%2F..%2Frep%00ort%07%1B%5B31m.png\r\nContent-Type: image/png\r\n\r\n`,
        ),
        PNG,
        Buffer.from(`\r\n--${boundary}--\r\n`),
      ]);
      const encoded = await (await as('subcontractor'))
        .post(`/api/submittals/${draftId}/files`)
        .set('content-type', `multipart/form-data; boundary=${boundary}`)
        .send(raw);
      expect(encoded.status, encoded.text).toBe(201);
      const named = uploadResultSchema.parse(encoded.body).items[0]!;
      expect(named.kind === 'file' && named.file.name).toBe('report[31m.png');
      const rawControl = await upload(draftId, [[PNG, 'rep\u0007ort.png']]);
      expect(rawControl.status).toBe(400);
      await (await as('subcontractor')).delete(`/api/submittals/${draftId}/items/${named.id}`);

      // Removing an item removes its stored object (no other revision refers to it).
      const removed = await (await as('subcontractor')).delete(
        `/api/submittals/${draftId}/items/${items[4]!.id}`,
      );
      expect(removed.status).toBe(200);
      expect((await stored()).keys.length).toBe(after.keys.length - 1);
    });

    it('refuses what is too big, of the wrong type, empty or too many — and keeps nothing', async () => {
      const before = await stored();
      const big = Buffer.concat([PDF, Buffer.alloc(UPLOAD_LIMITS.maxFileBytes + 1 - PDF.length)]);
      await refusedAndNothingStored(await upload(draftId, [[big, 'huge.pdf']]), 413, 'limit_file_size');
      await refusedAndNothingStored(
        await upload(draftId, [[TEXT, 'specification.pdf']]),
        415,
        'unsupported_type',
      );
      await refusedAndNothingStored(await upload(draftId, [[ZIP, 'drawings.pdf']]), 415, 'unsupported_type');
      await refusedAndNothingStored(await upload(draftId, [[EXE, 'setup.pdf']]), 415, 'unsupported_type');
      await refusedAndNothingStored(
        await upload(draftId, [[Buffer.alloc(0), 'empty.pdf']]),
        400,
        'empty_file',
      );
      const many = Array.from(
        { length: UPLOAD_LIMITS.maxFiles + 1 },
        (_, i) => [PNG, `p${i}.png`] as [Buffer, string],
      );
      await refusedAndNothingStored(await upload(draftId, many), 413, 'limit_file_count');
      // All or nothing: one bad file refuses the whole batch.
      await refusedAndNothingStored(
        await upload(draftId, [
          [PDF, 'good.pdf'],
          [TEXT, 'bad.pdf'],
        ]),
        415,
        'unsupported_type',
      );
      // Not multipart at all.
      await refusedAndNothingStored(
        await (await as('subcontractor')).post(`/api/submittals/${draftId}/files`).send({ files: 'x' }),
        415,
        'multipart_required',
      );
      await refusedAndNothingStored(
        await (await as('subcontractor'))
          .post(`/api/submittals/${draftId}/files`)
          .attach('other', PNG, { filename: 'a.png' }),
        400,
        'limit_unexpected_file',
      );
      const after = await stored();
      expect(after.keys).toEqual(before.keys);
      expect(after.files.sort()).toEqual(before.files.sort());
      const s = submittalSchema.parse(
        (await (await as('subcontractor')).get(`/api/submittals/${draftId}`)).body,
      );
      expect(s.items.length).toBe(4);
    });

    it('lets only the submitting side upload', async () => {
      expect((await upload(draftId, [[PNG, 'a.png']], 'architect')).status).toBe(403);
      expect((await upload(draftId, [[PNG, 'a.png']], 'viewer')).status).toBe(403);
      expect((await upload(draftId, [[PNG, 'a.png']], 'outsider')).status).toBe(404);
    });
  });
});
