import { demoEmail, type TestApp } from './app';

/** A one-pixel PNG: a real image by its bytes. */
export const PNG_PIXEL = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);

/**
 * The path parameters of the inspection routes on the demo project: its seeded inspection in progress, one of
 * its unanswered items, a deficiency (another item failed by the envelope consultant) and a photo.
 */
export async function inspectionParams(t: TestApp, projectId: string) {
  const consultant = await t.as(demoEmail('consultant'));
  const list = (await consultant.get(`/api/projects/${projectId}/inspections`)).body.inspections as {
    id: string;
  }[];
  const seeded = list.at(-1);
  if (!seeded) throw new Error('the demo project has no inspection (server/db/seed.ts)');
  const items = (await consultant.get(`/api/inspections/${seeded.id}`)).body.items as {
    id: string;
    state: string;
    version: number;
    quantity: string | null;
  }[];
  const [failing, open] = items.filter((i) => i.state === 'unseen' && i.quantity === null);
  if (!failing || !open) throw new Error('the demo inspection has too few unanswered items');
  const failed = await consultant
    .put(`/api/inspection-items/${failing.id}`)
    .send({ version: failing.version, state: 'fail' });
  const photo = await (await t.as(demoEmail('subcontractor')))
    .post(`/api/inspection-items/${failing.id}/photos`)
    .attach('files', PNG_PIXEL, 'photo.png');
  return {
    inspectionId: seeded.id,
    inspectionItemId: open.id,
    deficiencyId: failed.body.openedDeficiency.id as string,
    photoId: photo.body.photos[0].id as string,
  };
}
