import type { Project } from '@shared/schemas/project';
import { type ReactNode, useId } from 'react';
import { useParams } from 'react-router';
import { useProject } from '../../features/projects/api/get-project';

/**
 * The project the address names (`:projectId`) and its id; the project is undefined until it is in the cache
 * (the route's loader puts it there).
 */
export function useRouteProject() {
  const { projectId = '' } = useParams();
  return { projectId, project: useProject(projectId).data };
}

export interface PageHeadingProps {
  id: string;
  title: string;
  /** A rule under the heading (a page's title), or none (a section's). */
  ruled?: boolean;
  action?: ReactNode;
  children?: ReactNode;
}

/**
 * A page's heading, ruled under it (a page's title) or not (a section's), with what the page holds in a line
 * below it (if any) and an action at its right (if any).
 */
export function PageHeading({ id, title, ruled = true, action, children }: PageHeadingProps) {
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
      {action}
    </div>
  );
}

/**
 * A page of a project: a section with the window's title (the page's, then the project's name), an optional
 * breadcrumb, its heading (`PageHeading`), then the page. `className` spaces the parts (`gap-6` unless told).
 */
export function ProjectPage({
  project,
  title,
  heading = title,
  ruled,
  intro,
  action,
  breadcrumb,
  className = 'gap-6',
  children,
}: {
  project: Project;
  /** The page's name in the window's title (and its heading unless `heading` is given). */
  title: string;
  heading?: string;
  ruled?: boolean;
  intro?: ReactNode;
  action?: ReactNode;
  breadcrumb?: ReactNode;
  className?: string;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={`flex flex-col ${className}`}>
      <title>{`${title} · ${project.name} · Skinwright`}</title>
      {breadcrumb}
      <PageHeading id={id} title={heading} ruled={ruled} action={action}>
        {intro}
      </PageHeading>
      {children}
    </section>
  );
}
