import type { WindScheduleResult } from '@shared/calc/wind/schema';
import { formatterFor } from '@shared/format';
import type { ReactNode } from 'react';
import { useUnitSystem } from '../../../lib/unit-system';
import { Sym } from './Sym';

function Cell({ label, children, note }: { label: ReactNode; children: ReactNode; note?: ReactNode }) {
  return (
    <div className="bg-paper-raised px-3 py-2">
      <dt className="label-caps">{label}</dt>
      <dd className="num mt-0.5 text-lg text-ink">{children}</dd>
      {note ? <dd className="text-xs text-ink-muted">{note}</dd> : null}
    </div>
  );
}

/**
 * The velocity pressure and its factors; q_h in the person's units and, beneath, the other system's (kPa / psf,
 * worded by shared/format as the compliance sheet prints it).
 */
export function VelocityBlock({ result }: { result: WindScheduleResult }) {
  const system = useUnitSystem();
  const v = result.velocity;
  const kdInQ = v.edition === 'ASCE 7-16';
  return (
    <section aria-labelledby="velocity-heading" className="flex flex-col gap-2">
      <h4 id="velocity-heading" className="font-serif text-lg">
        Velocity pressure
      </h4>
      <dl className="grid grid-cols-2 gap-px border border-ink bg-rule sm:grid-cols-4 lg:grid-cols-7">
        <Cell
          label={
            result.lowRise ? (
              <>
                <Sym s="K_h" /> = <Sym s="K_z" />
              </>
            ) : (
              <Sym s="K_h" />
            )
          }
          note="at the mean roof height"
        >
          {v.Kh.toFixed(3)}
        </Cell>
        {!result.lowRise ? (
          <Cell label={<Sym s="K_z" />} note="at the component height">
            {v.Kz.toFixed(3)}
          </Cell>
        ) : null}
        <Cell label={<Sym s="K_zt" />} note="topographic">
          {v.Kzt.toFixed(2)}
        </Cell>
        <Cell label={<Sym s="K_d" />} note={kdInQ ? 'inside q_h (7-16)' : 'applied to p, not q_h (7-22)'}>
          {v.Kd.toFixed(2)}
        </Cell>
        <Cell label={<Sym s="K_e" />} note="ground elevation">
          {v.Ke.toFixed(3)}
        </Cell>
        <Cell label={<Sym s="q_h" />} note={kdInQ ? 'includes K_d' : 'excludes K_d'}>
          {formatterFor(system).pressure(v.qh)}
          <span className="block text-sm">{formatterFor(system === 'SI' ? 'IP' : 'SI').pressure(v.qh)}</span>
        </Cell>
        <Cell
          label={
            <>
              End-zone width <Sym s="a" />
            </>
          }
          note={result.lowRise ? 'h ≤ 60 ft' : 'h > 60 ft'}
        >
          {formatterFor(system).length(result.edgeWidth)}
        </Cell>
        <Cell
          label={
            <>
              (<Sym s="GC_pi" />)
            </>
          }
          note="internal, ±"
        >
          {result.GCpi.toFixed(2)}
        </Cell>
      </dl>
      <p className="num text-xs text-ink-muted">{v.equation}</p>
    </section>
  );
}
