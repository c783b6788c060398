import type { AssemblySummary } from '@shared/schemas/assembly';
import { useQueries } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Cautions } from '../../../components/ui/Cautions';
import { LabelledSelect } from '../../../components/ui/LabelledSelect';
import { Loading } from '../../../components/ui/Loading';
import { Notice } from '../../../components/ui/Notice';
import { NamedOptions } from '../../../components/ui/Options';
import { errorMessage } from '../../../lib/api';
import { useUnitSystem } from '../../../lib/unit-system';
import { assemblyQueryOptions } from '../api/get-assembly';
import { revisionQueryOptions } from '../api/get-revision';
import { useRevisions } from '../api/get-revisions';
import type { CompareItem } from '../compare-params';
import { evaluateThermal } from '../evaluate';
import { THERMAL_CAUTIONS } from './Cautions';
import { type CompareColumn, CompareTable } from './CompareTable';

interface PickRow {
  key: number;
  assemblyId: string;
  revision: string;
}

function RevisionSelect({
  assemblyId,
  value,
  onChange,
  label,
}: {
  assemblyId: string;
  value: string;
  onChange: (v: string) => void;
  label: string;
}) {
  const revisions = useRevisions(assemblyId, Boolean(assemblyId));
  return (
    <LabelledSelect
      label={label}
      className="w-56"
      value={value}
      onChange={(e) => onChange(e.target.value)}
      disabled={!assemblyId}
    >
      <option value="">Current revision</option>
      {(revisions.data ?? []).map((r) => (
        <option key={r.revision} value={String(r.revision)}>
          Rev. {r.revision}
          {r.note ? ` — ${r.note.slice(0, 40)}` : ''}
        </option>
      ))}
    </LabelledSelect>
  );
}

/** Choose two or more assemblies or revisions, then see them side by side with the differences named. */
export function AssemblyCompare({
  assemblies,
  items,
  onApply,
}: {
  assemblies: readonly AssemblySummary[];
  items: readonly CompareItem[];
  onApply: (items: CompareItem[]) => void;
}) {
  const system = useUnitSystem();
  const [rows, setRows] = useState<PickRow[]>(() => {
    const start = items.map((it, k) => ({
      key: k,
      assemblyId: it.assemblyId,
      revision: it.revision === null ? '' : String(it.revision),
    }));
    while (start.length < 2)
      start.push({ key: start.length, assemblyId: assemblies[start.length]?.id ?? '', revision: '' });
    return start;
  });
  const [nextKey, setNextKey] = useState(rows.length);

  const ids = [...new Set(items.map((i) => i.assemblyId))];
  const details = useQueries({ queries: ids.map((id) => assemblyQueryOptions(id)) });
  const revs = useQueries({
    queries: items
      .filter((i) => i.revision !== null)
      .map((i) => revisionQueryOptions(i.assemblyId, i.revision as number)),
  });

  const pending = details.some((q) => q.isPending) || revs.some((q) => q.isPending);
  const failed = [...details, ...revs].find((q) => q.isError);

  const columns = ((): CompareColumn[] => {
    if (pending || failed) return [];
    const byId = new Map(details.map((q, k) => [ids[k]!, q.data!]));
    let r = 0;
    return items.map((it, k) => {
      const a = byId.get(it.assemblyId)!;
      if (it.revision === null) {
        const result = a.current.thermalResult ?? evaluateThermal(a.current.input.thermal, system).result;
        return {
          key: `${k}`,
          title: a.name,
          subtitle: `rev. ${a.revision} (current)`,
          input: a.current.input,
          result,
        };
      }
      const rev = revs[r++]!.data!;
      const result = rev.thermalResult ?? evaluateThermal(rev.input.thermal, system).result;
      return {
        key: `${k}`,
        title: rev.input.name,
        subtitle: `rev. ${rev.revision} of ${a.revision}${rev.revision === a.revision ? ' (current)' : ''}`,
        input: rev.input,
        result,
      };
    });
  })();

  const apply = () =>
    onApply(
      rows
        .filter((r) => r.assemblyId)
        .map((r) => ({ assemblyId: r.assemblyId, revision: r.revision === '' ? null : Number(r.revision) })),
    );
  const chosen = rows.filter((r) => r.assemblyId).length;

  return (
    <div className="flex flex-col gap-8">
      <fieldset className="flex flex-col gap-3 border-t border-ink pt-3">
        <legend className="pr-3 font-serif text-lg font-semibold">What to compare</legend>
        <ol className="flex flex-col gap-2">
          {rows.map((row, i) => (
            <li key={row.key} className="flex flex-wrap items-end gap-x-4 gap-y-2">
              <span className="num w-6 pb-2 text-ink-muted" aria-hidden="true">
                {String.fromCharCode(65 + i)}
              </span>
              <LabelledSelect
                label={`Assembly ${String.fromCharCode(65 + i)}${i === 0 ? ' (baseline)' : ''}`}
                className="min-w-72 flex-1"
                value={row.assemblyId}
                onChange={(e) =>
                  setRows((rs) =>
                    rs.map((x) =>
                      x.key === row.key ? { ...x, assemblyId: e.target.value, revision: '' } : x,
                    ),
                  )
                }
              >
                <option value="">Choose…</option>
                <NamedOptions items={assemblies} />
              </LabelledSelect>
              <RevisionSelect
                assemblyId={row.assemblyId}
                value={row.revision}
                label={`Revision of ${String.fromCharCode(65 + i)}`}
                onChange={(v) =>
                  setRows((rs) => rs.map((x) => (x.key === row.key ? { ...x, revision: v } : x)))
                }
              />
              <Button
                variant="quiet"
                className="px-2 py-1.5"
                disabled={rows.length <= 2}
                aria-label={`Remove column ${String.fromCharCode(65 + i)}`}
                onClick={() => setRows((rs) => rs.filter((x) => x.key !== row.key))}
              >
                Remove
              </Button>
            </li>
          ))}
        </ol>
        <div className="flex flex-wrap gap-3">
          <Button
            variant="secondary"
            disabled={rows.length >= 6}
            onClick={() => {
              setRows((rs) => [...rs, { key: nextKey, assemblyId: '', revision: '' }]);
              setNextKey((k) => k + 1);
            }}
          >
            + Another column
          </Button>
          <Button variant="primary" onClick={apply} disabled={chosen < 2}>
            Compare
          </Button>
        </div>
      </fieldset>

      {items.length < 2 ? (
        <p className="text-ink-muted">Choose at least two assemblies or revisions, then press Compare.</p>
      ) : pending ? (
        <Loading what="Loading the assemblies to compare" />
      ) : failed ? (
        <Notice tone="caution" title={errorMessage(failed.error)} />
      ) : (
        <>
          <CompareTable columns={columns} />
          <Cautions items={THERMAL_CAUTIONS} />
        </>
      )}
    </div>
  );
}
