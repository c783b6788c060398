import { VERDICT_WORDS } from '@shared/format';
import { memo } from 'react';
import { KIND_LABELS } from '../draft';
import { type DrawnSlice, spread, valueText } from '../present';

/** Most rows and columns drawn: a larger sweep shows evenly spread values (the table below has every variant). */
const MAP_MAX = 24;

const TONE = { pass: 'text-meets', fail: 'text-caution', incomplete: 'text-warning' } as const;

/**
 * Pass or fail of every variant of two parameters (the others held): a row per value of one, a column per
 * value of the other, each cell its glyph and the verdict's word for screen readers.
 */
export const PassFailMap = memo(function PassFailMap({ slice }: { slice: DrawnSlice }) {
  const { grid, kinds, values, across, lines, system } = slice;
  const rowLabel = (l: number) =>
    lines === null ? 'Verdict' : valueText(kinds[lines]!, values[lines]![l]!, system);
  const rows = spread(grid.length, MAP_MAX);
  const columns = spread(values[across]!.length, MAP_MAX);
  const thinned = rows.length < grid.length || columns.length < values[across]!.length;
  return (
    <div className="relative max-w-full overflow-x-auto" data-testid="pass-fail-map">
      <table className="border-collapse text-sm">
        <caption className="pb-2 text-left text-sm text-ink-muted">
          Pass or fail: {KIND_LABELS[kinds[across]!].toLowerCase()} across
          {lines === null ? '' : `, ${KIND_LABELS[kinds[lines]!].toLowerCase()} down`}. ✓ pass, ✕ fail, ?
          incomplete.
          {thinned
            ? ` ${columns.length} of ${values[across]!.length} columns and ${rows.length} of ${grid.length} rows, evenly spread, are drawn.`
            : ''}
        </caption>
        <thead>
          <tr>
            <th scope="col" className="border-b-2 border-ink px-2 py-1 text-left">
              <span className="sr-only">{lines === null ? '' : KIND_LABELS[kinds[lines]!]}</span>
            </th>
            {columns
              .map((c) => values[across]![c]!)
              .map((x) => (
                <th
                  key={String(x)}
                  scope="col"
                  className="num whitespace-nowrap border-b-2 border-ink px-2 py-1 text-center"
                >
                  {valueText(kinds[across]!, x, system)}
                </th>
              ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((l) => (
            <tr key={rowLabel(l)}>
              <th
                scope="row"
                className="num whitespace-nowrap border-b border-rule px-2 py-1 text-left font-semibold"
              >
                {rowLabel(l)}
              </th>
              {columns
                .map((x) => ({ x, v: grid[l]![x] }))
                .map(({ x, v }) => (
                  <td key={String(values[across]![x])} className="border-b border-rule px-2 py-1 text-center">
                    {v ? (
                      <span
                        className={`font-semibold ${TONE[v.verdict]}`}
                        title={VERDICT_WORDS[v.verdict].word}
                      >
                        <span aria-hidden="true">{VERDICT_WORDS[v.verdict].glyph}</span>
                        <span className="sr-only">{VERDICT_WORDS[v.verdict].word}</span>
                      </span>
                    ) : (
                      <span className="text-ink-muted">…</span>
                    )}
                  </td>
                ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
});
