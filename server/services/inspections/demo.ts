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
  // Invented answers: girt and clip spacing as measured on the walk.
  const answers = [
    { kind: 'girt_spacing', measured: 1.195, location: 'Grid A–C, level 2' },
    { kind: 'clip_spacing', measured: 0.79, location: 'Grid B, level 2' },
  ];
  for (const { kind, ...answer } of answers) {
    const item = i.items.find((x) => x.kind === kind);
    if (item) await flow.answer(item.id, inspector, { version: item.version, state: 'pass', ...answer });
  }
}
