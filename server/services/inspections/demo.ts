import type { Project } from '@shared/schemas/project';
import type { Db } from '../../db/client';
import { createInspectionQueries } from './queries';
import { createInspectionWorkflow } from './workflow';

/**
 * The demo project's inspection in progress (invented): the envelope consultant has begun walking the north
 * elevation's field zone against the demo assembly and answered the girt and clip spacing. The seed sends no
 * e-mail and cites no check run (the demo has none yet).
 */
export async function seedDemoInspection(
  db: Db,
  project: Project,
  assemblyId: string,
  inspector: { id: string; name: string },
): Promise<void> {
  const q = createInspectionQueries(db);
  const quiet = { send: async () => {} };
  const noSheets = {
    issue: async () => {
      throw new Error('the demo inspection cites no check run');
    },
  };
  const flow = createInspectionWorkflow(db, q, quiet, noSheets);
  const i = await flow.create(project, inspector, {
    assemblyId,
    elevation: 'North elevation',
    area: { kind: 'zone', zone: 'field' },
    title: 'North elevation — field zone, first walk',
  });
  const girt = i.items.find((x) => x.kind === 'girt_spacing');
  const clip = i.items.find((x) => x.kind === 'clip_spacing');
  if (girt)
    await flow.answer(girt.id, inspector, {
      version: girt.version,
      state: 'pass',
      measured: 1.195,
      location: 'Grid A–C, level 2',
    });
  if (clip)
    await flow.answer(clip.id, inspector, {
      version: clip.version,
      state: 'pass',
      measured: 0.79,
      location: 'Grid B, level 2',
    });
}
