import type { ReactNode } from 'react';

/** One numbered part of a calculation page: inputs, method, result… under a ruled heading. */
export function PageSection({
  n,
  title,
  id,
  children,
  aside,
}: {
  n: number | string;
  title: string;
  id: string;
  children: ReactNode;
  aside?: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-4">
      <div className="flex flex-wrap items-baseline justify-between gap-3 border-b border-ink pb-1">
        <h3 id={id} className="flex items-baseline gap-3 text-xl">
          <span className="num text-base font-normal text-ink-muted">{n}</span>
          {title}
        </h3>
        {aside}
      </div>
      {children}
    </section>
  );
}
