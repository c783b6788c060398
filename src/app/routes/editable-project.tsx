import { can, type ProjectAction } from '@shared/auth/permissions';
import { useSearchParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { PageHeading, type PageHeadingProps, useRouteProject } from './project-page';

/**
 * A project page with an edit mode kept in the address (`?edit=1`, so a reload or a shared link opens the
 * form), offered to those whose role may do `action` on a project that is not archived. Null until the
 * project is in the cache (the route's loader puts it there).
 */
export function useEditableProject(action: ProjectAction) {
  const [params, setParams] = useSearchParams();
  const { project } = useRouteProject();
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
 * The heading of an editable project page (`PageHeading`) with, while the form is closed, the button that opens
 * it for those who may edit.
 */
export function EditableHeading({
  editLabel,
  page,
  ...heading
}: Omit<PageHeadingProps, 'action'> & {
  editLabel: string;
  page: Pick<NonNullable<ReturnType<typeof useEditableProject>>, 'mayEdit' | 'editing' | 'setEditing'>;
}) {
  const open = page.mayEdit && !page.editing;
  return (
    <PageHeading
      {...heading}
      action={
        open ? (
          <Button variant="secondary" onClick={() => page.setEditing(true)}>
            {editLabel}
          </Button>
        ) : null
      }
    />
  );
}
