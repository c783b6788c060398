import type { FileWorkflowDeps } from '../sheets';
import { createInspectionNotifications } from './notifications';
import { createInspectionPhotos } from './photos';
import { createInspectionQueries } from './queries';
import { createFieldReports } from './report';
import { createInspectionTemplates } from './templates';
import { createInspectionWorkflow } from './workflow';

/**
 * Field inspections (D-025): generated from an assembly revision, answered item by item, photographed, closed;
 * failed items open deficiencies that go open → corrected → accepted or reopened.
 *
 * By workflow: `queries` (reading, the project of each record), `workflow` (create, answer, close, deficiency
 * steps), `photos` (upload and download), `report` (the field report PDF), `templates` (the firm's checklist template), `notifications` (the e-mails).
 */
export function createInspectionService({ db, config, mailer, storage, sheets }: FileWorkflowDeps) {
  const q = createInspectionQueries(db);
  const notify = createInspectionNotifications(db, config, mailer);
  const photos = createInspectionPhotos(db, config, storage, q);
  return {
    get: q.get,
    list: q.list,
    item: q.item,
    deficiency: q.deficiency,
    projectOf: q.projectOf,
    projectOfItem: q.projectOfItem,
    projectOfDeficiency: q.projectOfDeficiency,
    projectOfPhoto: q.projectOfPhoto,
    ...createInspectionWorkflow(db, q, notify, sheets),
    uploadPhotos: photos.upload,
    photo: photos.file,
    ...createFieldReports(db, config, storage, q),
    ...createInspectionTemplates(db),
  };
}
