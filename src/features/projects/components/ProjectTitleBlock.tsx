import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { Project } from '@shared/schemas/project';
import type { ReactNode } from 'react';
import { formatDateTime } from '../../../lib/format';
import { PROJECT_FIELD_QUANTITIES as Q } from '../../../lib/project-fields';
import { formatQuantity } from '../../../lib/quantities';
import { useUnitSystem } from '../../../lib/unit-system';

function Cell({
  label,
  children,
  span = 1,
  numeric = false,
}: {
  label: ReactNode;
  children: ReactNode;
  span?: 1 | 2 | 3 | 4 | 6;
  numeric?: boolean;
}) {
  const spans = {
    1: 'sm:col-span-1',
    2: 'sm:col-span-2',
    3: 'sm:col-span-3',
    4: 'sm:col-span-4',
    6: 'sm:col-span-6',
  };
  return (
    <div className={`bg-paper-raised px-3 py-2 ${spans[span]}`}>
      <dt className="label-caps">{label}</dt>
      <dd className={`mt-0.5 text-ink ${numeric ? 'num' : ''}`}>{children}</dd>
    </div>
  );
}

/**
 * The project's site data laid out like the title block of a drawing: one ruled frame,
 * small capital labels, figures in tabular mono, units per the person's preference.
 */
export function ProjectTitleBlock({ project: p }: { project: Project }) {
  const system = useUnitSystem();
  const q = (field: keyof typeof Q) => formatQuantity(p[field], Q[field], system);
  /** A design figure of the site in a third of the block's width. */
  const design = (label: string, field: keyof typeof Q) => (
    <Cell label={label} span={2} numeric>
      {q(field)}
    </Cell>
  );

  return (
    <section aria-labelledby="title-block-heading" className="border border-ink bg-paper-raised">
      <h2 id="title-block-heading" className="sr-only">
        Project and site data
      </h2>
      <dl className="grid grid-cols-1 gap-px bg-rule sm:grid-cols-6">
        <Cell label="Project" span={4}>
          <span className="font-serif text-xl font-semibold">{p.name}</span>
          {p.description ? <span className="mt-1 block text-sm text-ink-muted">{p.description}</span> : null}
        </Cell>
        <Cell label="Project no." numeric>
          {p.number || '—'}
        </Cell>
        <Cell label="Firm">{p.organisationName}</Cell>

        <Cell label="Site address" span={4}>
          <span className="whitespace-pre-line">{p.siteAddress || '—'}</span>
        </Cell>
        <Cell label="Climate zone" numeric>
          {p.climateZone}
        </Cell>
        <Cell label="Elevation" numeric>
          {q('elevationM')}
        </Cell>

        <Cell
          label={
            <>
              Mean roof height <span className="font-serif normal-case italic">h</span>
            </>
          }
          span={2}
          numeric
        >
          {q('buildingHeightM')}
        </Cell>
        {design('Plan length', 'planLengthM')}
        {design('Plan width', 'planWidthM')}

        <Cell label="Indoor design" span={2} numeric>
          {q('indoorTempC')} at {q('indoorRh')} RH
        </Cell>
        {design('Winter design', 'winterDesignTempC')}
        {design('Summer design', 'summerDesignTempC')}

        <Cell label="Your role" span={2}>
          {PROJECT_ROLE_LABELS[p.myRole]}
        </Cell>
        <Cell label="Revision" span={2} numeric>
          {p.version}
        </Cell>
        <Cell label="Last saved" span={2} numeric>
          {formatDateTime(p.updatedAt)}
        </Cell>
      </dl>
    </section>
  );
}
