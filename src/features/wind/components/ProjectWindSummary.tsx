import type { Project } from '@shared/schemas/project';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { useUnitSystem } from '../../../lib/unit-system';
import { ENCLOSURE_LABELS, EXPOSURE_LABELS } from '../labels';
import { formatWind } from '../units';
import { Sym } from './Sym';

function Cell({
  label,
  children,
  numeric = true,
}: {
  label: ReactNode;
  children: ReactNode;
  numeric?: boolean;
}) {
  return (
    <div className="bg-paper-raised px-3 py-2">
      <dt className="label-caps">{label}</dt>
      <dd className={`mt-0.5 text-ink ${numeric ? 'num' : ''}`}>{children}</dd>
    </div>
  );
}

/** The project's building dimensions used by the wind check, read from its site data (edited there). */
export function BuildingDimensions({ project: p, editable }: { project: Project; editable: boolean }) {
  const system = useUnitSystem();
  return (
    <div className="flex flex-col gap-2">
      <dl className="grid grid-cols-1 gap-px border border-ink bg-rule sm:grid-cols-3">
        <Cell
          label={
            <>
              Mean roof height <Sym s="h" />
            </>
          }
        >
          {formatWind(p.buildingHeightM, 'length', system)}
        </Cell>
        <Cell label="Plan length (longer side)">{formatWind(p.planLengthM, 'length', system)}</Cell>
        <Cell label="Plan width (shorter side)">{formatWind(p.planWidthM, 'length', system)}</Cell>
      </dl>
      <p className="text-sm text-ink-muted">
        From the project’s site data{editable ? '' : ' (read-only here)'}.{' '}
        {editable ? <Link to={`/projects/${p.id}?edit=1`}>Edit the site data</Link> : null}
      </p>
    </div>
  );
}

/** The project's wind data as a ruled block (read-only). */
export function ProjectWindSummary({ project: p }: { project: Project }) {
  const system = useUnitSystem();
  const w = p.wind;
  if (!w) return <p className="text-ink-muted">No wind data has been entered for this project yet.</p>;
  return (
    <dl className="grid grid-cols-1 gap-px border border-ink bg-rule sm:grid-cols-4">
      <Cell label="Standard" numeric={false}>
        {w.edition}
      </Cell>
      <Cell
        label={
          <>
            Basic wind speed <Sym s="V" />
          </>
        }
      >
        {formatWind(w.basicWindSpeed, 'speed', system)}{' '}
        <span className="text-ink-muted">
          ({formatWind(w.basicWindSpeed, 'speed', system === 'SI' ? 'IP' : 'SI')})
        </span>
      </Cell>
      <Cell label="Risk category">{w.riskCategory}</Cell>
      <Cell label="Exposure" numeric={false}>
        {EXPOSURE_LABELS[w.exposure]}
      </Cell>
      <Cell
        label={
          <>
            Topographic factor <Sym s="K_zt" />
          </>
        }
      >
        {w.Kzt.toFixed(2)}
      </Cell>
      <Cell label="Ground elevation (site data)">
        {formatWind(p.elevationM, 'length', system)}
        {w.keEqualsOne ? (
          <span className="font-sans text-sm">
            {' '}
            · <Sym s="K_e" /> = 1.0 taken
          </span>
        ) : null}
      </Cell>
      <Cell label="Enclosure" numeric={false}>
        {ENCLOSURE_LABELS[w.enclosure]}
      </Cell>
      <Cell
        label={
          <>
            Roof slope <Sym s="θ" />
          </>
        }
      >
        {formatWind(w.roofSlopeDeg, 'angle', system)}
      </Cell>
    </dl>
  );
}
