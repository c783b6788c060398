import { type ReactNode, useId } from 'react';

/** A verdict as it is read: a glyph, a word and the reason — never colour alone. */
export interface SummaryVerdict {
  glyph: '✓' | '✕' | '?' | '▲';
  word: string;
  detail?: ReactNode;
  tone: 'meets' | 'fails' | 'open';
}

export interface SummaryFigure {
  label: ReactNode;
  value: ReactNode;
  testId?: string;
}

const TONE: Record<SummaryVerdict['tone'], string> = {
  meets: 'text-meets',
  fails: 'text-caution',
  open: 'text-warning',
};

/** The verdict of a page that cannot be computed yet: what it waits for, in words. */
export const notYet = (word: string, detail: string): SummaryVerdict => ({
  glyph: '?',
  word,
  detail,
  tone: 'open',
});

/** Figures drawn from an older input while a newer one is computed: dimmed, and busy for assistive technology. */
export const staleProps = (stale: boolean, className = '') => ({
  className: `${className} transition-opacity ${stale ? 'opacity-45' : ''}`,
  'aria-busy': stale || undefined,
});

/** "updating…" while the page's figures are those of an older input (see `useDeferredCalculation`). */
export function UpdatingMark({ stale }: { stale: boolean }) {
  return (
    <span role="status" className="text-xs font-semibold text-ink-muted">
      {stale ? 'updating…' : ''}
    </span>
  );
}

/**
 * The result first: a calculation page's verdict and headline figures at its top, above the inputs and the
 * method, with a link down to the result in full. One summary for every page (build-up, moisture, attachment,
 * joints); each brings its verdict and figures.
 */
export function ResultSummary({
  verdict,
  figures,
  stale,
  resultId,
  children,
}: {
  verdict: SummaryVerdict;
  figures: readonly SummaryFigure[];
  stale: boolean;
  /** The id of the page's Result heading, linked as "the result in full". */
  resultId: string;
  /** A line under the figures (e.g. what the result is waiting for). */
  children?: ReactNode;
}) {
  const headingId = useId();
  return (
    <section
      aria-labelledby={headingId}
      data-testid="result-summary"
      className="flex flex-col gap-2 border border-ink bg-paper-raised px-4 py-3"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <h3 id={headingId} className="label-caps">
          Result summary
        </h3>
        <UpdatingMark stale={stale} />
      </div>
      <div {...staleProps(stale, 'flex flex-col gap-2')} data-testid="result-summary-body">
        <p className={`font-semibold ${TONE[verdict.tone]}`} data-testid="summary-verdict">
          <span aria-hidden="true" className="mr-1">
            {verdict.glyph}
          </span>
          <span className="uppercase tracking-wide">{verdict.word}</span>
          {verdict.detail ? <span className="font-normal text-ink"> — {verdict.detail}</span> : null}
        </p>
        {figures.length > 0 ? (
          <dl className="grid grid-cols-2 gap-x-6 gap-y-2 sm:grid-cols-4">
            {figures.map((f, i) => (
              // biome-ignore lint/suspicious/noArrayIndexKey: a page's figures are a fixed list
              <div key={i} className="flex min-w-0 flex-col">
                <dt className="text-xs text-ink-muted">{f.label}</dt>
                <dd className="num text-lg [overflow-wrap:anywhere]" data-testid={f.testId}>
                  {f.value}
                </dd>
              </div>
            ))}
          </dl>
        ) : null}
        {children}
      </div>
      <a href={`#${resultId}`} className="self-start text-sm print:hidden">
        The result in full
      </a>
    </section>
  );
}
