import { type Inspection, isDeficiencyOpen } from '@shared/inspections/schema';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { useWaitingCount } from '../../../lib/offline/queue';
import { inspectionKeys } from '../../../lib/query-keys';
import { useCloseInspection } from '../api/mutations';
import { DeficiencyMarks } from './StateMark';

/**
 * Closing: every item needs a state first (the items not yet seen are listed); the deficiencies still open are
 * listed — the inspection closes with them, they stay open to be corrected and accepted.
 */
export function CloseInspection({ inspection, base }: { inspection: Inspection; base: string }) {
  const close = useCloseInspection(inspection.id);
  const navigate = useNavigate();
  const waiting = useWaitingCount(inspectionKeys.all);
  const unseen = inspection.items
    .map((item, n) => ({ item, at: n + 1 }))
    .filter(({ item }) => item.state === 'unseen');
  const open = inspection.deficiencies.filter((d) => isDeficiencyOpen(d.state));
  const closed = inspection.status === 'closed';
  return (
    <div className="flex flex-col gap-6">
      {closed ? (
        <Notice
          tone="info"
          title={`Closed${inspection.closedByName ? ` by ${inspection.closedByName}` : ''}.`}
        />
      ) : null}
      <section className="flex flex-col gap-2" aria-labelledby="unseen-h">
        <h3 id="unseen-h" className="text-xl">
          Items not yet seen
        </h3>
        {unseen.length === 0 ? (
          <p>
            <span aria-hidden="true">✓ </span>Every item has a state.
          </p>
        ) : (
          <ul className="list-disc pl-6">
            {unseen.map(({ item, at }) => (
              <li key={item.id}>
                <Link to={`${base}?view=one&at=${at}`}>{item.label}</Link>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section className="flex flex-col gap-2" aria-labelledby="open-h">
        <h3 id="open-h" className="text-xl">
          Open deficiencies
        </h3>
        {open.length === 0 ? (
          <p>None.</p>
        ) : (
          <ul
            className="flex flex-col divide-y divide-rule border-y border-rule"
            data-testid="open-deficiencies"
          >
            {open.map((d) => (
              <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <Link to={`${base}/deficiencies/${d.id}`}>{`D-${d.number} · ${d.itemLabel}`}</Link>
                <DeficiencyMarks deficiency={d} />
              </li>
            ))}
          </ul>
        )}
      </section>
      {closed ? null : (
        <div className="flex flex-col gap-2">
          {waiting > 0 ? (
            <Notice
              tone="warning"
              title="Answers on this device are still waiting to be sent: close once they are."
            />
          ) : null}
          {close.error ? <Notice tone="caution" live title={errorMessage(close.error)} /> : null}
          <Button
            variant="primary"
            className="min-h-12 w-full text-base sm:w-fit"
            disabled={unseen.length > 0 || waiting > 0}
            busy={close.isPending}
            onClick={() => close.mutate(inspection.version, { onSuccess: () => navigate(base) })}
          >
            {open.length > 0
              ? `Close with ${open.length} open deficienc${open.length === 1 ? 'y' : 'ies'}`
              : 'Close the inspection'}
          </Button>
        </div>
      )}
    </div>
  );
}
