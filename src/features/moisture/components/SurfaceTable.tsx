import type { MoistureResult } from '@shared/calc/moisture/schema';
import type { UnitSystem } from '@shared/units';
import { Table, Td, Th } from '../../../components/ui/Table';
import { formatFactor, formatPressure, formatTemperature, monthName } from '../units';
import { surfaceMonthText, TONE } from '../verdict';

/** The surface (mould) check month by month, January first: f_Rsi against f_Rsi,min, in words and glyphs. */
export function SurfaceTable({ result, system }: { result: MoistureResult; system: UnitSystem }) {
  const months = [...result.months].sort((a, b) => a.month - b.month);
  return (
    <Table
      caption={`Surface check month by month — f_Rsi of the clear field = ${formatFactor(result.surface.fRsi)}`}
    >
      <thead>
        <tr>
          <Th>Month</Th>
          <Th numeric>θ_e</Th>
          <Th numeric>θ_i</Th>
          <Th numeric>p_i</Th>
          <Th numeric>θ_si,min (80 % RH)</Th>
          <Th numeric>θ_si</Th>
          <Th numeric>f_Rsi,min</Th>
          <Th>Result</Th>
        </tr>
      </thead>
      <tbody>
        {months.map((m) => {
          const s = surfaceMonthText(m, result.surface.fRsi);
          const t = TONE[s.tone];
          const critical = m.month === result.surface.criticalMonth;
          return (
            <tr key={m.month} className={critical ? 'bg-paper-raised' : ''}>
              <Td>
                {monthName(m.month)}
                {critical ? <span className="block text-xs text-ink-muted">critical month</span> : null}
              </Td>
              <Td numeric>{formatTemperature(m.exteriorTemperature, system)}</Td>
              <Td numeric>{formatTemperature(m.interiorTemperature, system)}</Td>
              <Td numeric>{formatPressure(m.interiorVapourPressure)}</Td>
              <Td numeric>{formatTemperature(m.surface.minSurfaceTemperature, system)}</Td>
              <Td numeric>{formatTemperature(m.surface.surfaceTemperature, system)}</Td>
              <Td numeric>{formatFactor(m.surface.fRsiMin)}</Td>
              <Td className={`whitespace-nowrap font-medium ${t.cls.split(' ')[0]}`}>
                <span aria-hidden="true">{t.glyph} </span>
                {s.text}
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
