import {
  type ReactNode,
  type TdHTMLAttributes,
  type ThHTMLAttributes,
  useId,
  useLayoutEffect,
  useRef,
  useState,
} from 'react';

/** A head cell of `Table`'s `head`: its words, or `numeric(words)` over a column of figures (set right). */
export type Column = ReactNode | { label: ReactNode; numeric: true };
export const numeric = (label: ReactNode): Column => ({ label, numeric: true });
const isNumeric = (c: Column): c is { label: ReactNode; numeric: true } =>
  typeof c === 'object' && c !== null && 'numeric' in c;

interface TableProps {
  /** Every table has a caption; pass `captionHidden` to keep it for screen readers only. */
  caption: ReactNode;
  captionHidden?: boolean;
  /** The head row's cells, one a column, when they are plain words (else write the `<thead>` as a child). */
  head?: readonly Column[];
  children: ReactNode;
  className?: string;
}

/** Whether the box's content is wider than the box (it scrolls sideways), followed as either is resized. */
function useWiderThanBox() {
  const box = useRef<HTMLDivElement>(null);
  const [wider, setWider] = useState(false);
  const [caption, setCaption] = useState('');
  useLayoutEffect(() => {
    const el = box.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const measure = () => {
      setWider(el.scrollWidth > el.clientWidth + 1);
      setCaption(el.querySelector('caption')?.textContent ?? '');
    };
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    if (el.firstElementChild) observer.observe(el.firstElementChild);
    return () => observer.disconnect();
  }, []);
  return { box, wider, caption };
}

/**
 * The box a table scrolls sideways in, so that a wide table never widens the page (a phone is 390 px). While
 * the table is wider than the box, the box is a region named by the table's caption (`labelledBy`, else its
 * text) reachable with the keyboard (arrow keys scroll it), its right edge is ruled where the table is cut, and
 * a line under it says it scrolls.
 */
export function TableScroller({
  labelledBy,
  className = '',
  children,
}: {
  labelledBy?: string;
  className?: string;
  children: ReactNode;
}) {
  const { box, wider, caption } = useWiderThanBox();
  const hint = useId();
  // `relative`: text for screen readers only (absolutely placed) stays inside the scroller, not past the page.
  return (
    <div
      ref={box}
      className={`relative overflow-x-auto ${wider ? 'border-r border-rule print:border-0' : ''} ${className}`}
      {...(wider
        ? {
            role: 'region',
            tabIndex: 0,
            'aria-labelledby': labelledBy,
            'aria-label': labelledBy ? undefined : caption,
            'aria-describedby': hint,
          }
        : {})}
    >
      {children}
      {wider ? (
        <p id={hint} className="sticky left-0 pt-1 text-xs text-ink-muted print:hidden">
          Wider than the screen: scroll the table sideways.
        </p>
      ) : null}
    </div>
  );
}

/** Ruled table: a heavy rule under the head, hairlines between rows, no boxes. */
export function Table({ caption, captionHidden = false, head, children, className = '' }: TableProps) {
  const captionId = useId();
  return (
    <TableScroller labelledBy={captionId}>
      <table className={`w-full border-collapse text-left text-sm ${className}`}>
        <caption id={captionId} className={captionHidden ? 'sr-only' : 'label-caps pb-2 text-left'}>
          {caption}
        </caption>
        {head ? (
          <thead>
            <tr>
              {head.map((c, i) => (
                // biome-ignore lint/suspicious/noArrayIndexKey: the columns are fixed per table
                <Th key={i} numeric={isNumeric(c)}>
                  {isNumeric(c) ? c.label : c}
                </Th>
              ))}
            </tr>
          </thead>
        ) : null}
        {children}
      </table>
    </TableScroller>
  );
}

export function Th({
  numeric = false,
  className = '',
  scope = 'col',
  ...rest
}: ThHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return (
    <th
      scope={scope}
      className={`border-b-2 border-ink px-3 py-2 align-bottom font-semibold text-ink ${numeric ? 'text-right' : ''} ${className}`}
      {...rest}
    />
  );
}

export function Td({
  numeric = false,
  className = '',
  ...rest
}: TdHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return (
    <td
      className={`border-b border-rule px-3 py-2 align-top ${numeric ? 'num text-right' : ''} ${className}`}
      {...rest}
    />
  );
}
