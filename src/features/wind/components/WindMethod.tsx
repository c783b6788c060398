import {
  DEFAULT_DEFLECTION_WIND_FACTOR,
  MAX_ITERATIONS,
  SPACING_TOLERANCE,
} from '@shared/calc/wind/attachment';
import type { WindScheduleInput, WindScheduleResult } from '@shared/calc/wind/schema';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { CHECK_LABELS, ZONE_SHORT } from '../labels';

const stepFormula = (result: WindScheduleResult, id: string) =>
  result.trace.find((s) => s.id === id)?.formula;

/**
 * How the schedule is found, in the order it is computed: the edition's velocity pressure (and where K_d sits), the
 * wall pressure equation and figure, the effective wind area rule, the fixed-point iteration, and the ASD
 * comparison with the maker's table. Equations are the engine's own (its trace), so the text cannot drift from it.
 */
export function WindMethod({ result, input }: { result: WindScheduleResult; input: WindScheduleInput }) {
  const v = result.velocity;
  const is16 = v.edition === 'ASCE 7-16';
  const pressureEq = stepFormula(result, 'wind.zone4.pOutward') ?? stepFormula(result, 'wind.zone5.pOutward');
  const aFormula = stepFormula(result, 'wind.a');
  const khFormula = stepFormula(result, 'wind.Kh');
  const deflectionFactor = input.panel.deflectionWindFactor ?? DEFAULT_DEFLECTION_WIND_FACTOR;
  const steps = result.zones.flatMap((z) => [
    ...z.spanChecks.map((c) => ({
      key: `${z.zone}-${c.check}`,
      zone: z.zone,
      what: `${CHECK_LABELS[c.check]}: girt spacing`,
      it: c.iteration,
      outside: c.status === 'outside-table',
    })),
    ...(z.clip
      ? [{ key: `${z.zone}-clip`, zone: z.zone, what: 'Clip spacing', it: z.clip.iteration, outside: false }]
      : []),
  ]);

  return (
    <div className="flex flex-col gap-4">
      <ol className="flex list-decimal flex-col gap-3 pl-5">
        <li>
          <span className="font-semibold">Velocity pressure, {v.edition}.</span>{' '}
          <code className="num">{v.equation}</code>.{' '}
          {is16
            ? 'In this edition the directionality factor K_d = 0.85 sits inside q_h.'
            : 'In this edition q_h leaves K_d out; K_d = 0.85 multiplies the design pressure instead.'}{' '}
          {khFormula ? (
            <>
              Exposure coefficient <code className="num">{khFormula}</code>.
            </>
          ) : null}
        </li>
        <li>
          <span className="font-semibold">Wall pressures, {result.figure}.</span>{' '}
          {pressureEq ? <code className="num">{pressureEq}</code> : null}, inward with −(GC_pi) and outward
          with +(GC_pi); never less than 16&#8239;psf (0.77&#8239;kPa) in magnitude (§30.2.2). (GC_p) runs
          straight in log₁₀ A between the figure’s breakpoints. End-zone width{' '}
          {aFormula ? <code className="num">{aFormula}</code> : 'a'}.
        </li>
        <li>
          <span className="font-semibold">Effective wind area (§26.2).</span> For a panel span s on a module
          width w: <code className="num">A = s × max(w, s/3)</code>. For a clip, its tributary area{' '}
          <code className="num">A = s_c × s_g</code>.
        </li>
        <li>
          <span className="font-semibold">Iteration.</span> The pressure depends on A, which depends on the
          spacing being sought. Each spacing is found by fixed-point iteration started from the table’s
          shortest span (the largest pressure): every step satisfies the check, the spacing only grows, and it
          stops when it changes by less than {SPACING_TOLERANCE * 1000}&#8239;mm (at most {MAX_ITERATIONS}{' '}
          steps). The table is interpolated linearly and never extrapolated beyond its spans.
        </li>
        <li>
          <span className="font-semibold">Allowable values (ASD).</span> The maker’s allowables are compared
          with 0.6 W (D + 0.6W). Deflection: {deflectionFactor}·W against the table’s{' '}
          {input.panel.loadSpanTable.deflectionLimit} column. Clip:{' '}
          <code className="num">P ≥ C · p(A_c) · s_c · s_g</code>, with the reaction factor C of a{' '}
          {input.panel.loadSpanTable.spanCondition}-span panel. The smallest girt spacing of the checks
          governs.
        </li>
      </ol>
      <Table
        caption="Iterations of the spacing searches"
        head={['Zone', 'Search', numeric('Steps'), numeric('Last change'), 'Converged']}
      >
        <tbody>
          {steps.map((s) => (
            <tr key={s.key}>
              <Td>{ZONE_SHORT[s.zone]}</Td>
              <Td>{s.what}</Td>
              <Td numeric>{s.it.iterations}</Td>
              <Td numeric>{s.outside ? '—' : `${(s.it.lastChange * 1000).toFixed(3)}\u202fmm`}</Td>
              <Td>
                {s.outside ? (
                  'stopped: outside the table'
                ) : s.it.converged ? (
                  <>
                    <span aria-hidden="true">✓ </span>yes
                  </>
                ) : (
                  <>
                    <span aria-hidden="true">✕ </span>no — see the warnings
                  </>
                )}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
