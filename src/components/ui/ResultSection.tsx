import type { ReactNode } from 'react';
import { PageSection } from './PageSection';
import { staleProps, UpdatingMark } from './ResultSummary';

/** The note beside a result computed on the page from the boxes above it. */
export const COMPUTED_AS_YOU_TYPE = 'computed in your browser as you type';

/**
 * A calculation page's result section: "updating…" and a note beside its heading; its figures announced when
 * they change (`aria-live`) and, with the shown work under them (not announced), dimmed while they are of an
 * older input than the boxes show (see `useDeferredCalculation`).
 */
export function ResultSection({
  n,
  title,
  id,
  stale,
  note,
  className,
  work,
  children,
}: {
  n: number;
  title: string;
  id: string;
  stale: boolean;
  note?: string;
  /** Classes of the figures' box. */
  className?: string;
  /** The working under the figures (e.g. `ShowTheWork`). */
  work?: ReactNode;
  children: ReactNode;
}) {
  return (
    <PageSection
      n={n}
      title={title}
      id={id}
      aside={
        <span className="flex items-baseline gap-3">
          <UpdatingMark stale={stale} />
          {note ? <span className="text-xs text-ink-muted">{note}</span> : null}
        </span>
      }
    >
      <div aria-live="polite" {...staleProps(stale, className)}>
        {children}
      </div>
      {work ? <div {...staleProps(stale, 'flex flex-col gap-4')}>{work}</div> : null}
    </PageSection>
  );
}
