import { uNumber } from '@shared/format';
import { Link } from 'react-router';
import { Loading } from '../../../components/ui/Loading';
import { Notice } from '../../../components/ui/Notice';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useUnitSystem } from '../../../lib/unit-system';
import { useRevisions } from '../api/get-revisions';
import { uUnit } from '../units';

/** Every saved revision, newest first; an older one opens read-only or side by side with the current one. */
export function RevisionHistory({
  projectId,
  assemblyId,
  currentRevision,
  openRevision,
}: {
  projectId: string;
  assemblyId: string;
  currentRevision: number;
  /** The revision on screen, if it is an older one. */
  openRevision?: number;
}) {
  const system = useUnitSystem();
  const revisions = useRevisions(assemblyId);
  const base = `/projects/${projectId}/assemblies`;

  return (
    <section aria-labelledby="revisions-heading" className="flex flex-col gap-3">
      <h3 id="revisions-heading" className="border-b border-ink pb-1 text-xl">
        Revisions
      </h3>
      {revisions.isPending ? (
        <Loading what="Loading the revisions" />
      ) : revisions.isError ? (
        <Notice tone="caution" title={errorMessage(revisions.error)} />
      ) : (
        <Table caption="Revision history, newest first" captionHidden>
          <thead>
            <tr>
              <Th numeric>Rev.</Th>
              <Th>Note</Th>
              <Th>Saved by</Th>
              <Th numeric>Saved</Th>
              <Th numeric>U_eff ({uUnit(system)})</Th>
              <Th>Engine</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          </thead>
          <tbody>
            {revisions.data.map((r) => {
              const current = r.revision === currentRevision;
              const open = r.revision === openRevision;
              return (
                <tr key={r.revision} className={open ? 'bg-paper-raised' : ''}>
                  <Td numeric>
                    {r.revision}
                    {current ? <span className="block font-sans text-xs text-ink-muted">current</span> : null}
                  </Td>
                  <Td>{r.note || <span className="text-ink-muted">—</span>}</Td>
                  <Td>{r.createdBy ?? '—'}</Td>
                  <Td numeric className="whitespace-nowrap">
                    {formatDateTime(r.createdAt)}
                  </Td>
                  <Td numeric>{uNumber(r.Ueff, system)}</Td>
                  <Td className="num text-xs">{r.engineVersion}</Td>
                  <Td className="whitespace-nowrap text-sm">
                    {open ? (
                      <span className="text-ink-muted">on screen</span>
                    ) : current ? (
                      <Link to={`${base}/${assemblyId}`}>Open current</Link>
                    ) : (
                      <>
                        <Link to={`${base}/${assemblyId}/revisions/${r.revision}`}>
                          Open<span className="sr-only"> revision {r.revision}</span> (read-only)
                        </Link>
                        <span aria-hidden="true" className="px-1 text-ink-muted">
                          ·
                        </span>
                        <Link to={`${base}/compare?ids=${assemblyId},${assemblyId}&rev=${r.revision},`}>
                          Compare<span className="sr-only"> revision {r.revision}</span> with current
                        </Link>
                      </>
                    )}
                  </Td>
                </tr>
              );
            })}
          </tbody>
        </Table>
      )}
    </section>
  );
}
