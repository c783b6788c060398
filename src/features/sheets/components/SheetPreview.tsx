import { formatVerificationCode } from '@shared/sheets/verification';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Link } from 'react-router';
import { Button, buttonClass } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { useSheetPdf } from '../api/fetch-sheet';

const kB = (n: number) => `${Math.round(n / 1024)} kB`;

/**
 * Produces a run's compliance sheet and shows it: a progress line while the server draws it and the bytes
 * arrive, then download, open-in-a-tab and a preview of the PDF in a frame.
 */
export function SheetPreview({ runId, units }: { runId: string; units: UnitSystem }) {
  const [attempt, setAttempt] = useState(0);
  const state = useSheetPdf(runId, units, attempt);

  if (state.phase === 'failed')
    return (
      <Notice tone="caution" title="The sheet could not be produced." live>
        <p>{state.message}</p>
        <Button onClick={() => setAttempt((n) => n + 1)}>Try again</Button>
      </Notice>
    );

  if (state.phase !== 'ready') {
    const determinate = state.phase === 'downloading' && state.total !== null;
    return (
      <div role="status" className="flex flex-col gap-2 border border-rule bg-paper-raised px-4 py-4">
        <p className="text-sm font-semibold">
          {state.phase === 'producing'
            ? 'Producing the compliance sheet — drawing the section, charts and checks…'
            : `Receiving the sheet… ${determinate ? `${kB(state.loaded)} of ${kB(state.total!)}` : kB(state.loaded)}`}
        </p>
        {determinate ? (
          <progress
            className="h-2 w-full accent-ink"
            max={state.total!}
            value={state.loaded}
            aria-label="Sheet download"
          />
        ) : (
          <progress className="h-2 w-full accent-ink" aria-label="Producing the sheet" />
        )}
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4" data-testid="sheet-ready">
      <div className="flex flex-wrap items-center gap-3">
        <a href={state.url} download={state.filename} className={buttonClass('primary')}>
          Download the sheet (PDF, {kB(state.size)})
        </a>
        <a href={state.url} target="_blank" rel="noreferrer" className={buttonClass('secondary')}>
          Open in a new tab
        </a>
        {state.code ? (
          <p className="text-sm">
            Verification code <span className="num font-semibold">{formatVerificationCode(state.code)}</span>{' '}
            — <Link to={`/verify/${state.code}`}>check it as a recipient would</Link>
          </p>
        ) : null}
      </div>
      <iframe
        title="Compliance sheet preview"
        src={state.url}
        className="h-[80vh] min-h-[32rem] w-full border border-rule-strong bg-white"
      />
    </div>
  );
}
