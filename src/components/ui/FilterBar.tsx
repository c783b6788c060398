import type { ReactNode } from 'react';
import { Button } from './Button';
import { Field } from './Field';
import { Select } from './Select';
import { TextInput } from './TextInput';

/** A list's search and filters in one row that wraps on a phone, with "Show all" while any is set. */
export function FilterBar({
  label,
  active,
  onClear,
  className = '',
  children,
}: {
  label: string;
  active: boolean;
  onClear: () => void;
  className?: string;
  children: ReactNode;
}) {
  return (
    <search aria-label={label} className={`flex flex-wrap items-start gap-x-4 gap-y-3 ${className}`}>
      {children}
      {active ? (
        <Button variant="quiet" onClick={onClear} className="sm:mt-6">
          Show all
        </Button>
      ) : null}
    </search>
  );
}

/** The free-text search box of a FilterBar. */
export function SearchBox({
  hint,
  value,
  onChange,
}: {
  hint: string;
  value: string;
  onChange: (text: string) => void;
}) {
  return (
    <Field label="Search" hint={hint} className="min-w-56 flex-1 sm:max-w-sm">
      {(c) => (
        <TextInput
          {...c}
          type="search"
          value={value}
          onChange={(e) => onChange(e.target.value)}
          className="py-1.5"
        />
      )}
    </Field>
  );
}

/** A choice of a FilterBar: "Any" first, then the options. */
export function FilterSelect({
  label,
  className,
  value,
  onChange,
  options,
}: {
  label: string;
  className: string;
  value: string;
  onChange: (value: string) => void;
  options: readonly { value: string; label: string }[];
}) {
  return (
    <Field label={label} className={className}>
      {(c) => (
        <Select {...c} value={value} onChange={(e) => onChange(e.target.value)} className="py-1.5">
          <option value="">Any</option>
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}
