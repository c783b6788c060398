import type { ReactNode } from 'react';

export type NoticeTone = 'info' | 'warning' | 'caution';

const tones: Record<NoticeTone, { word: string; glyph: string; cls: string }> = {
  info: { word: 'Note', glyph: '●', cls: 'border-ink bg-paper-sunk' },
  warning: { word: 'Warning', glyph: '▲', cls: 'border-warning bg-warning-wash' },
  caution: { word: 'Caution', glyph: '■', cls: 'border-caution bg-caution-wash' },
};

interface NoticeProps {
  tone?: NoticeTone;
  title?: ReactNode;
  children?: ReactNode;
  /** Announce to screen readers when it appears (for errors that arrive after an action). */
  live?: boolean;
  className?: string;
}

/** A boxed note with its tone written as a word and a glyph, so it survives grey-scale printing. */
export function Notice({ tone = 'info', title, children, live = false, className = '' }: NoticeProps) {
  const t = tones[tone];
  return (
    <div
      role={live ? (tone === 'info' ? 'status' : 'alert') : undefined}
      className={`border-l-4 px-4 py-3 text-sm text-ink ${t.cls} ${className}`}
    >
      <p className="font-semibold">
        <span aria-hidden="true" className="mr-2">
          {t.glyph}
        </span>
        <span className="label-caps mr-2 text-ink">{t.word}</span>
        {title}
      </p>
      {children ? <div className="mt-1 space-y-2">{children}</div> : null}
    </div>
  );
}
