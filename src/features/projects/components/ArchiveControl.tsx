import type { Project } from '@shared/schemas/project';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { useSetProjectArchived } from '../api/archive-project';

/** Archive or restore a project, with a confirming second step for archiving. Shown to owners only. */
export function ArchiveControl({ project }: { project: Project }) {
  const mutation = useSetProjectArchived();
  const [confirming, setConfirming] = useState(false);
  const archived = project.archivedAt !== null;

  if (archived) {
    return (
      <div className="flex flex-col items-start gap-2">
        <Button
          variant="secondary"
          busy={mutation.isPending}
          busyLabel="Restoring…"
          onClick={() => mutation.mutate({ id: project.id, archived: false })}
        >
          Restore project
        </Button>
        {mutation.isError ? <Notice tone="caution" title={errorMessage(mutation.error)} live /> : null}
      </div>
    );
  }

  return (
    <div className="flex flex-col items-start gap-3">
      {confirming ? (
        <fieldset className="flex flex-col gap-3 border-l-4 border-ink pl-4">
          <legend className="sr-only">Confirm archiving</legend>
          <p className="text-sm">
            Archived projects move off the current list and are shown read-only. You can restore one at any
            time.
          </p>
          <div className="flex flex-wrap gap-3">
            <Button
              variant="danger"
              busy={mutation.isPending}
              busyLabel="Archiving…"
              onClick={() =>
                mutation.mutate({ id: project.id, archived: true }, { onSuccess: () => setConfirming(false) })
              }
            >
              Archive this project
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it current
            </Button>
          </div>
        </fieldset>
      ) : (
        <Button variant="secondary" onClick={() => setConfirming(true)}>
          Archive project…
        </Button>
      )}
      {mutation.isError ? <Notice tone="caution" title={errorMessage(mutation.error)} live /> : null}
    </div>
  );
}
