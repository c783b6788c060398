import type { ReactNode, TdHTMLAttributes, ThHTMLAttributes } from 'react';

interface TableProps {
  /** Every table has a caption; pass `captionHidden` to keep it for screen readers only. */
  caption: ReactNode;
  captionHidden?: boolean;
  children: ReactNode;
  className?: string;
}

/** Ruled table: a heavy rule under the head, hairlines between rows, no boxes. */
export function Table({ caption, captionHidden = false, children, className = '' }: TableProps) {
  // `relative`: text for screen readers only (absolutely placed) stays inside the scroller, not past the page.
  return (
    <div className="relative overflow-x-auto">
      <table className={`w-full border-collapse text-left text-sm ${className}`}>
        <caption className={captionHidden ? 'sr-only' : 'label-caps pb-2 text-left'}>{caption}</caption>
        {children}
      </table>
    </div>
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
