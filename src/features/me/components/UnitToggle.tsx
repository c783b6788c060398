import type { UnitSystem } from '@shared/units';
import { useMe } from '../api/get-me';
import { useUpdatePreferences } from '../api/update-preferences';

const OPTIONS: { value: UnitSystem; short: string; long: string }[] = [
  { value: 'SI', short: 'SI', long: 'SI units (m, °C)' },
  { value: 'IP', short: 'IP', long: 'Inch-pound units (ft, °F)' },
];

/** Two pressed/unpressed buttons in the header; the choice is saved to the person's preferences. */
export function UnitToggle() {
  const me = useMe();
  const update = useUpdatePreferences();
  const current = me.data?.unitSystem ?? 'SI';
  if (!me.data) return null;

  return (
    <fieldset className="flex items-center gap-2">
      <legend className="sr-only">Units shown</legend>
      <span aria-hidden="true" className="label-caps">
        Units
      </span>
      <div className="flex">
        {OPTIONS.map((o, i) => (
          <button
            key={o.value}
            type="button"
            aria-pressed={current === o.value}
            aria-label={o.long}
            title={o.long}
            disabled={update.isPending}
            onClick={() => current !== o.value && update.mutate(o.value)}
            className={
              `num border border-ink px-2.5 py-1 text-xs font-medium ${i === 0 ? 'rounded-l-sm' : '-ml-px rounded-r-sm'} ` +
              (current === o.value ? 'bg-ink text-paper' : 'bg-transparent text-ink hover:bg-paper-sunk')
            }
          >
            {o.short}
          </button>
        ))}
      </div>
      {update.isError ? (
        <span role="alert" className="text-xs text-caution">
          Not saved
        </span>
      ) : null}
    </fieldset>
  );
}
