import { can, type ProjectAction } from '@shared/auth/permissions';
import type { ReactNode } from 'react';
import { useParams, useSearchParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { useProject } from '../../features/projects/api/get-project';

/**
 * A project page with an edit mode kept in the address (`?edit=1`, so a reload or a shared link opens the
 * form), offered to those whose role may do `action` on a project that is not archived. Null until the
 * project is in the cache (the route's loader puts it there).
 */
export function useEditableProject(action: ProjectAction) {
  const { projectId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const { data: project } = useProject(projectId);
  if (!project) return null;
  const archived = project.archivedAt !== null;
  const mayEdit = can(project.myRole, action) && !archived;
  return {
    project,
    archived,
    mayEdit,
    editing: mayEdit && params.get('edit') === '1',
    setEditing: (on: boolean) => setParams(on ? { edit: '1' } : {}, { replace: false }),
  };
}

/**
 * The heading of an editable project page, with what it holds in a line below (if any) and, while the form is
 * closed, the button that opens it for those who may edit.
 */
export function EditableHeading({
  id,
  title,
  editLabel,
  page,
  ruled = true,
  children,
}: {
  id: string;
  title: string;
  editLabel: string;
  page: Pick<NonNullable<ReturnType<typeof useEditableProject>>, 'mayEdit' | 'editing' | 'setEditing'>;
  /** A rule under the heading (the page's title), or none (a section's). */
  ruled?: boolean;
  children?: ReactNode;
}) {
  return (
    <div
      className={`flex flex-wrap items-end justify-between gap-3${ruled ? ' border-b border-ink pb-2' : ''}`}
    >
      <div>
        <h2 id={id} className="text-2xl">
          {title}
        </h2>
        {children ? <p className="mt-1 max-w-prose text-sm text-ink-muted">{children}</p> : null}
      </div>
      {page.mayEdit && !page.editing ? (
        <Button variant="secondary" onClick={() => page.setEditing(true)}>
          {editLabel}
        </Button>
      ) : null}
    </div>
  );
}
