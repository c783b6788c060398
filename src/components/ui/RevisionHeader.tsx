import type { Assembly } from '@shared/schemas/assembly';
import type { ReactNode } from 'react';
import { formatDateTime } from '../../lib/format';

/**
 * The head of a page that edits an assembly: which page and revision it shows, when and by whom that was saved,
 * "read-only" where the person may not edit, the title, and a line on what the page works out.
 */
export function RevisionHeader({
  page,
  assembly,
  readOnly,
  title,
  children,
}: {
  page: string;
  assembly: Assembly;
  readOnly: boolean;
  title: ReactNode;
  children?: ReactNode;
}) {
  return (
    <header className="flex flex-col gap-1">
      <p className="label-caps">
        {page} · revision {assembly.revision} saved {formatDateTime(assembly.current.createdAt)}
        {assembly.current.createdBy ? ` by ${assembly.current.createdBy}` : ''}
        {readOnly ? ' · read-only' : ''}
      </p>
      <h2 className="text-3xl">{title}</h2>
      {children}
    </header>
  );
}
