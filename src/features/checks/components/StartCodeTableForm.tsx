import { canInFirm } from '@shared/auth/permissions';
import type { WallCategory } from '@shared/checks/criteria';
import { WALL_CATEGORY_LABELS } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { NamedOptions } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { submitting } from '../../../lib/form-submit';
import { useCreateCriteriaSet } from '../../criteria/api/create-criteria-set';
import { CriterionKinds } from '../../criteria/components/CriterionKinds';
import { useMe } from '../../me/api/get-me';

/**
 * A first code table, started from the checks page when there is none: it is created empty (rows need a
 * value) and the editor opens with one blank row per criterion type for the assembly's zone and category,
 * and a link back here.
 */
export function StartCodeTableForm({
  zone,
  category,
  system,
  back,
}: {
  zone: Project['climateZone'];
  category: WallCategory;
  system: UnitSystem;
  back: string;
}) {
  const me = useMe();
  const firms = (me.data?.organisations ?? []).filter((o) => canInFirm(o.role, 'firm.write'));
  const [chosen, setChosen] = useState('');
  const [name, setName] = useState('');
  const [edition, setEdition] = useState('');
  const create = useCreateCriteriaSet();
  const navigate = useNavigate();
  const orgId = firms.some((f) => f.id === chosen) ? chosen : (firms[0]?.id ?? '');
  const fields = isApiRequestError(create.error) ? (create.error.fields ?? {}) : {};

  if (me.data && firms.length === 0)
    return (
      <Notice tone="info" title="There is no code table to check against yet.">
        <p>
          An editor or administrator of your firm enters the values of its adopted code under{' '}
          <Link to="/code-tables">Code tables</Link>; your firm role reads them.
        </p>
      </Notice>
    );
  return (
    <div className="flex flex-col gap-4">
      <Notice tone="info" title="There is no code table to check against yet: start one here.">
        <p>
          Skinwright does not supply the code. Name the table and the code it transcribes; the editor then
          opens with one empty row per criterion for climate zone {zone} and the category “
          {WALL_CATEGORY_LABELS[category]}”, for you to fill with your code’s values.
        </p>
      </Notice>
      <form
        aria-label="Start a code table"
        className="flex max-w-form flex-col gap-4"
        onSubmit={submitting(async () => {
          const set = await create.mutateAsync({ orgId, input: { name, edition } });
          const q = new URLSearchParams({ back, zone, category });
          navigate(`/code-tables/${set.id}?${q}`);
        })}
      >
        <Field label="Table name" required error={fields.name}>
          {(c) => <TextInput {...c} value={name} onChange={(e) => setName(e.target.value)} />}
        </Field>
        <Field
          label="Code and edition it transcribes"
          hint="As adopted where the project is, with its amendments."
          error={fields.edition}
        >
          {(c) => <TextInput {...c} value={edition} onChange={(e) => setEdition(e.target.value)} />}
        </Field>
        {firms.length > 1 ? (
          <Field label="Firm it belongs to">
            {(c) => (
              <Select {...c} value={orgId} onChange={(e) => setChosen(e.target.value)}>
                <NamedOptions items={firms} />
              </Select>
            )}
          </Field>
        ) : null}
        {create.isError ? <Notice tone="caution" title={errorMessage(create.error)} live /> : null}
        <div>
          <Button
            type="submit"
            variant="primary"
            busy={create.isPending}
            busyLabel="Creating…"
            disabled={!orgId}
          >
            Start the code table
          </Button>
        </div>
      </form>
      <details className="text-sm">
        <summary className="cursor-pointer font-semibold">The rows a check reads</summary>
        <div className="pt-3">
          <CriterionKinds system={system} />
        </div>
      </details>
    </div>
  );
}
