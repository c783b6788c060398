import { useState } from 'react';
import { Field } from '../../../components/ui/Field';
import { TextInput } from '../../../components/ui/TextInput';

export interface Pick {
  key: string;
  label: string;
  /** Its figures and source, under the name. */
  detail: string;
  checked: boolean;
  /** Chosen earlier but no longer offered (deleted from the library since). */
  gone?: boolean;
}

/**
 * Several items picked from a list (a firm library's products or clip types): a search box over the names, the
 * matching items as checkboxes in a box that scrolls inside itself, the chosen ones first, each with its figures.
 */
export function LibraryPicks({
  legend,
  empty,
  picks,
  error,
  onToggle,
}: {
  legend: string;
  /** Said when there is nothing to pick. */
  empty: string;
  picks: Pick[];
  error?: string;
  onToggle: (key: string, checked: boolean) => void;
}) {
  const [find, setFind] = useState('');
  const words = find.trim().toLowerCase();
  const shown = picks
    .filter((p) => p.checked || p.label.toLowerCase().includes(words))
    .sort((x, y) => Number(y.checked) - Number(x.checked));
  const chosen = picks.filter((p) => p.checked).length;
  return (
    <fieldset className="flex min-w-0 flex-col gap-2">
      <legend className="text-sm font-semibold">
        {legend} <span className="font-normal text-ink-muted">— {chosen} chosen</span>
      </legend>
      {picks.length === 0 ? (
        <p className="text-sm text-ink-muted">{empty}</p>
      ) : (
        <>
          {picks.length > 6 ? (
            <Field label="Find by name" className="max-w-sm">
              {(c) => (
                <TextInput {...c} type="search" value={find} onChange={(e) => setFind(e.target.value)} />
              )}
            </Field>
          ) : null}
          <ul className="flex max-h-64 flex-col gap-1 overflow-y-auto rounded-sm border border-rule p-2">
            {shown.length === 0 ? (
              <li className="text-sm text-ink-muted">No name matches “{find}”.</li>
            ) : null}
            {shown.map((p) => (
              <li key={p.key}>
                <label className="flex items-start gap-2 text-sm">
                  <input
                    type="checkbox"
                    className="mt-1"
                    checked={p.checked}
                    onChange={(e) => onToggle(p.key, e.target.checked)}
                  />
                  <span className="min-w-0 [overflow-wrap:anywhere]">
                    <span className="font-medium">{p.label}</span>
                    {p.gone ? (
                      <span className="font-semibold text-caution"> — removed from the library</span>
                    ) : null}
                    <span className="block text-xs text-ink-muted">{p.detail}</span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
        </>
      )}
      {error ? <p className="text-sm font-medium text-caution">✕ {error}</p> : null}
    </fieldset>
  );
}
