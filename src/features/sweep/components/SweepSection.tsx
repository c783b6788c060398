import type { ReactNode } from 'react';

/** A part of the sweep page under a level-4 heading that names it (the section is labelled by its heading). */
export function SweepSection({
  id,
  title,
  tight = false,
  children,
}: {
  /** The heading's id; the section points at it. */
  id: string;
  title: ReactNode;
  /** The smaller gap, for a list under its heading. */
  tight?: boolean;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className={`flex flex-col ${tight ? 'gap-2' : 'gap-3'}`}>
      <h4 id={id} className="font-semibold">
        {title}
      </h4>
      {children}
    </section>
  );
}
