import { CSV_COLUMNS } from '@shared/checks/criteria-csv';
import { storedMessageText } from '@shared/format';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import demoAssembly from '../../data/seed/demo-assembly.json' with { type: 'json' };
import { createTestApp, demoEmail, type TestApp, testDatabases } from '../setup/app';

const header = CSV_COLUMNS.join(',');
type Row = {
  climateZone: string;
  wallCategory: string;
  criterion: string;
  value: number | boolean;
  note: string;
};
const row = (
  criterion: string,
  value: number | boolean,
  climateZone = '5A',
  wallCategory = 'steel_framed',
): Row => ({
  climateZone,
  wallCategory,
  criterion,
  value,
  note: '',
});
const strip = (rows: (Row & { id?: string })[]) => rows.map(({ id: _id, ...r }) => r);

describe.each(testDatabases())('code tables and check runs on %s', (kind) => {
  let t: TestApp;
  let projectId: string;
  let orgId: string;
  let assemblyId: string;
  beforeAll(async () => {
    t = await createTestApp(kind);
    projectId = await t.demoProjectId();
    const admin = await t.as(demoEmail('admin'));
    orgId = (await admin.get('/api/me')).body.organisations[0].id;
    assemblyId = (await admin.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0].id;
  });
  afterAll(async () => {
    await t?.close();
  });

  const newSet = async (rows: Row[], name = 'Test table', who = 'architect') => {
    const res = await (await t.as(demoEmail(who)))
      .post(`/api/organisations/${orgId}/criteria-sets`)
      .send({ name, rows });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body as { id: string; revision: number; version: number; rows: (Row & { id: string })[] };
  };

  it('seeds the demo firm’s illustrative table, titled as not any jurisdiction’s code', async () => {
    const architect = await t.as(demoEmail('architect'));
    const list = await architect.get(`/api/organisations/${orgId}/criteria-sets`);
    expect(list.status).toBe(200);
    const example = list.body.criteriaSets.find((s: { name: string }) =>
      s.name.startsWith('Illustrative example'),
    );
    expect(example.name).toContain('not any jurisdiction');
    const set = await architect.get(`/api/criteria-sets/${example.id}`);
    expect(set.body.notes).toMatch(/invented/i);
    expect(set.body.rows.length).toBeGreaterThanOrEqual(3);
    expect(set.body.rows.every((r: Row) => r.climateZone === '5A')).toBe(true);
    expect(set.body.myAccess).toBe('write');
  });

  it('creates a table, saves its rows with optimistic concurrency, and refuses invalid rows', async () => {
    const architect = await t.as(demoEmail('architect'));
    const set = await newSet([row('max_u_factor', 0.35)]);
    expect(set).toMatchObject({ version: 1, revision: 1 });
    const saved = await architect
      .put(`/api/criteria-sets/${set.id}/rows`)
      .send({ revision: 1, rows: [row('max_u_factor', 0.3), row('must_dry_within_year', true, '*')] });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ revision: 2, version: 1, versionCreated: false });
    expect(saved.body.rows[1].value).toBe(true);

    const stale = await architect.put(`/api/criteria-sets/${set.id}/rows`).send({ revision: 1, rows: [] });
    expect(stale.status).toBe(409);
    expect(stale.body.current.revision).toBe(2);

    const duplicate = await architect
      .put(`/api/criteria-sets/${set.id}/rows`)
      .send({ revision: 2, rows: [row('max_u_factor', 0.3), row('max_u_factor', 0.4)] });
    expect(duplicate.status).toBe(400);
    expect(Object.values(duplicate.body.error.fields).join(' ')).toMatch(/repeats row 1/);
    const outOfRange = await architect
      .put(`/api/criteria-sets/${set.id}/rows`)
      .send({ revision: 2, rows: [row('max_surface_rh', 80)] });
    expect(outOfRange.status).toBe(400);
    expect(outOfRange.body.error.fields['rows.0.value']).toMatch(/fraction/);

    const meta = await architect.put(`/api/criteria-sets/${set.id}`).send({
      revision: 2,
      changes: {
        name: 'Renamed',
        jurisdiction: 'Somewhere',
        categoryLabels: { steel_framed: 'Steel-framed' },
      },
    });
    expect(meta.status).toBe(200);
    expect(meta.body).toMatchObject({
      name: 'Renamed',
      revision: 3,
      categoryLabels: { steel_framed: 'Steel-framed' },
    });
  });

  it('imports CSV all or nothing: bad rows are listed with their lines and nothing is written', async () => {
    const architect = await t.as(demoEmail('architect'));
    const set = await newSet([row('max_u_factor', 0.35)]);
    const bad = [
      header,
      '5A,steel_framed,max_u_factor,0.064,Btu/(h·ft²·°F),IP value',
      '9Z,steel_framed,min_effective_r,3,m²·K/W,',
      '5A,steel_framed,max_surface_rh,0.8,,',
      '5A,steel_framed,max_u_factor,0.3,W/(m²·K),duplicate of line 2',
      '5A,wooden,min_effective_r,abc,,',
      '5A,steel_framed,min_effective_r,3,furlongs,',
    ].join('\r\n');
    const res = await architect.post(`/api/criteria-sets/${set.id}/import`).send({ csv: bad });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('invalid_csv');
    const lines = res.body.errors.map((e: { line: number; field: string }) => `${e.line}:${e.field}`);
    expect(lines).toEqual(
      expect.arrayContaining(['3:climate_zone', '5:row', '6:wall_category', '6:value', '7:unit']),
    );
    expect(lines.some((l: string) => l.startsWith('2:') || l.startsWith('4:'))).toBe(false);
    const after = await architect.get(`/api/criteria-sets/${set.id}`);
    expect(after.body.revision).toBe(1);
    expect(strip(after.body.rows)).toEqual([row('max_u_factor', 0.35)]);

    // A good file as text/csv replaces the rows; IP values are stored in SI.
    const good = [
      header,
      '5A,Steel-framed wall,Maximum U-factor,0.064,Btu/(h·ft²·°F),',
      '*,steel_framed,must_dry_within_year,yes,,',
    ].join('\n');
    const ok = await architect
      .post(`/api/criteria-sets/${set.id}/import?revision=1`)
      .set('Content-Type', 'text/csv')
      .send(good);
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.revision).toBe(2);
    // 1 Btu/(h·ft²·°F) = 5.678 263 W/(m²·K) (NIST SP 811 (2008) B.9, seven figures; the registry's factor is exact).
    expect(ok.body.rows[0].value).toBeCloseTo(0.064 * 5.678263, 7);
    expect(ok.body.rows[1]).toMatchObject({ climateZone: '*', value: true });
  });

  it('exports CSV that imports back to the same rows (round trip)', async () => {
    const architect = await t.as(demoEmail('architect'));
    const rows = [
      row('max_u_factor', 0.3070364236268046),
      { ...row('max_surface_rh', 0.8, '*'), note: 'a note, with "quotes"\nand a line break' },
      row('must_dry_within_year', false),
      row('min_deflection_limit', 180, '5A', 'metal_building'),
      row('max_condensation_accumulation', 0.05),
    ];
    const source = await newSet(rows);
    const csv = await architect.get(`/api/criteria-sets/${source.id}/export.csv`).buffer(true);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text.startsWith(`${header}\r\n`)).toBe(true);
    const target = await newSet([]);
    const imported = await architect.post(`/api/criteria-sets/${target.id}/import`).send({ csv: csv.text });
    expect(imported.status, JSON.stringify(imported.body)).toBe(200);
    expect(strip(imported.body.rows)).toEqual(rows);

    const ip = await architect.get(`/api/criteria-sets/${source.id}/export.csv?units=IP`).buffer(true);
    expect(ip.text).toContain('Btu/(h·ft²·°F)');
    const third = await newSet([]);
    const back = await architect.post(`/api/criteria-sets/${third.id}/import`).send({ csv: ip.text });
    expect(back.status).toBe(200);
    back.body.rows.forEach((r: Row, i: number) => {
      if (typeof r.value === 'number') expect(r.value).toBeCloseTo(rows[i]!.value as number, 9);
      else expect(r.value).toBe(rows[i]!.value);
    });
  });

  it('stores an immutable check run, reruns identically, and freezes the table version it used', async () => {
    const architect = await t.as(demoEmail('architect'));
    const set = await newSet([row('max_u_factor', 0.35), row('max_surface_rh', 0.8, '*')]);
    const first = await architect
      .post(`/api/assemblies/${assemblyId}/check-runs`)
      .send({ criteriaSetId: set.id });
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.body.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(first.body.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(first.body.inputs.criteriaSet).toMatchObject({ id: set.id, version: 1 });
    expect(first.body.inputs.assembly).toMatchObject({ id: assemblyId, revision: 1 });
    expect(first.body.inputs.project.climate.months).toHaveLength(12);
    const u = first.body.outputs.checks.find((c: { id: string }) => c.id === 'criterion.max_u_factor');
    expect(u).toMatchObject({ status: 'pass', required: 0.35, unit: 'W/(m²·K)' });
    expect(u.margin).toBeCloseTo(0.35 - u.provided, 12);
    expect(first.body.criteriaVerdict).toBe('pass');
    // The demo's joint schedule has two joints that are too narrow: the module verdicts fail.
    expect(first.body.verdict).toBe('fail');
    expect(first.body.outputs.modules.map((m: { status: string }) => m.status)).toEqual([
      'ran',
      'ran',
      'ran',
      'ran',
    ]);

    const second = await architect
      .post(`/api/assemblies/${assemblyId}/check-runs`)
      .send({ criteriaSetId: set.id });
    expect(second.body.id).not.toBe(first.body.id);
    expect(second.body.outputs).toEqual(first.body.outputs);
    expect(second.body.outputsHash).toBe(first.body.outputsHash);
    expect(second.body.inputsHash).toBe(first.body.inputsHash);
    expect(second.body.hash).toBe(first.body.hash);
    const stored = await architect.get(`/api/check-runs/${first.body.id}`);
    expect(stored.body.outputs).toEqual(first.body.outputs);
    expect(stored.body.hash).toBe(first.body.hash);

    const list = await (await t.as(demoEmail('viewer'))).get(
      `/api/projects/${projectId}/check-runs?assemblyId=${assemblyId}`,
    );
    expect(list.body.checkRuns.map((r: { id: string }) => r.id).slice(0, 2)).toEqual([
      second.body.id,
      first.body.id,
    ]);
    // The project's assembly list names each assembly's last run: its verdict and when (null: never checked).
    const assembliesList = await architect.get(`/api/projects/${projectId}/assemblies`);
    const listed = assembliesList.body.assemblies.find((x: { id: string }) => x.id === assemblyId);
    expect(listed.lastRun).toEqual({ verdict: 'fail', at: second.body.createdAt });
    const other = await architect
      .post(`/api/projects/${projectId}/assemblies`)
      .send({ ...demoAssembly.assembly, name: 'Never checked' });
    const relisted = await architect.get(`/api/projects/${projectId}/assemblies`);
    expect(relisted.body.assemblies.find((x: { id: string }) => x.id === other.body.id).lastRun).toBeNull();

    // Frozen: an edit creates version 2 and leaves version 1 as it was.
    const frozen = await architect.get(`/api/criteria-sets/${set.id}`);
    expect(frozen.body.frozenAt).not.toBeNull();
    const edit = await architect
      .put(`/api/criteria-sets/${set.id}/rows`)
      .send({ revision: 1, rows: [row('max_u_factor', 0.25), row('min_effective_r', 3)] });
    expect(edit.status).toBe(200);
    expect(edit.body).toMatchObject({
      version: 2,
      versionCreated: true,
      previousVersionId: set.id,
      frozenAt: null,
    });
    expect(edit.body.id).not.toBe(set.id);
    const v1 = await architect.get(`/api/criteria-sets/${set.id}`);
    expect(strip(v1.body.rows)).toEqual([row('max_u_factor', 0.35), row('max_surface_rh', 0.8, '*')]);
    expect(v1.body.isLatest).toBe(false);
    const again = await architect.put(`/api/criteria-sets/${set.id}/rows`).send({ revision: 1, rows: [] });
    expect(again.status).toBe(409);
    expect(again.body.current.id).toBe(edit.body.id);

    const versions = await architect.get(`/api/criteria-sets/${edit.body.id}/versions`);
    expect(versions.body.versions.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    const diff = await architect.get(`/api/criteria-sets/${set.id}/diff?from=1&to=2`);
    expect(diff.status).toBe(200);
    expect(diff.body.changed).toEqual(
      [
        {
          ...row('max_u_factor', 0),
          value: undefined,
          from: { value: 0.35, note: '' },
          to: { value: 0.25, note: '' },
        },
      ].map(({ value: _v, note: _n, ...r }) => r),
    );
    expect(strip(diff.body.added)).toEqual([row('min_effective_r', 3)]);
    expect(strip(diff.body.removed)).toEqual([row('max_surface_rh', 0.8, '*')]);

    // Tightened: the same assembly now fails the U-factor row, short by the difference.
    const tight = await architect
      .post(`/api/assemblies/${assemblyId}/check-runs`)
      .send({ criteriaSetId: edit.body.id });
    const u2 = tight.body.outputs.checks.find((c: { id: string }) => c.id === 'criterion.max_u_factor');
    expect(u2.status).toBe('fail');
    expect(u2.margin).toBeLessThan(0);
    expect(tight.body.criteriaVerdict).toBe('fail');

    // A version used by a run is kept; an unused one may be deleted by a firm administrator only.
    const admin = await t.as(demoEmail('admin'));
    expect((await admin.delete(`/api/criteria-sets/${set.id}`)).status).toBe(409);
    const spare = await newSet([]);
    expect((await architect.delete(`/api/criteria-sets/${spare.id}`)).status).toBe(403);
    expect((await admin.delete(`/api/criteria-sets/${spare.id}`)).status).toBe(204);
    expect((await admin.get(`/api/criteria-sets/${spare.id}`)).status).toBe(404);

    const audit = await admin.get(`/api/projects/${projectId}/audit`);
    expect(audit.body.entries.some((e: { entity: string }) => e.entity === 'check_run')).toBe(true);
  });

  it('reports what it cannot evaluate instead of passing it', async () => {
    const admin = await t.as(demoEmail('admin'));
    const project = (await admin.get(`/api/projects/${projectId}`)).body;
    const bare = await admin.post('/api/projects').send({
      name: 'No climate yet',
      climateZone: '5A',
      buildingHeightM: project.buildingHeightM,
      planLengthM: project.planLengthM,
      planWidthM: project.planWidthM,
      indoorTempC: 18,
      indoorRh: 0.45,
      winterDesignTempC: -19,
      summerDesignTempC: 31,
    });
    const a = await admin.post(`/api/projects/${bare.body.id}/assemblies`).send(demoAssembly.assembly);
    expect(a.status).toBe(201);
    const set = await newSet([row('max_surface_rh', 0.8), row('max_u_factor', 0.35)], 'Test', 'admin');
    const run = await admin.post(`/api/assemblies/${a.body.id}/check-runs`).send({ criteriaSetId: set.id });
    expect(run.status).toBe(201);
    const rh = run.body.outputs.checks.find((c: { id: string }) => c.id === 'criterion.max_surface_rh');
    expect(rh).toMatchObject({ status: 'not_evaluated', provided: null });
    expect(storedMessageText(rh.reason)).toBe('the project’s monthly climate is missing');
    expect(run.body.outputs.checks.find((c: { id: string }) => c.id === 'wind.run').status).toBe(
      'not_evaluated',
    );
    expect(run.body.criteriaVerdict).toBe('incomplete');

    const none = await newSet([row('max_u_factor', 0.35, '7')], 'Other zone', 'admin');
    const nothing = await admin
      .post(`/api/assemblies/${a.body.id}/check-runs`)
      .send({ criteriaSetId: none.id });
    expect(nothing.body.outputs.matchedRows).toBe(0);
    expect(nothing.body.outputs.checks[0]).toMatchObject({ id: 'criteria.none', status: 'not_evaluated' });
    expect(nothing.body.criteriaVerdict).toBe('incomplete');
  });

  it('lets project members read the project firm’s tables (only the firm writes them), and hides other firms’ tables', async () => {
    const set = await newSet([row('max_u_factor', 0.35)], 'Shared table');
    const consultant = await t.as(demoEmail('consultant'));
    const picks = await consultant.get(`/api/projects/${projectId}/criteria-sets`);
    expect(picks.body.criteriaSets.map((s: { id: string }) => s.id)).toContain(set.id);
    // A project role never writes the firm's tables — not even one that edits the project's climate: the
    // envelope consultant and the engineer (both outside the firm) may only read them.
    for (const who of ['consultant', 'engineer']) {
      const agent = await t.as(demoEmail(who));
      expect((await agent.get(`/api/criteria-sets/${set.id}`)).body.myAccess).toBe('read');
      expect(
        (await agent.put(`/api/criteria-sets/${set.id}/rows`).send({ revision: 1, rows: [] })).status,
      ).toBe(403);
    }
    const unchanged = await (await t.as(demoEmail('admin'))).get(`/api/criteria-sets/${set.id}`);
    expect(unchanged.body).toMatchObject({ revision: 1, rows: [row('max_u_factor', 0.35)] });
    const outsider = await t.as(demoEmail('outsider'));
    expect((await outsider.get(`/api/criteria-sets/${set.id}`)).status).toBe(404);
    expect((await outsider.get(`/api/organisations/${orgId}/criteria-sets`)).status).toBe(404);

    // Another firm's table cannot be used on this project by someone outside that firm.
    const pelham = (await outsider.get('/api/me')).body.organisations[0].id;
    const theirs = await outsider
      .post(`/api/organisations/${pelham}/criteria-sets`)
      .send({ name: 'Pelham table' });
    expect(theirs.status).toBe(201);
    const architect = await t.as(demoEmail('architect'));
    const refused = await architect
      .post(`/api/assemblies/${assemblyId}/check-runs`)
      .send({ criteriaSetId: theirs.body.id });
    expect(refused.status).toBe(404);
  });
});
