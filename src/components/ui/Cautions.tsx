import { type ReactNode, useId } from 'react';

interface CautionsProps {
  /** One caution per item, in plain words. */
  items: readonly ReactNode[];
  engineVersion?: string;
  /** Heading text; "Cautions" unless a page holds more than one set (e.g. "Cautions — quantities"). */
  title?: string;
}

/**
 * The cautions that sit with every result, drawn the same way and in the same place (after the result) on
 * every page and at the end of every sheet.
 */
export function Cautions({ items, engineVersion, title = 'Cautions' }: CautionsProps) {
  const id = useId();
  return (
    <aside aria-labelledby={id} className="border-l-4 border-caution bg-caution-wash px-4 py-3 text-sm">
      <h3 id={id} className="flex items-baseline gap-2 font-sans text-sm font-semibold">
        <span aria-hidden="true">■</span>
        <span className="label-caps text-ink">{title}</span>
      </h3>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {items.map((item, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: a fixed list written by the page
          <li key={i}>{item}</li>
        ))}
      </ul>
      {engineVersion ? (
        <p className="mt-2 text-xs text-ink-muted">
          Calculation engine <span className="num">{engineVersion}</span>.
        </p>
      ) : null}
    </aside>
  );
}
