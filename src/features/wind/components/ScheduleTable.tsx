import type { DesignCheck, WindScheduleResult, ZoneDesign, ZoneResult } from '@shared/calc/wind/schema';
import type { UnitSystem } from '@shared/units';
import type { ReactNode } from 'react';
import { numeric, Table, Td, Th } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { CHECK_LABELS, ZONE_SHORT } from '../labels';
import { checkStatusText, type StatusText, zoneStatusText } from '../status';
import { formatWind } from '../units';
import { UtilisationBar } from './UtilisationBar';

const TONE: Record<StatusText['tone'], string> = {
  meets: 'text-meets',
  fails: 'text-caution',
  open: 'text-warning',
};

export function StatusWords({ status }: { status: StatusText }) {
  return (
    <span className="flex flex-col">
      <span className={`font-semibold ${TONE[status.tone]}`}>
        <span aria-hidden="true">{status.glyph} </span>
        {status.word}
      </span>
      {status.detail ? (
        <span className="text-xs text-ink">
          <span className="sr-only"> — </span>
          {status.detail}
        </span>
      ) : null}
    </span>
  );
}

/** "outside the table" in words where a spacing would stand — never a number. */
const Outside = () => <span className="font-sans font-semibold text-caution">outside the table</span>;

function PressurePair({ inward, outward, system }: { inward: number; outward: number; system: UnitSystem }) {
  return (
    <span className="flex flex-col items-end whitespace-nowrap">
      <span>
        <span className="font-sans text-xs text-ink-muted">in </span>
        {formatWind(inward, 'pressure', system).replace(/^/, '+')}
      </span>
      <span>
        <span className="font-sans text-xs text-ink-muted">out </span>
        {formatWind(outward, 'pressure', system)}
      </span>
    </span>
  );
}

function governingText(zone: ZoneResult, deflectionLimit: string): string {
  if (!zone.governingCheck) return '';
  const base =
    zone.governingCheck === 'deflection'
      ? `deflection (${deflectionLimit})`
      : `${CHECK_LABELS[zone.governingCheck].toLowerCase()} strength`;
  return `governed by ${base}${zone.status === 'table-end' ? '; table’s longest span' : ''}`;
}

/**
 * The spacing schedule, one row per wall zone: design pressures (strength and ASD) at the effective wind area of the
 * maximum girt spacing, the maximum girt and clip spacings with what governs, the design spacings, the highest
 * utilisation at the design spacings, and the verdict in words.
 */
export function ScheduleTable({
  result,
  zones,
  deflectionLimit,
}: {
  result: WindScheduleResult;
  zones: readonly ZoneDesign[];
  deflectionLimit: string;
}) {
  const system = useUnitSystem();
  return (
    <Table
      caption={
        <>
          Spacing schedule per wall zone
          <span className="mt-1 block font-sans text-xs font-normal normal-case tracking-normal text-ink-muted">
            Pressures at the effective wind area of the maximum girt spacing; maximum spacings rounded down.
          </span>
        </>
      }
    >
      <thead>
        <tr>
          <Th>Zone</Th>
          <Th numeric>
            Design pressure W<span className="block text-xs font-normal">strength level</span>
          </Th>
          <Th numeric>
            ASD 0.6&#8239;W<span className="block text-xs font-normal">compared with the table</span>
          </Th>
          <Th numeric>Max girt spacing</Th>
          <Th numeric>
            Max clip spacing<span className="block text-xs font-normal">at the max girt spacing</span>
          </Th>
          <Th numeric>Design spacing</Th>
          <Th>Utilisation at the design spacing</Th>
          <Th>Status</Th>
        </tr>
      </thead>
      <tbody>
        {result.zones.map((z) => {
          const d = zones.find((x) => x.zone === z.zone);
          const outside = z.status === 'outside-table';
          return (
            <tr key={z.zone} data-testid={`schedule-zone-${z.zone}`}>
              <Th scope="row" className="border-b border-rule align-top font-normal">
                <span className="font-semibold">{ZONE_SHORT[z.zone]}</span>
                <span className="block text-xs text-ink-muted">
                  {z.zone === 5
                    ? `strip of width a = ${formatWind(result.edgeWidth, 'length', system)} at each corner`
                    : 'the wall between the end strips'}
                </span>
              </Th>
              {(['strength', 'asd'] as const).map((level) => (
                <Td numeric key={level}>
                  {z.pressures ? (
                    <PressurePair
                      inward={z.pressures[level].inward}
                      outward={z.pressures[level].outward}
                      system={system}
                    />
                  ) : (
                    <span className="font-sans text-ink-muted">not computed</span>
                  )}
                </Td>
              ))}
              <Td numeric data-testid={`max-girt-${z.zone}`}>
                {outside || z.girtSpacing === null ? (
                  <Outside />
                ) : (
                  <>
                    <span className="text-base font-semibold">
                      {formatWind(z.girtSpacing, 'span', system, { rounding: 'down' })}
                    </span>
                    <span className="block font-sans text-xs text-ink-muted">
                      {governingText(z, deflectionLimit)}
                    </span>
                  </>
                )}
              </Td>
              <Td numeric>
                {outside || !z.clip ? (
                  <Outside />
                ) : (
                  <span className="text-base font-semibold">
                    {formatWind(z.clip.maxSpacing, 'spacing', system, { rounding: 'down' })}
                  </span>
                )}
              </Td>
              <Td numeric>
                {d?.girtSpacing !== undefined ? (
                  <span className="flex flex-col items-end whitespace-nowrap">
                    <span>
                      <span className="font-sans text-xs text-ink-muted">girts </span>
                      {formatWind(d.girtSpacing, 'span', system)}
                    </span>
                    <span>
                      <span className="font-sans text-xs text-ink-muted">clips </span>
                      {d.clipSpacing !== undefined ? formatWind(d.clipSpacing, 'spacing', system) : '—'}
                    </span>
                  </span>
                ) : (
                  <span className="font-sans text-ink-muted">not entered</span>
                )}
              </Td>
              <Td>
                {d?.worst?.utilisation != null ? (
                  <span className="flex flex-col gap-0.5">
                    <UtilisationBar utilisation={d.worst.utilisation} />
                    <span className="text-xs text-ink-muted">
                      {CHECK_LABELS[d.worst.check].toLowerCase()}
                    </span>
                  </span>
                ) : (
                  <span className="text-ink-muted">—</span>
                )}
              </Td>
              <Td data-testid={`status-zone-${z.zone}`}>
                <StatusWords status={zoneStatusText(z, d, system)} />
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}

function checkAt(c: DesignCheck, d: ZoneDesign, system: UnitSystem): ReactNode {
  if (c.check === 'clip')
    return d.clipSpacing !== undefined && d.girtSpacing !== undefined
      ? `${formatWind(d.clipSpacing, 'spacing', system)} × ${formatWind(d.girtSpacing, 'span', system)}`
      : '—';
  return d.girtSpacing !== undefined ? formatWind(d.girtSpacing, 'span', system) : '—';
}

const value = (c: DesignCheck, v: number | null, system: UnitSystem) =>
  formatWind(v, c.unit === 'N' ? 'force' : 'pressure', system);

/**
 * Required against allowable at the spacings the designer chose, check by check and zone by zone (inward and outward
 * strength, deflection, clip load), with a utilisation bar and the verdict in words.
 */
export function DesignChecksTable({
  zones,
  deflectionLimit,
  deflectionFactor,
}: {
  zones: readonly ZoneDesign[];
  deflectionLimit: string;
  deflectionFactor: number;
}) {
  const system = useUnitSystem();
  const what = (c: DesignCheck) => {
    switch (c.check) {
      case 'inward':
        return 'ASD inward pressure vs the table’s inward column';
      case 'outward':
        return 'ASD suction vs the table’s outward column';
      case 'deflection':
        return `${deflectionFactor}·W vs the ${deflectionLimit} column`;
      case 'clip':
        return 'load on one clip vs its capacity';
    }
  };
  return (
    <Table
      caption="Checks at the design spacing: required against allowable"
      head={[
        'Zone',
        'Check',
        numeric('At'),
        numeric('Required'),
        numeric('Allowable'),
        'Utilisation',
        'Result',
      ]}
    >
      <tbody>
        {zones.flatMap((d) =>
          d.checks.map((c, i) => (
            <tr key={`${d.zone}-${c.check}`} data-testid={`check-${d.zone}-${c.check}`}>
              {i === 0 ? (
                <Th
                  scope="rowgroup"
                  rowSpan={d.checks.length}
                  className="border-b border-rule align-top font-semibold"
                >
                  {ZONE_SHORT[d.zone]}
                </Th>
              ) : null}
              <Td>
                <span className="font-semibold">{CHECK_LABELS[c.check]}</span>
                <span className="block text-xs text-ink-muted">{what(c)}</span>
              </Td>
              <Td numeric>{checkAt(c, d, system)}</Td>
              {c.utilisation === null ? (
                <Td colSpan={3} className="text-ink-muted">
                  {c.status === 'outside-table'
                    ? 'No table value there — outside the table'
                    : 'Not checked yet'}
                </Td>
              ) : (
                <>
                  <Td numeric>{value(c, c.required, system)}</Td>
                  <Td numeric>{value(c, c.allowable, system)}</Td>
                  <Td>
                    <UtilisationBar utilisation={c.utilisation} />
                  </Td>
                </>
              )}
              <Td>
                <StatusWords status={checkStatusText(c, system)} />
                {c.check === 'clip' && d.maxClipAtDesignGirt !== null ? (
                  <span className="block text-xs text-ink-muted">
                    max {formatWind(d.maxClipAtDesignGirt, 'spacing', system, { rounding: 'down' })} at this
                    girt spacing
                  </span>
                ) : null}
              </Td>
            </tr>
          )),
        )}
      </tbody>
    </Table>
  );
}
