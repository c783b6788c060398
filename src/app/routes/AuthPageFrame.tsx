import type { ReactNode } from 'react';

/** A narrow page for the sign-in screens. */
export function AuthPageFrame({
  title,
  intro,
  children,
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
}) {
  return (
    <div className="mx-auto max-w-md">
      <title>{`${title} · Skinwright`}</title>
      <h1 className="border-b border-ink pb-3 text-3xl">{title}</h1>
      {intro ? <p className="mt-3 text-ink-muted">{intro}</p> : null}
      <div className="mt-6">{children}</div>
    </div>
  );
}
