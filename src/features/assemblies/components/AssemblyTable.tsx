import { rNumber, uNumber } from '@shared/format';
import { type AssemblySummary, WALL_CATEGORY_LABELS } from '@shared/schemas/assembly';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Table, Td, Th } from '../../../components/ui/Table';
import { VERDICT_TEXT } from '../../../lib/check-format';
import { formatDate } from '../../../lib/format';
import { useUnitSystem } from '../../../lib/unit-system';
import { rUnit, uUnit } from '../units';

/**
 * The project's assemblies with their effective R and U in the person's units, and their last check's verdict;
 * with `onDuplicate`, a "Duplicate…" button on each row.
 */
export function AssemblyTable({
  projectId,
  assemblies,
  caption = 'Assemblies of this project',
  onDuplicate,
}: {
  projectId: string;
  assemblies: readonly AssemblySummary[];
  caption?: string;
  onDuplicate?: (assembly: AssemblySummary) => void;
}) {
  const system = useUnitSystem();
  return (
    <Table caption={caption} captionHidden>
      <thead>
        <tr>
          <Th>Assembly</Th>
          <Th>Wall category</Th>
          <Th numeric>Rev.</Th>
          <Th numeric>
            Effective R
            <span className="block text-xs font-normal text-ink-muted">
              {system === 'IP' ? 'R-value' : rUnit(system)}
            </span>
          </Th>
          <Th numeric>
            Effective U<span className="block text-xs font-normal text-ink-muted">{uUnit(system)}</span>
          </Th>
          <Th>Last check</Th>
          <Th numeric>Updated</Th>
          {onDuplicate ? (
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          ) : null}
        </tr>
      </thead>
      <tbody>
        {assemblies.map((a) => (
          <tr key={a.id} className="hover:bg-paper-sunk">
            <Td>
              <Link to={`/projects/${projectId}/assemblies/${a.id}`} className="font-semibold">
                {a.name}
              </Link>
            </Td>
            <Td>{WALL_CATEGORY_LABELS[a.wallCategory]}</Td>
            <Td numeric>{a.revision}</Td>
            <Td numeric>
              {a.Reff == null
                ? '—'
                : system === 'IP'
                  ? `R-${rNumber(a.Reff, system)}`
                  : rNumber(a.Reff, system)}
            </Td>
            <Td numeric>{uNumber(a.Ueff, system)}</Td>
            <Td className="whitespace-nowrap">
              {a.lastRun ? (
                <span className={VERDICT_TEXT[a.lastRun.verdict].cls}>
                  <span aria-hidden="true">{VERDICT_TEXT[a.lastRun.verdict].glyph} </span>
                  {VERDICT_TEXT[a.lastRun.verdict].word}
                  <span className="block text-xs text-ink-muted">{formatDate(a.lastRun.at)}</span>
                </span>
              ) : (
                <span className="text-ink-muted">not checked</span>
              )}
            </Td>
            <Td numeric className="whitespace-nowrap">
              {formatDate(a.updatedAt)}
            </Td>
            {onDuplicate ? (
              <Td>
                <Button variant="quiet" aria-label={`Duplicate ${a.name}…`} onClick={() => onDuplicate(a)}>
                  Duplicate…
                </Button>
              </Td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
