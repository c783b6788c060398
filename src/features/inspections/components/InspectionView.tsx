import type { ProjectRole } from '@shared/auth/permissions';
import { can } from '@shared/auth/permissions';
import type { Inspection } from '@shared/inspections/schema';
import { Link, useSearchParams } from 'react-router';
import { buttonClass } from '../../../components/ui/Button';
import { useAnswerItem } from '../api/answer-item';
import { inspectionPaths } from '../api/paths';
import { usePendingAnswers, usePendingPhotos } from '../api/pending';
import { scopeText } from '../scope';
import { ItemCard } from './ItemCard';
import { DeficiencyMarks } from './StateMark';
import { WaitingToSend } from './WaitingToSend';

/**
 * The inspection on site: its scope, the device's queue, the checklist as a list or one item at a time
 * (`?view=one&at=n`, kept in the address so a reload stays on the item), the deficiencies, closing and the report.
 */
export function InspectionView({
  inspection,
  projectId,
  role,
  archived,
}: {
  inspection: Inspection;
  projectId: string;
  role: ProjectRole | null;
  archived: boolean;
}) {
  const [params, setParams] = useSearchParams();
  const one = params.get('view') === 'one';
  const count = inspection.items.length;
  const at = Math.min(Math.max(1, Number(params.get('at')) || 1), Math.max(1, count));
  const pending = usePendingAnswers(inspection.id);
  const pendingPhotos = usePendingPhotos(inspection.id);
  const answer = useAnswerItem(inspection.id);
  const closed = inspection.status === 'closed';
  const readOnly = closed || archived || !can(role, 'inspection.answer');
  const base = `/projects/${projectId}/inspections/${inspection.id}`;
  const items = one ? inspection.items.slice(at - 1, at) : inspection.items;
  const go = (n: number) => setParams({ view: 'one', at: String(n) }, { replace: true });
  const answered = inspection.items.filter((i) => (pending.get(i.id)?.state ?? i.state) !== 'unseen').length;

  return (
    <div className="flex flex-col gap-6">
      <section aria-label="Scope" className="flex flex-col gap-1 text-base">
        <p>
          <span className="font-semibold">{inspection.assemblyName}</span>
          <span className="text-ink-muted">{` · revision ${inspection.scope.revision}`}</span>
        </p>
        <p>{scopeText(inspection.scope)}</p>
        <p className="text-sm text-ink-muted">
          {closed
            ? `Closed${inspection.closedByName ? ` by ${inspection.closedByName}` : ''}`
            : `${answered} of ${count} items answered`}
        </p>
      </section>

      <WaitingToSend inspectionId={inspection.id} />

      <nav aria-label="Inspection" className="flex flex-wrap gap-3">
        <fieldset aria-label="Show the items" className="flex">
          <Link
            to={`${base}`}
            replace
            aria-current={one ? undefined : 'page'}
            className={buttonClass(one ? 'secondary' : 'primary', 'min-h-11 rounded-r-none')}
          >
            As a list
          </Link>
          <Link
            to={`${base}?view=one&at=${at}`}
            replace
            aria-current={one ? 'page' : undefined}
            className={buttonClass(one ? 'primary' : 'secondary', 'min-h-11 rounded-l-none border-l-0')}
          >
            One at a time
          </Link>
        </fieldset>
        <a
          className={buttonClass('secondary', 'min-h-11')}
          href={inspectionPaths.report(inspection.id)}
          download
          data-testid="report-link"
        >
          Field report (PDF)
        </a>
        {can(role, 'inspection.close') && !closed && !archived ? (
          <Link to={`${base}/close`} className={buttonClass('secondary', 'min-h-11')}>
            Close the inspection…
          </Link>
        ) : null}
      </nav>

      {one && count > 0 ? (
        <div className="flex items-center justify-between gap-3">
          <button
            type="button"
            className={buttonClass('secondary', 'min-h-11')}
            disabled={at <= 1}
            onClick={() => go(at - 1)}
          >
            ← Previous
          </button>
          <span className="num text-sm">{`Item ${at} of ${count}`}</span>
          <button
            type="button"
            className={buttonClass('secondary', 'min-h-11')}
            disabled={at >= count}
            onClick={() => go(at + 1)}
          >
            Next →
          </button>
        </div>
      ) : null}

      <section aria-label="Checklist" className="flex flex-col gap-4">
        {items.map((item, n) => (
          <ItemCard
            number={one ? at : n + 1}
            key={`${item.id}:${item.version}:${pending.has(item.id) ? 'p' : 's'}`}
            inspectionId={inspection.id}
            item={item}
            pending={pending.get(item.id)}
            pendingPhotos={pendingPhotos.filter((p) => p.itemId === item.id).map((p) => p.photoKey)}
            readOnly={readOnly}
            saveLabel={one && at < count ? 'Save and next' : 'Save answer'}
            onSave={(a) => {
              answer.mutate({ inspectionId: inspection.id, itemId: item.id, label: item.label, answer: a });
              if (one && at < count) go(at + 1);
            }}
          />
        ))}
      </section>

      <section aria-labelledby="deficiencies-h" className="flex flex-col gap-3">
        <h3 id="deficiencies-h" className="text-xl">
          Deficiencies
        </h3>
        {inspection.deficiencies.length === 0 ? (
          <p className="text-ink-muted">None. A failed item opens one.</p>
        ) : (
          <ul className="flex flex-col divide-y divide-rule border-y border-rule">
            {inspection.deficiencies.map((d) => (
              <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                <Link to={`${base}/deficiencies/${d.id}`} className="min-h-11 content-center font-semibold">
                  {`D-${d.number} · ${d.itemLabel}`}
                </Link>
                <DeficiencyMarks deficiency={d} />
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
