/** A quiet, announced loading line (no spinner: the page just says what it is waiting for). */
export function Loading({ what = 'Loading' }: { what?: string }) {
  return (
    <p role="status" className="py-6 text-ink-muted">
      {what}…
    </p>
  );
}
