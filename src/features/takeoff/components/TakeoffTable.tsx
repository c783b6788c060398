import { TAKEOFF_JOINT_TYPES, type TakeoffInput, type TakeoffResult } from '@shared/calc/takeoff/schema';
import { messageText } from '@shared/format/messages';
import { formatJointDimension, formatPageMeasure } from '@shared/format/page-measures';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ShowTheWork } from '../../../components/ui/ShowTheWork';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { downloadTakeoffCsv } from '../csv';
import { BEAD_SHAPE_LABELS, TAKEOFF_TYPE_LABELS } from '../labels';

const count = (n: number) => n.toLocaleString('en-US');

function beadText(input: TakeoffInput, t: (typeof TAKEOFF_JOINT_TYPES)[number], system: UnitSystem): string {
  const b = input.beads[t];
  if (!b) return 'no sealant';
  const d = (v: number) => formatJointDimension(v, system);
  switch (b.shape) {
    case 'round':
      return `${BEAD_SHAPE_LABELS.round}, d ${d(b.diameter)}`;
    case 'fillet':
      return `${BEAD_SHAPE_LABELS.fillet}, leg ${d(b.leg)}`;
    case 'rectangular':
      return `${d(b.width)} × ${d(b.depth)}`;
  }
}

interface TakeoffTableProps {
  input: TakeoffInput;
  result: TakeoffResult;
  /** Names the CSV file. */
  assemblyName: string;
}

/** The takeoff: joint lengths and sealant per line, packages, tape, trim pieces and fasteners; CSV download. */
export function TakeoffTable({ input, result, assemblyName }: TakeoffTableProps) {
  const system = useUnitSystem();
  const [downloaded, setDownloaded] = useState<string | null>(null);
  const volume = new Map(result.sealant.byJoint.map((b) => [b.joint, b.volume]));
  const len = (m: number) => formatPageMeasure(m, 'length', system, system === 'IP' ? 1 : 2);

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-center gap-3">
        <Button
          variant="secondary"
          onClick={() => setDownloaded(downloadTakeoffCsv(result, assemblyName, system))}
          aria-describedby="takeoff-csv-note"
        >
          Download the takeoff (CSV)
        </Button>
        <p id="takeoff-csv-note" className="text-xs text-ink-muted" role="status">
          {downloaded ? (
            <>
              <span aria-hidden="true">✓ </span>Saved as <span className="num">{downloaded}</span> — every
              line with its formula and source, {system === 'IP' ? 'in ft, ft² and US gallons' : 'in SI'}.
            </>
          ) : (
            `Every line with its formula and source, ${system === 'IP' ? 'in ft, ft² and US gallons' : 'in SI'}; made in your browser from the figures below.`
          )}
        </p>
      </div>

      <Table
        caption="Joint lengths and sealant"
        head={['Joint line', numeric('Length'), 'Bead', numeric('Sealant, net')]}
      >
        <tbody>
          {TAKEOFF_JOINT_TYPES.map((t) => (
            <tr key={t} data-line={t}>
              <Td>{TAKEOFF_TYPE_LABELS[t]}</Td>
              <Td numeric>{len(result.lengths[t] ?? 0)}</Td>
              <Td className="num">{beadText(input, t, system)}</Td>
              <Td numeric>{volume.has(t) ? formatPageMeasure(volume.get(t), 'volume', system) : '—'}</Td>
            </tr>
          ))}
          <tr>
            <Td className="font-semibold">Sealant, net</Td>
            <Td />
            <Td />
            <Td numeric className="font-semibold">
              {formatPageMeasure(result.sealant.volume, 'volume', system)}
            </Td>
          </tr>
          <tr>
            <Td className="font-semibold">
              Sealant with {formatPageMeasure(input.wasteFactor, 'percent', system)} waste
            </Td>
            <Td />
            <Td />
            <Td numeric className="font-semibold" data-testid="sealant-with-waste">
              {formatPageMeasure(result.sealant.volumeWithWaste, 'volume', system)}
            </Td>
          </tr>
        </tbody>
      </Table>

      <Table
        caption="Sealant packages (whole packages, with waste)"
        head={['Package', numeric('Size'), numeric('How many')]}
      >
        <tbody>
          <tr>
            <Td>Cartridges</Td>
            <Td numeric>10.1 US fl oz</Td>
            <Td numeric data-testid="cartridges-us">
              {count(result.sealant.cartridges.usFlOz10_1)}
            </Td>
          </tr>
          <tr>
            <Td>Cartridges</Td>
            <Td numeric>300 ml</Td>
            <Td numeric>{count(result.sealant.cartridges.ml300)}</Td>
          </tr>
          <tr>
            <Td>Sausages</Td>
            <Td numeric>20 US fl oz</Td>
            <Td numeric>{count(result.sealant.sausages.usFlOz20)}</Td>
          </tr>
          <tr>
            <Td>Sausages</Td>
            <Td numeric>600 ml</Td>
            <Td numeric>{count(result.sealant.sausages.ml600)}</Td>
          </tr>
        </tbody>
      </Table>

      <Table caption="Tape, trim and fasteners" head={['Item', numeric('Quantity'), 'Basis']}>
        <tbody>
          {result.tape ? (
            <tr>
              <Td>Tape, {formatJointDimension(input.tape?.width, system)} wide</Td>
              <Td numeric>
                {len(result.tape.length)}
                <span className="block">{formatPageMeasure(result.tape.area, 'area', system)}</span>
                {result.tape.rolls !== null ? (
                  <span className="block">{count(result.tape.rolls)} rolls</span>
                ) : null}
              </Td>
              <Td className="text-ink-muted">
                along{' '}
                {(input.tape?.appliesTo ?? []).map((t) => TAKEOFF_TYPE_LABELS[t].toLowerCase()).join(', ')},
                with waste
              </Td>
            </tr>
          ) : null}
          {result.trims.map((t, k) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: trims follow the input order
            <tr key={k}>
              <Td>{t.name}</Td>
              <Td numeric>{count(t.pieces)} pieces</Td>
              <Td className="text-ink-muted">
                {count(t.runs)} {t.runs === 1 ? 'run' : 'runs'}, {len(t.length)} along{' '}
                {TAKEOFF_TYPE_LABELS[t.appliesTo].toLowerCase()}; stock{' '}
                {formatPageMeasure(input.trims[k]?.stockLength, 'length', system)} lapped{' '}
                {formatPageMeasure(input.trims[k]?.lapAllowance, 'spacing', system)}
              </Td>
            </tr>
          ))}
          {result.fasteners !== null ? (
            <tr>
              <Td>Fasteners</Td>
              <Td numeric data-testid="fasteners">
                {count(result.fasteners)}
              </Td>
              <Td className="text-ink-muted">
                every {formatPageMeasure(input.fasteners?.spacingAlongGirt, 'spacing', system)} along girts at{' '}
                {formatPageMeasure(input.fasteners?.girtSpacing, 'length', system)}
              </Td>
            </tr>
          ) : null}
          {!result.tape && result.trims.length === 0 && result.fasteners === null ? (
            <tr>
              <Td colSpan={3} className="text-ink-muted">
                No tape, trims or fasteners in this takeoff.
              </Td>
            </tr>
          ) : null}
        </tbody>
      </Table>

      <ul className="list-disc pl-5 text-sm text-ink-muted">
        {result.notes.map((n) => (
          <li key={n.code}>{messageText(n)}</li>
        ))}
      </ul>

      <ShowTheWork steps={result.trace} title="takeoff, per wall and in total" />
    </div>
  );
}
