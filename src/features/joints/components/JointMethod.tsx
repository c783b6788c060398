import {
  DEFAULT_MINIMUM_WIDTH,
  MAX_SEALANT_DEPTH,
  MAX_WIDTH_WITHOUT_REVIEW,
  MIN_SEALANT_DEPTH,
  MOVEMENT_CAPABILITY,
  ROD_OVERSIZE,
} from '@shared/calc/joints/joints';
import { type JointResult, MOVEMENT_CLASSES } from '@shared/calc/joints/schema';
import { formatJointDimension } from '@shared/format/page-measures';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { MOVEMENT_CLASS_LABELS } from '../labels';

/** The source the engine wrote on its first step whose id ends with `suffix` (kept in step with the engine). */
function sourceOf(results: readonly (JointResult | null)[], suffix: string): string | undefined {
  for (const r of results) {
    const s = r?.trace.find((t) => t.id.endsWith(suffix));
    if (s) return s.source;
  }
  return undefined;
}

/** "2.86 ×" — the width per unit of movement, 100/X. */
const times = (f: number) => `${Number(f.toFixed(2))} ×`;

const pct = (k: number) => `${Math.round((k - 1) * 100)} %`;

/** How every joint is sized: movement, width, depth and backer, with the sources the engine uses. */
export function JointMethod({ results }: { results: readonly (JointResult | null)[] }) {
  const system = useUnitSystem();
  const d = (si: number) => formatJointDimension(si, system);
  const cc = ROD_OVERSIZE.closed_cell;
  const oc = ROD_OVERSIZE.open_cell;
  const src = {
    thermal: sourceOf(results, '.side.0.extension'),
    width: sourceOf(results, '.requiredWidth'),
    depth: sourceOf(results, '.requiredDepth'),
    backer: results
      .flatMap((r) => r?.trace.filter((t) => t.id.endsWith('.backer')) ?? [])
      .map((t) => t.source),
  };
  const backerSources = [...new Set(src.backer)];

  return (
    <div className="flex max-w-prose flex-col gap-4 text-sm">
      <ol className="flex list-decimal flex-col gap-3 pl-5">
        <li>
          <span className="font-semibold">Movement.</span> Each moving side changes length by{' '}
          <code className="num">ΔL = α·L·ΔT</code>. The joint <em>opens</em> while the panels cool from the
          warmest installation temperature to the coldest surface temperature,{' '}
          <code className="num">ΔT_ext = T_install,max − T_surface,min</code>, and <em>closes</em> while they
          warm from the coolest installation temperature to the hottest surface,{' '}
          <code className="num">ΔT_comp = T_surface,max − T_install,min</code>. Other movement you enter is
          added to each.
          {src.thermal ? <span className="block text-xs text-ink-muted">Source: {src.thermal}.</span> : null}
        </li>
        <li>
          <span className="font-semibold">Width.</span> <code className="num">W = (100/X)·M + t</code> — the
          ASTM C1193 approach — checked separately for opening and closing with the sealant's movement
          capability X in each direction, plus the construction tolerance t. The larger governs, and never
          less than the smallest workable width ({d(DEFAULT_MINIMUM_WIDTH)} unless entered; common trade
          practice). The design width meets when it is at least the required width; the margin is{' '}
          <code className="num">(W_design − W_required)/W_required</code>.
          {src.width ? <span className="block text-xs text-ink-muted">Source: {src.width}.</span> : null}
        </li>
        <li>
          <span className="font-semibold">Depth.</span>{' '}
          <code className="num">D = min(W, {d(MAX_SEALANT_DEPTH)})</code> — as deep as the joint is wide up to{' '}
          {d(MAX_SEALANT_DEPTH)}, and {d(MAX_SEALANT_DEPTH)} for wider joints (ASTM C1193), so the depth never
          falls as the width grows. A drawn depth under {d(MIN_SEALANT_DEPTH)} is flagged (too little bond),
          and a joint wider than {d(MAX_WIDTH_WITHOUT_REVIEW)} goes to the sealant maker for review (common
          practice). The sealant maker's own depth for its product governs where it differs.
          {src.depth ? <span className="block text-xs text-ink-muted">Source: {src.depth}.</span> : null}
        </li>
        <li>
          <span className="font-semibold">Backer.</span> Rod oversize: closed-cell rod {cc.min}–{cc.max} × W (
          {pct(cc.min)}–{pct(cc.max)} over the width), open-cell rod {oc.min}–{oc.max} × W ({pct(oc.min)}–
          {pct(oc.max)} over). Where the opening depth is given and is less than{' '}
          <code className="num">D + {cc.min}·W</code>, the rod does not fit and bond-breaker tape as wide as
          the joint is used instead.
          {backerSources.map((s) => (
            <span key={s} className="block text-xs text-ink-muted">
              Source: {s}.
            </span>
          ))}
        </li>
      </ol>
      <Table
        caption="Movement capability X by sealant class (ASTM C920 classes; the maker's declared class governs)"
        head={['Class', numeric('X opening'), numeric('X closing'), numeric('W per unit movement')]}
      >
        <tbody>
          {MOVEMENT_CLASSES.map((c) => {
            const x = MOVEMENT_CAPABILITY[c];
            return (
              <tr key={c}>
                <Td>{MOVEMENT_CLASS_LABELS[c]}</Td>
                <Td numeric>{x.extension} %</Td>
                <Td numeric>{x.compression} %</Td>
                <Td numeric>
                  {times(100 / x.extension)} / {times(100 / x.compression)}
                </Td>
              </tr>
            );
          })}
        </tbody>
      </Table>
    </div>
  );
}
