import { useId } from 'react';
import { formatPercent } from '../units';

/** Scale of the bar: 0 to 150 %, with a tick at 100 %. */
const FULL = 1.5;

export type BarTone = 'meets' | 'fails';

/**
 * A utilisation bar that reads without colour: the filled length, a tick at 100 %, the percentage and the word
 * ("68 % — meets", "114 % — exceeds"). A failure is drawn hatched as well as in the caution colour.
 */
export function UtilisationBar({ utilisation }: { utilisation: number }) {
  const hatch = `hatch${useId().replace(/[^a-zA-Z0-9]/g, '')}`;
  const fails = utilisation > 1 + 1e-6;
  const width = Math.max(0, Math.min(utilisation, FULL)) / FULL;
  return (
    <div className="flex items-center gap-2">
      <svg viewBox="0 0 120 12" width="120" height="12" aria-hidden="true" className="shrink-0">
        <defs>
          <pattern id={hatch} width="4" height="4" patternUnits="userSpaceOnUse">
            <path d="M0 4 L4 0" stroke="#a12c2a" strokeWidth="1.2" />
          </pattern>
        </defs>
        <rect x="0.5" y="1.5" width="119" height="9" fill="#fbf8f1" stroke="#7c7263" strokeWidth="1" />
        <rect
          x="0.5"
          y="1.5"
          width={119 * width}
          height="9"
          fill={fails ? `url(#${hatch})` : '#1e1c19'}
          stroke={fails ? '#a12c2a' : 'none'}
        />
        <line x1={0.5 + 119 / FULL} x2={0.5 + 119 / FULL} y1="0" y2="12" stroke="#1e1c19" strokeWidth="1.5" />
      </svg>
      <span className={`num whitespace-nowrap text-sm ${fails ? 'font-semibold text-caution' : 'text-ink'}`}>
        {formatPercent(utilisation)}
        <span className="font-sans"> — {fails ? 'exceeds' : 'meets'}</span>
      </span>
    </div>
  );
}
