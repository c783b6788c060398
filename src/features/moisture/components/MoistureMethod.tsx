import { DELTA_0 } from '@shared/calc/moisture/glaser';
import { HUMIDITY_CLASS_EXCESS } from '@shared/calc/moisture/interior';
import type { MoistureInput, MoistureResult } from '@shared/calc/moisture/schema';
import { messageText, sentence } from '@shared/format';
import type { UnitSystem } from '@shared/units';
import type { ReactNode } from 'react';
import { Notice } from '../../../components/ui/Notice';
import { formatNumber, formatQuantity } from '../../../lib/quantities';
import { formatFactor, formatSd, monthName } from '../units';

const START_RULE_WORDS: Record<MoistureResult['startMonthRule'], string> = {
  input: 'the start month was given',
  firstCondensingMonth:
    'the balance starts, dry, in the first month with condensation that follows a month without any',
  noCondensation: 'no month condenses, so the balance simply runs January to December',
  condensationEveryMonth: 'every month condenses, so the balance starts in January and never dries',
};

function Row({ term, children, source }: { term: ReactNode; children: ReactNode; source?: string }) {
  return (
    <div className="grid gap-x-6 gap-y-0.5 border-b border-rule py-2 sm:grid-cols-[14rem_1fr]">
      <dt className="font-semibold">{term}</dt>
      <dd>
        {children}
        {source ? <span className="block text-xs text-ink-muted">Source: {source}</span> : null}
      </dd>
    </div>
  );
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** 2e-10 → "2 × 10⁻¹⁰". */
function scientific(v: number): string {
  const [mantissa, exponent = '0'] = v.toExponential().split('e');
  const e = exponent.replace('+', '');
  return `${mantissa} × 10${[...e].map((c) => SUPERSCRIPT[c] ?? c).join('')}`;
}

const num = (v: number, d: number) => <span className="num">{formatNumber(v, d)}</span>;

/** The method as the engine ran it, read from its trace: the clause, the constants and the choices made. */
export function MoistureMethod({
  result,
  input,
  system,
}: {
  result: MoistureResult;
  input: MoistureInput;
  system: UnitSystem;
}) {
  const step = (id: string) => result.trace.find((s) => s.id === id);
  const rT = step('moisture.R_T');
  const rse = step('moisture.Rse');
  const fRsi = step('moisture.fRsi');
  const start = step('moisture.startMonth');
  const factor = step('moisture.safetyFactor');
  const interior = input.interior;

  return (
    <div className="flex flex-col gap-4">
      <p>
        <span className="font-semibold">Used: ISO 13788:2012 monthly method</span> — a steady-state Glaser
        diffusion profile for each of the 12 months, with the water that condenses carried from month to month
        until it has dried out.
      </p>
      <dl className="text-sm">
        <Row term="Vapour line" source={rT?.source}>
          Tangent construction: the straight line from p_e to p_i, plotted against the equivalent air layer
          thickness s_d, is pulled taut under the saturation pressure p_sat; every point where it touches is a
          condensation plane, and the difference of the slopes either side gives the rate g_c = δ₀·Δ(Δp/Δs_d).
          {rT?.note ? ` ${sentence(rT.note)}` : ''}
        </Row>
        <Row term="Still-air permeability δ₀">
          <span className="num">{scientific(DELTA_0)}</span> kg/(m·s·Pa); s_d = μ·d, s_d = δ₀/W.
        </Row>
        <Row term="Surface resistances (interstitial)" source={rse?.source}>
          Rsi = {num(result.Rsi, 2)} m²·K/W, Rse = {num(result.Rse, 2)} m²·K/W
          {rse ? ` (${rse.formula})` : ''}. R_T = {num(result.totalResistance, 3)} m²·K/W; s_d,T ={' '}
          <span className="num">{formatSd(result.totalSd)}</span>.
        </Row>
        <Row term="Surface (mould) check" source={fRsi?.source}>
          Rsi = <span className="num">0.25</span> m²·K/W on the inside face; critical surface humidity 80 %
          RH. {fRsi ? fRsi.formula.split(',')[0] : 'f_Rsi = 1 − Rsi/R_T'} ={' '}
          <span className="num">{formatFactor(result.surface.fRsi)}</span> for the clear field.
        </Row>
        <Row term="Interior" source={factor?.source}>
          {interior.kind === 'humidityClass' ? (
            <>
              Humidity class {interior.humidityClass}: vapour pressure excess Δp ={' '}
              {num(HUMIDITY_CLASS_EXCESS[interior.humidityClass - 1] ?? 0, 0)} Pa at θ_e ≤ 0 °C, falling to 0
              at 20 °C; θ_i = {formatQuantity(interior.temperature, 'temperature', system)}.
            </>
          ) : (
            <>
              Fixed: θ_i = {formatQuantity(interior.temperature, 'temperature', system)}, φ_i ={' '}
              {formatQuantity(interior.relativeHumidity, 'relativeHumidity', system)} in every month.
            </>
          )}{' '}
          Factor on Δp: <span className="num">{formatNumber(result.safetyFactor, 2)}</span> (p_i = p_e +
          f·Δp).
        </Row>
        <Row term="Start month" source={start?.source}>
          {monthName(result.startMonth)} — {START_RULE_WORDS[result.startMonthRule]}.
        </Row>
      </dl>
      {result.warnings.map((w) => (
        <Notice key={JSON.stringify(w)} tone="warning" title={sentence(messageText(w, system))} />
      ))}
    </div>
  );
}
