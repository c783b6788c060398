import { useSearchParams } from 'react-router';

/*
 * Filtering a loaded list by what the person typed and picked, kept in the page's address (`?q=…&zone=…`), so a
 * link, a reload and back/forward bring the same view back. Typing replaces the address entry (back does not
 * step through keystrokes); picking from a list adds one.
 */

/** Whether every word of the query is found in one of the texts (case and accents ignored). */
export function matchesQuery(query: string, texts: readonly (string | null | undefined)[]): boolean {
  const fold = (s: string) => s.normalize('NFD').replace(/\p{M}/gu, '').toLocaleLowerCase();
  const words = fold(query).split(/\s+/).filter(Boolean);
  const haystack = fold(texts.filter(Boolean).join(' '));
  return words.every((w) => haystack.includes(w));
}

/** The filters named in `names` as read from and written to the address; '' is "not filtered". */
export function useListFilters<N extends string>(names: readonly N[]) {
  const [params, setParams] = useSearchParams();
  const values = Object.fromEntries(names.map((n) => [n, params.get(n) ?? ''])) as Record<N, string>;
  function set(name: N, value: string, replace = false) {
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (value === '') next.delete(name);
        else next.set(name, value);
        return next;
      },
      { replace, preventScrollReset: true },
    );
  }
  const active = names.some((n) => values[n] !== '');
  const clear = () =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        for (const n of names) next.delete(n);
        return next;
      },
      { preventScrollReset: true },
    );
  return { values, set, active, clear };
}
