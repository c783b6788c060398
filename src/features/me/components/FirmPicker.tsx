import { Field } from '../../../components/ui/Field';
import { NamedOptions } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';

interface FirmPickerProps {
  firms: readonly { id: string; name: string }[];
  value: string | undefined;
  onChange: (firmId: string) => void;
}

/** The "Firm" choice of a page that works in one of the person's firms; nothing when there is only one. */
export function FirmPicker({ firms, value, onChange }: FirmPickerProps) {
  if (firms.length < 2) return null;
  return (
    <Field label="Firm" className="max-w-sm">
      {(c) => (
        <Select {...c} value={value} onChange={(e) => onChange(e.target.value)}>
          <NamedOptions items={firms} />
        </Select>
      )}
    </Field>
  );
}
