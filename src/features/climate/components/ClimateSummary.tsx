import { saturationPressureIso13788 } from '@shared/calc/moisture/psychrometrics';
import type { Project, ProjectClimate } from '@shared/schemas/project';
import type { ReactNode } from 'react';
import { Notice } from '../../../components/ui/Notice';
import { TableScroller } from '../../../components/ui/Table';
import { formatQuantity, unitOf } from '../../../lib/quantities';
import { useUnitSystem } from '../../../lib/unit-system';
import { MONTH_NAMES } from '../climate-form';
import { HUMIDITY_CLASSES, isInventedClimate } from '../humidity-classes';

/**
 * The project's climate as read on a sheet: the interior conditions in words, then the 12 monthly means
 * (months across), where they come from, and a warning when they are invented demo values.
 */
export function ClimateSummary({ project, actions }: { project: Project; actions?: ReactNode }) {
  const system = useUnitSystem();
  const c = project.climate;
  const t = (v: number) => formatQuantity(v, 'temperature', system).replace(/\u202f.*$/, '');
  const cls = c?.humidityClass;
  const klass = cls === undefined ? undefined : HUMIDITY_CLASSES.find((h) => h.value === cls);

  return (
    <div className="flex flex-col gap-3">
      <dl className="grid gap-px border border-ink bg-rule text-sm sm:grid-cols-[12rem_1fr]">
        <dt className="label-caps bg-paper-raised px-3 py-2">Inside</dt>
        <dd className="bg-paper-raised px-3 py-2" data-testid="climate-interior">
          {!c ? (
            <span className="text-ink-muted">—</span>
          ) : klass ? (
            <>
              ISO 13788 humidity class {klass.value} — {klass.words}: vapour pressure excess{' '}
              <span className="num">{klass.excess}&#x202f;Pa</span> at θ_e ≤ 0 °C, falling to 0 at 20 °C; θ_i
              = <span className="num">{formatQuantity(project.indoorTempC, 'temperature', system)}</span> (the
              project’s indoor design temperature).
            </>
          ) : (
            <>
              The project’s fixed indoor design conditions:{' '}
              <span className="num">
                {formatQuantity(project.indoorTempC, 'temperature', system)},{' '}
                {formatQuantity(project.indoorRh, 'relativeHumidity', system)}
              </span>{' '}
              RH in every month.
            </>
          )}
        </dd>
        <dt className="label-caps bg-paper-raised px-3 py-2">Outside — source</dt>
        <dd className="bg-paper-raised px-3 py-2">
          {c ? c.source : <span className="text-ink-muted">not entered</span>}
        </dd>
      </dl>
      {c && isInventedClimate(c.source) ? (
        <Notice tone="warning" title="The monthly climate is invented demo data, not a real place.">
          <p>Enter the project’s own monthly means before relying on any moisture result.</p>
        </Notice>
      ) : null}
      {c ? (
        <TableScroller>
          <table className="w-full border-collapse text-sm">
            <caption className="label-caps pb-2 text-left">Monthly means outside</caption>
            <thead>
              <tr>
                <th scope="col" className="border-b-2 border-ink px-2 py-1.5 text-left font-semibold">
                  <span className="sr-only">Quantity</span>
                </th>
                {MONTH_NAMES.map((m) => (
                  <th
                    key={m}
                    scope="col"
                    className="border-b-2 border-ink px-2 py-1.5 text-right font-semibold"
                  >
                    <abbr title={m} className="no-underline">
                      {m.slice(0, 3)}
                    </abbr>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="num">
              <MonthRow
                head={<>θ_e ({unitOf('temperature', system)})</>}
                months={c.months}
                cell={(m) => t(m.exteriorTemperature)}
              />
              <MonthRow
                head="φ_e (%)"
                months={c.months}
                cell={(m) => Math.round(m.exteriorRelativeHumidity * 100)}
              />
              <MonthRow
                head="p_e (Pa)"
                months={c.months}
                cell={(m) =>
                  (m.exteriorRelativeHumidity * saturationPressureIso13788(m.exteriorTemperature)).toFixed(0)
                }
                muted
              />
            </tbody>
          </table>
        </TableScroller>
      ) : null}
      {actions ? <div className="flex flex-wrap items-center gap-3">{actions}</div> : null}
    </div>
  );
}

/** One quantity of the monthly means: its symbol and unit, then a cell per month (January first). */
function MonthRow({
  head,
  months,
  cell,
  muted = false,
}: {
  head: ReactNode;
  months: ProjectClimate['months'];
  cell: (m: ProjectClimate['months'][number]) => ReactNode;
  /** Derived from the others (drawn quieter). */
  muted?: boolean;
}) {
  return (
    <tr>
      <th
        scope="row"
        className="border-b border-rule px-2 py-1.5 text-left font-sans font-normal whitespace-nowrap"
      >
        {head}
      </th>
      {months.map((m, k) => (
        <td
          key={MONTH_NAMES[k]}
          className={`border-b border-rule px-2 py-1.5 text-right${muted ? ' text-ink-muted' : ''}`}
        >
          {cell(m)}
        </td>
      ))}
    </tr>
  );
}
