import { useId } from 'react';
import { Button } from './Button';
import { Options } from './Options';
import { Select } from './Select';

interface RoleSelectProps<R extends string> {
  /** Whose role it is, for the control's label ("Role for Ada Finch"). */
  label: string;
  /** The role as saved, and the one chosen in the box (the caller keeps it, so a row can reset it). */
  saved: R;
  value: R;
  onChange: (role: R) => void;
  roles: readonly R[];
  labels: Record<R, string>;
  saving: boolean;
  onSave: (role: R) => void;
}

/** A role picker for one person's row: "Save role" and "Undo" appear only once another role is chosen. */
export function RoleSelect<R extends string>({
  label,
  saved,
  value,
  onChange,
  roles,
  labels,
  saving,
  onSave,
}: RoleSelectProps<R>) {
  const id = useId();
  return (
    <div className="flex flex-wrap items-center gap-2">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <Select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value as R)}
        className="w-auto py-1 text-sm"
      >
        <Options values={roles} labels={labels} />
      </Select>
      {value !== saved ? (
        <>
          <Button
            variant="secondary"
            className="px-3 py-1"
            busy={saving}
            busyLabel="Saving…"
            onClick={() => onSave(value)}
          >
            Save role
          </Button>
          <Button variant="quiet" className="px-2 py-1" onClick={() => onChange(saved)}>
            Undo
          </Button>
        </>
      ) : null}
    </div>
  );
}
