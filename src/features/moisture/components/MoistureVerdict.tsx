import type { MoistureResult } from '@shared/calc/moisture/schema';
import type { UnitSystem } from '@shared/units';
import {
  interstitialStatement,
  OVERALL_WORDS,
  overallTone,
  type Statement,
  surfaceStatement,
  TONE,
} from '../verdict';

function Line({ label, statement, testId }: { label: string; statement: Statement; testId: string }) {
  const t = TONE[statement.tone];
  return (
    <div className="grid gap-x-4 gap-y-1 px-4 py-3 sm:grid-cols-[11rem_1fr]">
      <dt className="label-caps pt-1">{label}</dt>
      <dd className="flex items-start gap-2">
        <span aria-hidden="true" className={`num text-lg leading-6 ${t.cls.split(' ')[0]}`}>
          {t.glyph}
        </span>
        <span data-testid={testId}>
          <span className={`font-semibold ${t.cls.split(' ')[0]}`}>{t.word}</span> — {statement.text}
        </span>
      </dd>
    </div>
  );
}

/** The verdict in plain words and glyphs: interstitial condensation, then the surface (mould) check. */
export function MoistureVerdict({
  result,
  layerNames,
  system,
}: {
  result: MoistureResult;
  layerNames: readonly string[];
  system: UnitSystem;
}) {
  const inside = interstitialStatement(result, layerNames, system);
  const surface = surfaceStatement(result);
  const tone = overallTone(inside, surface);
  const t = TONE[tone];
  return (
    <div className={`border-2 ${t.cls.split(' ')[1]} bg-paper-raised`}>
      <p
        className="flex items-start gap-2 border-b border-rule px-4 py-3 font-serif text-xl"
        data-testid="moisture-verdict"
      >
        <span aria-hidden="true" className={t.cls.split(' ')[0]}>
          {t.glyph}
        </span>
        <span>{OVERALL_WORDS[tone]}.</span>
      </p>
      <dl className="divide-y divide-rule">
        <Line label="Inside the wall" statement={inside} testId="verdict-interstitial" />
        <Line label="Interior surface" statement={surface} testId="verdict-surface" />
      </dl>
    </div>
  );
}
