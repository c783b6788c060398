import type { CriteriaSetMeta } from '@shared/schemas/criteria';
import { Field } from '../../../components/ui/Field';
import { TextInput } from '../../../components/ui/TextInput';

type TextKey = 'name' | 'jurisdiction' | 'edition' | 'sourceReference';

const WORDS: Record<TextKey, { label: string; hint?: string }> = {
  name: { label: 'Name' },
  jurisdiction: { label: 'Jurisdiction', hint: 'Where the adopted code applies, in your words.' },
  edition: { label: 'Edition and amendments' },
  sourceReference: { label: 'Source reference', hint: 'Section and table numbers of the adopted code.' },
};

/** A code table's one-line details (a new table's and the details form's), each with the server's error. */
export function CriteriaTextFields<K extends TextKey>({
  keys,
  values,
  onChange,
  errorOf,
}: {
  keys: readonly K[];
  values: Pick<CriteriaSetMeta, K>;
  onChange: (patch: Partial<Pick<CriteriaSetMeta, K>>) => void;
  errorOf: (key: K) => string | undefined;
}) {
  return keys.map((k) => (
    <Field key={k} label={WORDS[k].label} hint={WORDS[k].hint} required={k === 'name'} error={errorOf(k)}>
      {(c) => (
        <TextInput
          {...c}
          value={values[k]}
          onChange={(e) => onChange({ [k]: e.target.value } as Partial<Pick<CriteriaSetMeta, K>>)}
        />
      )}
    </Field>
  ));
}
