import { dewPoint } from '@shared/calc/moisture/psychrometrics';
import type { MoistureResult } from '@shared/calc/moisture/schema';
import type { UnitSystem } from '@shared/units';
import { useId } from 'react';
import { RadioGroup } from '../../../components/ui/RadioGroup';
import { Select } from '../../../components/ui/Select';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { formatNumber } from '../../../lib/quantities';
import {
  formatPressure,
  formatTemperature,
  formatWaterInColumn,
  lengthUnit,
  monthName,
  toShownLength,
} from '../units';
import { criticalMonth, nodePlace } from '../verdict';
import { AccumulationChart } from './AccumulationChart';
import { MoistureVerdict } from './MoistureVerdict';
import { nodePositions, ProfileChart, type ProfileLayer, type ProfileMode } from './ProfileChart';
import { SurfaceTable } from './SurfaceTable';

interface MoistureResultsProps {
  result: MoistureResult;
  layers: readonly ProfileLayer[];
  system: UnitSystem;
  /** Month shown in the profile; null = the critical month. */
  month: number | null;
  onMonth: (month: number | null) => void;
  mode: ProfileMode;
  onMode: (mode: ProfileMode) => void;
}

/**
 * The result of the moisture page: the verdict in words, the profile through the wall for a chosen month,
 * the water held month by month, and the surface (mould) check month by month.
 */
export function MoistureResults({
  result,
  layers,
  system,
  month,
  onMonth,
  mode,
  onMode,
}: MoistureResultsProps) {
  const uid = useId();
  const critical = criticalMonth(result);
  const shown = month ?? critical;
  const m = result.months.find((x) => x.month === shown) ?? result.months[0]!;
  const layerNames = layers.map((l) => l.name);
  const peak = result.interstitial.maxAccumulationMonth;

  return (
    <div className="flex flex-col gap-8">
      <MoistureVerdict result={result} layerNames={layerNames} system={system} />

      <section aria-labelledby={`${uid}-profile`} className="flex flex-col gap-3">
        <div className="flex flex-wrap items-end justify-between gap-4">
          <h4 id={`${uid}-profile`} className="font-serif text-lg">
            Profile through the wall — {monthName(m.month)}
          </h4>
          <div className="flex flex-wrap items-end gap-4">
            <div className="flex flex-col gap-1">
              <label htmlFor={`${uid}-month`} className="text-sm font-semibold">
                Month shown
              </label>
              <Select
                id={`${uid}-month`}
                value={month === null ? 'critical' : String(month)}
                onChange={(e) => onMonth(e.target.value === 'critical' ? null : Number(e.target.value))}
                className="w-auto py-1.5 text-sm"
              >
                <option value="critical">
                  Critical month ({monthName(critical)}
                  {peak === critical ? ', most water held' : ', highest f_Rsi,min'})
                </option>
                {result.months.map((x) => (
                  <option key={x.month} value={x.month}>
                    {monthName(x.month)}
                    {x.condensationNodes.length > 0
                      ? ' — condenses'
                      : x.totalAccumulation > 0
                        ? ' — drying'
                        : ''}
                  </option>
                ))}
              </Select>
            </div>
            <RadioGroup
              legend="Lines drawn"
              name={`${uid}-mode`}
              options={[
                { value: 'temperature', label: 'Temperature and dew point' },
                { value: 'pressure', label: 'p and p_sat' },
              ]}
              value={mode}
              onChange={onMode}
            />
          </div>
        </div>
        <ProfileChart layers={layers} result={result} month={m} mode={mode} system={system} />
        <ProfileValues
          result={result}
          layers={layers}
          monthIndex={result.months.indexOf(m)}
          system={system}
        />
      </section>

      <section aria-labelledby={`${uid}-accumulation`} className="flex flex-col gap-3">
        <h4 id={`${uid}-accumulation`} className="font-serif text-lg">
          Water held in the wall, month by month
        </h4>
        <AccumulationChart result={result} system={system} selected={m.month} onSelect={(x) => onMonth(x)} />
      </section>

      <section aria-labelledby={`${uid}-surface`} className="flex flex-col gap-3">
        <h4 id={`${uid}-surface`} className="font-serif text-lg">
          Interior surface (mould) check, month by month
        </h4>
        <SurfaceTable result={result} system={system} />
      </section>
    </div>
  );
}

/** The values behind the profile at every face (and at any plane holding water), for reading and checking. */
function ProfileValues({
  result,
  layers,
  monthIndex,
  system,
}: {
  result: MoistureResult;
  layers: readonly ProfileLayer[];
  monthIndex: number;
  system: UnitSystem;
}) {
  const m = result.months[monthIndex]!;
  const geo = nodePositions(layers, result);
  const names = layers.map((l) => l.name);
  const rows = result.nodes
    .map((node, k) => ({ node, k }))
    .filter(({ node, k }) => node.kind !== 'withinLayer' || m.rate[k] !== 0 || (m.accumulation[k] ?? 0) > 0);
  return (
    <details className="border-y border-rule">
      <summary className="cursor-pointer py-2 text-sm font-semibold">
        Values at each face in {monthName(m.month)} ({rows.length} planes)
      </summary>
      <Table
        caption={`Profile values, ${monthName(m.month)}`}
        captionHidden
        head={[
          'Plane',
          numeric(<>x ({lengthUnit(system)})</>),
          numeric('s_d from outside'),
          numeric('θ'),
          numeric('θ_d'),
          numeric('p_sat'),
          numeric('p'),
          numeric('g·t this month'),
          numeric('Held'),
        ]}
      >
        <tbody>
          {rows.map(({ node, k }) => {
            const p = m.vapourPressure[k]!;
            return (
              <tr key={k}>
                <Td>{nodePlace(node, names)}</Td>
                <Td numeric>{formatNumber(toShownLength(geo.nodeX[k]!, system), system === 'IP' ? 3 : 1)}</Td>
                <Td numeric>{formatNumber(node.sd, 3)}&#x202f;m</Td>
                <Td numeric>{formatTemperature(m.temperature[k]!, system)}</Td>
                <Td numeric>{p > 0 ? formatTemperature(dewPoint(p), system) : '—'}</Td>
                <Td numeric>{formatPressure(m.saturationPressure[k]!)}</Td>
                <Td numeric>{formatPressure(p)}</Td>
                <Td numeric>
                  {m.amount[k] === 0
                    ? '—'
                    : `${m.amount[k]! > 0 ? '+' : '\u2212'}${formatWaterInColumn(Math.abs(m.amount[k]!) / 1000, system)}`}
                </Td>
                <Td numeric>
                  {(m.accumulation[k] ?? 0) > 0 ? formatWaterInColumn(m.accumulation[k]!, system) : '—'}
                </Td>
              </tr>
            );
          })}
        </tbody>
      </Table>
    </details>
  );
}
