import { type ReactNode, useId } from 'react';

/**
 * A part of a page named by its heading (the section is labelled by its h2, which gets an id of its own): the
 * heading drawn as `heading` says — a ruled title by default — then the content, laid out by `className`.
 */
export function TitledSection({
  title,
  heading = 'border-b border-ink pb-2 text-2xl',
  className = 'flex flex-col gap-3',
  children,
}: {
  title: ReactNode;
  /** The heading's classes. */
  heading?: string;
  /** The section's classes. */
  className?: string;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={className}>
      <h2 id={id} className={heading}>
        {title}
      </h2>
      {children}
    </section>
  );
}
