import type { ReactNode } from 'react';

/** The choices of a select box: one option a value, worded by a label table or a function of the value. */
export function Options<T extends string | number>({
  values,
  labels,
}: {
  values: readonly T[];
  labels: { readonly [K in T]: ReactNode } | ((value: T) => ReactNode);
}) {
  return values.map((v) => (
    <option key={v} value={v}>
      {typeof labels === 'function' ? labels(v) : labels[v]}
    </option>
  ));
}

/** The choices of a select box of records (projects, assemblies, firms): the id is the value, the name the words. */
export function NamedOptions({ items }: { items: readonly { id: string; name: string }[] }) {
  return items.map((item) => (
    <option key={item.id} value={item.id}>
      {item.name}
    </option>
  ));
}

/** The choices of a select box given as value and words, in order. */
export function LabelledOptions({ options }: { options: readonly { value: string; label: ReactNode }[] }) {
  return options.map((o) => (
    <option key={o.value} value={o.value}>
      {o.label}
    </option>
  ));
}
