import { demoEmail, type TestApp } from './app';

/** A one-pixel PNG: a real image by its bytes. */
export const PNG_PIXEL = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);

/**
 * The path parameters of the inspection routes on the demo project: an inspection of its first assembly
 * (started by the envelope consultant), an unanswered item, a deficiency (its first item failed) and a photo.
 */
export async function inspectionParams(t: TestApp, projectId: string) {
  const consultant = await t.as(demoEmail('consultant'));
  const assemblyId = (await consultant.get(`/api/projects/${projectId}/assemblies`)).body.assemblies[0].id;
  const created = await consultant
    .post(`/api/projects/${projectId}/inspections`)
    .send({ assemblyId, elevation: 'North elevation', area: { kind: 'zone', zone: 'field' } });
  if (created.status !== 201) throw new Error(`inspection not created: ${created.status} ${created.text}`);
  const items = created.body.items as { id: string }[];
  const failed = await consultant
    .put(`/api/inspection-items/${items[0]!.id}`)
    .send({ version: 1, state: 'fail' });
  const photo = await (await t.as(demoEmail('subcontractor')))
    .post(`/api/inspection-items/${items[0]!.id}/photos`)
    .attach('files', PNG_PIXEL, 'photo.png');
  return {
    inspectionId: created.body.id as string,
    inspectionItemId: items[1]!.id,
    deficiencyId: failed.body.openedDeficiency.id as string,
    photoId: photo.body.photos[0].id as string,
  };
}
