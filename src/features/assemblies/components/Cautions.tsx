/**
 * The cautions that sit with every thermal result, in the same place on every page that shows one and at
 * the end of every sheet.
 */
export function Cautions({ engineVersion }: { engineVersion?: string }) {
  return (
    <aside
      aria-labelledby="cautions-heading"
      className="border-l-4 border-caution bg-caution-wash px-4 py-3 text-sm"
    >
      <h3 id="cautions-heading" className="flex items-baseline gap-2 font-sans text-sm font-semibold">
        <span aria-hidden="true">■</span>
        <span className="label-caps text-ink">Cautions</span>
      </h3>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        <li>
          This result is an aid to, not a substitute for, the licensed professional of record, who checks and
          seals the design.
        </li>
        <li>
          The manufacturer's tested χ and ψ values govern over any value entered or taken from a library here;
          generic material values are for early checks only.
        </li>
        <li>The local code official decides what the code requires and which method is accepted.</li>
      </ul>
      {engineVersion ? (
        <p className="mt-2 text-xs text-ink-muted">
          Calculation engine <span className="num">{engineVersion}</span>.
        </p>
      ) : null}
    </aside>
  );
}
