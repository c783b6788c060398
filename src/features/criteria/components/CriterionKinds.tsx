import { CRITERION_TYPE_KEYS, criterionSpec } from '@shared/checks/criteria';
import type { UnitSystem } from '@shared/units';

const DIRECTION = { max: 'at most (≤)', min: 'at least (≥)', required: 'must be yes' } as const;

/** The row kinds a check run reads, in plain words: what each limits, its direction and its unit. */
export function CriterionKinds({ system }: { system: UnitSystem }) {
  return (
    <dl className="grid max-w-prose grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-[minmax(12rem,auto)_1fr]">
      {CRITERION_TYPE_KEYS.map((type) => {
        const spec = criterionSpec(type);
        const unit = spec.display[system].symbol;
        return (
          <div key={type} className="contents">
            <dt className="pt-2 font-semibold sm:pt-0">{spec.label}</dt>
            <dd>
              {spec.description}{' '}
              <span className="text-ink-muted">
                Value: {DIRECTION[spec.direction]}
                {unit ? `, in ${unit}` : ''}.
              </span>
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
