import type { FileWorkflowDeps } from '../sheets';
import { createSubmittalItemSteps } from './items-files';
import { createSubmittalNotifications } from './notifications';
import { createSubmittalQueries } from './queries';
import { createSubmittalWorkflow } from './workflow';

/**
 * Submittals and their workflow. A revision is edited while it is a draft; submitting sends it to its
 * reviewers; a reviewer starts the review and decides. "Revise and resubmit" closes the revision and opens
 * the next as a draft (with copies of the items); decided revisions never change. Every change writes the
 * audit log in its transaction; submissions and decisions send e-mail.
 *
 * By workflow: `queries` (reading, and the guard of every write), `workflow` (create, edit, submit, review,
 * decide, comment), `items-files` (sheets and uploaded files), `notifications` (the e-mails).
 */
export function createSubmittalService({ db, config, mailer, storage, sheets }: FileWorkflowDeps) {
  const q = createSubmittalQueries(db);
  const notify = createSubmittalNotifications(db, config, mailer);
  return {
    get: q.get,
    projectOf: q.projectOf,
    list: q.list,
    ...createSubmittalWorkflow(db, q, notify),
    ...createSubmittalItemSteps(db, config, storage, sheets, q),
  };
}
