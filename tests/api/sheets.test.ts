import { apiErrorSchema } from '@shared/schemas/common';
import { sheetVerificationSchema } from '@shared/schemas/sheets';
import { formatVerificationCode, verificationCode } from '@shared/sheets/verification';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';
import { firstPagePng, hasPdftoppm, keepArtifact, readPdf } from '../setup/pdf';

/** Collects a binary body (supertest buffers JSON and text only). */
const binary = (res: Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

const MAX_SHEET_BYTES = 500 * 1024;

/**
 * Compliance sheets: the PDF of a stored run read back with pdfjs (verdict, cautions, verification code,
 * metadata, size), rendered to PNG with poppler, and the public verification of its code.
 */
describe.each(testDatabases())('compliance sheets on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  let assemblyId: string;
  let setId: string;
  let run: { id: string; hash: string; verdict: string };
  let pdf: Buffer;

  const newRun = async () =>
    (
      await (
        await t.as(demoEmail('subcontractor'))
      )
        .post(`/api/assemblies/${assemblyId}/check-runs`)
        .send({ criteriaSetId: setId })
    ).body as { id: string; hash: string; verdict: string };
  const sheet = async (who: string, runId: string, query = '') =>
    (await t.as(demoEmail(who))).get(`/api/check-runs/${runId}/sheet.pdf${query}`).buffer(true).parse(binary);

  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const sub = await t.as(demoEmail('subcontractor'));
    assemblyId = (await sub.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0].id;
    const sets = (await sub.get(`/api/projects/${projectId}/criteria-sets`)).body.criteriaSets as {
      id: string;
      name: string;
    }[];
    setId = sets.find((s) => s.name.startsWith('Illustrative example'))!.id;
    run = await newRun();
    const res = await sheet('viewer', run.id, '?units=SI');
    expect(res.status).toBe(200);
    pdf = res.body as Buffer;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('is a PDF under 500 kB with the headers of a download', async () => {
    const res = await sheet('architect', run.id, '?units=SI');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="compliance-sheet-[a-z0-9-]+-[A-Z2-7]{10}\.pdf"$/,
    );
    expect(res.headers['x-verification-code']).toBe(verificationCode(run.hash));
    expect((res.body as Buffer).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    console.log(`compliance sheet: ${pdf.length} bytes (limit ${MAX_SHEET_BYTES})`);
    expect(pdf.length).toBeLessThan(MAX_SHEET_BYTES);
    const inline = await sheet('architect', run.id, '?disposition=inline');
    expect(inline.headers['content-disposition']).toMatch(/^inline; /);
  });

  it('prints the verdict, the cautions, the verification code and page numbers, as selectable text', async () => {
    const { text, pages, info, xmp } = await readPdf(pdf);
    const code = verificationCode(run.hash);
    expect(pages.length).toBeGreaterThan(1);
    expect(text).toContain('Compliance sheet');
    expect(text).toContain(`Overall verdict: ${run.verdict.toUpperCase()}`);
    expect(text).toContain('aid to — never a substitute for — the licensed professional of record');
    expect(text).toContain('authority having jurisdiction govern');
    expect(text).toContain('manufacturer’s tested values govern');
    expect(text).toContain(formatVerificationCode(code));
    expect(text).toContain(`http://localhost:5180/verify/${code}`);
    expect(text).toContain('PROFESSIONAL’S REVIEW STAMP');
    pages.forEach((p, i) => {
      expect(p).toContain(`Page ${i + 1} of ${pages.length}`);
    });
    // Inputs, formulas and every check, read from the stored run.
    expect(text).toContain('Mineral wool board');
    expect(text).toContain('U_eff = U₀ + ΣΔU');
    expect(text).toContain('Maximum U-factor');
    expect(text).toMatch(/meets — margin \d+/);
    expect(text).toMatch(/fails — short by [\d.]+\s*mm/);
    expect(text).toContain('Scale 1:5');
    // Metadata for archives and search.
    expect(info.Title).toMatch(/^Compliance sheet — /);
    expect(info.Subject).toContain('FAIL');
    expect(info.Author).toBe('Rafael Ducharme');
    expect(info.Creator).toMatch(/^Skinwright /);
    expect(info.Keywords).toContain(`verification ${code}`);
    expect(info.Language).toBe('en-GB');
    expect(xmp?.get('dc:title')).toMatch(/^Compliance sheet — /);
  });

  it('is the same bytes every time, and prints IP units on request', async () => {
    const again = await sheet('engineer', run.id, '?units=SI');
    expect(Buffer.compare(again.body as Buffer, pdf)).toBe(0);
    const ip = await sheet('engineer', run.id, '?units=IP');
    const { text } = await readPdf(ip.body as Buffer);
    expect(text).toContain('h·ft²·°F/Btu');
    expect(text).toContain('°F');
    expect((ip.body as Buffer).length).toBeLessThan(MAX_SHEET_BYTES);
  });

  it('renders to PNG with poppler (first page kept as an artifact)', (ctx) => {
    if (!hasPdftoppm()) {
      console.warn(
        'pdftoppm (Debian poppler-utils) is not installed: the PNG rendering check is skipped here; CI installs it',
      );
      ctx.skip();
    }
    const png = firstPagePng(pdf);
    expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
    expect(png.length).toBeGreaterThan(20_000);
    if (kind === 'pglite') keepArtifact('compliance-sheet-page-1.png', png);
  });

  it('refuses bad queries and hides runs of other projects', async () => {
    expect((await sheet('viewer', run.id, '?units=metric')).status).toBe(400);
    expect((await sheet('outsider', run.id)).status).toBe(404);
    expect((await t.anonymous().get(`/api/check-runs/${run.id}/sheet.pdf`)).status).toBe(401);
  });

  describe('verification', () => {
    const verify = (code: string) => t.anonymous().get(`/api/verify/${encodeURIComponent(code)}`);

    it('confirms an issued sheet without signing in', async () => {
      const code = verificationCode(run.hash);
      const res = await verify(code);
      expect(res.status).toBe(200);
      const v = sheetVerificationSchema.parse(res.body);
      expect(v).toMatchObject({
        code,
        issuer: { name: 'Ridgeline Cladding Co. (demo)', handle: '@demo-ridgeline' },
        project: { name: 'Corvid Lane Cold Store', number: 'LA-2611' },
        assembly: { revision: 1 },
        verdict: run.verdict,
      });
      expect(v.assembly.name).toMatch(/^Metal rainscreen/);
      expect(v.hash).toBe(run.hash);
      // Typed by hand: any case, with the printed hyphen.
      expect((await verify(formatVerificationCode(code).toLowerCase())).status).toBe(200);
    });

    it('says "no such sheet" for a tampered, unknown or malformed code', async () => {
      const code = verificationCode(run.hash);
      const tampered = code.slice(0, 9) + (code[9] === 'A' ? 'B' : 'A');
      for (const bad of [
        tampered,
        'AAAAAAAAAA',
        'not-a-code',
        '0000000000',
        `${code}A`,
        '../../etc/passwd',
      ]) {
        const res = await verify(bad);
        expect(res.status, bad).toBe(404);
        expect(apiErrorSchema.parse(res.body).error.code).toBe('no_such_sheet');
      }
    });

    it('knows a run’s code only once its sheet has been issued; identical runs share it', async () => {
      // The hash covers the content only: the same inputs again give the same code.
      expect(verificationCode((await newRun()).hash)).toBe(verificationCode(run.hash));
      // Another code table → other content → a code nobody has issued yet.
      const admin = await t.as(demoEmail('admin'));
      const orgId = (await admin.get('/api/me')).body.organisations[0].id;
      setId = (await admin.post(`/api/organisations/${orgId}/criteria-sets`).send({ name: 'Fresh table' }))
        .body.id;
      const fresh = await newRun();
      const code = verificationCode(fresh.hash);
      expect((await verify(code)).status).toBe(404);
      expect((await sheet('subcontractor', fresh.id)).status).toBe(200);
      expect((await verify(code)).status).toBe(200);
    });
  });
});
