import { FIRM_ROLE_LABELS } from '@shared/auth/permissions';
import type { UnitSystem } from '@shared/units';
import { Link } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { TitledSection } from '../../components/ui/TitledSection';
import { useMe } from '../../features/me/api/get-me';
import { useUpdatePreferences } from '../../features/me/api/update-preferences';
import { errorMessage } from '../../lib/api';

const CHOICES: { value: UnitSystem; title: string; example: string }[] = [
  { value: 'SI', title: 'SI', example: 'lengths in m, temperatures in °C' },
  { value: 'IP', title: 'Inch-pound (IP)', example: 'lengths in ft, temperatures in °F' },
];

export function SettingsPage() {
  const me = useMe();
  const update = useUpdatePreferences();
  if (!me.data) return <Loading what="Loading your settings" />;
  const current = me.data.unitSystem;

  return (
    <div className="max-w-form">
      <title>Settings · Skinwright</title>
      <PageHeader title="Settings" />

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 font-serif text-xl font-semibold">Units shown</legend>
        <p className="text-sm text-ink-muted">
          Values are always stored in SI; this only changes what you see and type. Relative humidity is always
          in %.
        </p>
        {CHOICES.map((c) => (
          <label
            key={c.value}
            className={`flex cursor-pointer items-start gap-3 border px-4 py-3 ${current === c.value ? 'border-ink bg-paper-raised' : 'border-rule'}`}
          >
            <input
              type="radio"
              name="unitSystem"
              value={c.value}
              checked={current === c.value}
              onChange={() => update.mutate(c.value)}
              className="mt-1 accent-ink"
            />
            <span>
              <span className="block font-semibold">{c.title}</span>
              <span className="block text-sm text-ink-muted">{c.example}</span>
            </span>
          </label>
        ))}
        {update.isError ? (
          <Notice tone="caution" title={`Not saved: ${errorMessage(update.error)}`} live />
        ) : null}
        {update.isSuccess ? (
          <p role="status" className="text-sm">
            Saved.
          </p>
        ) : null}
      </fieldset>

      <TitledSection
        title="Account"
        heading="border-b border-ink pb-2 text-xl"
        className="mt-10 flex flex-col gap-3"
      >
        <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-2">
          <dt className="label-caps pt-1">Name</dt>
          <dd>{me.data.name}</dd>
          <dt className="label-caps pt-1">E-mail</dt>
          <dd className="break-all">{me.data.email}</dd>
          <dt className="label-caps pt-1">Firms</dt>
          <dd>
            {me.data.organisations.length === 0 ? (
              <span className="text-ink-muted">None</span>
            ) : (
              <ul>
                {me.data.organisations.map((o) => (
                  <li key={o.id}>
                    {o.name} <span className="text-ink-muted">({FIRM_ROLE_LABELS[o.role]})</span> ·{' '}
                    <Link to={`/settings/firm?org=${o.id}`}>
                      people and firm roles<span className="sr-only"> of {o.name}</span>
                    </Link>
                    <span className="block text-sm">
                      <span className="num break-all">{o.handle}</span>
                      <span className="text-ink-muted">
                        {' '}
                        ·{' '}
                        {o.verified
                          ? 'verified by the site administrator'
                          : 'not verified: your sheets say “issuer not verified” until the site administrator verifies the firm'}
                      </span>
                    </span>
                  </li>
                ))}
              </ul>
            )}
          </dd>
        </dl>
      </TitledSection>
    </div>
  );
}
