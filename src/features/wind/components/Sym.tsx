/**
 * A symbol as the standard prints it: italic letter, subscript after the underscore ("K_zt" → K with zt below),
 * kept in its case inside small-capital labels.
 */
export function Sym({ s }: { s: string }) {
  const [base, sub] = s.split('_');
  return (
    <span className="font-serif normal-case italic">
      {base}
      {sub ? <sub className="text-[0.75em]">{sub}</sub> : null}
    </span>
  );
}
