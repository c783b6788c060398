import { ASSEMBLY_TEMPLATES, findTemplate, TEMPLATE_NOTE } from '@shared/assemblies/templates';
import { can } from '@shared/auth/permissions';
import type { AssemblyInput } from '@shared/schemas/assembly';
import { useMemo } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import { ButtonLink } from '../../components/ui/Button';
import { Notice } from '../../components/ui/Notice';
import { TitledSection } from '../../components/ui/TitledSection';
import { AssemblyBuilder } from '../../features/assemblies/components/AssemblyBuilder';
import { startingInput } from '../../features/assemblies/form';
import { useProject } from '../../features/projects/api/get-project';
import { useBuilderLibrary } from './AssemblyBuilderPage';

const DEFAULT_TEMPLATE = ASSEMBLY_TEMPLATES[0]!;

/**
 * A blank start leaves the wall category for the person to choose: the box shows "Choose…" and the form will
 * not save until a category is picked (the code tables' rows depend on it, so no silent default).
 */
const blankInput = () => ({ ...startingInput('blank'), wallCategory: '' }) as unknown as AssemblyInput;

export function NewAssemblyPage() {
  const { projectId = '' } = useParams();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { data: project } = useProject(projectId);
  const start = params.get('start');
  const template = start === 'blank' ? undefined : (findTemplate(start) ?? DEFAULT_TEMPLATE);
  const initial = useMemo(() => template?.input ?? blankInput(), [template]);
  const library = useBuilderLibrary(project);
  if (!project) return null;

  const base = `/projects/${project.id}/assemblies`;
  if (!can(project.myRole, 'assembly.write') || project.archivedAt !== null)
    return (
      <Notice tone="info" title="Your role on this project does not add assemblies.">
        <p>
          <Link to={base}>Back to the assemblies</Link>
        </p>
      </Notice>
    );

  const choices = [
    ...ASSEMBLY_TEMPLATES.map((t) => ({ id: t.id, title: t.title })),
    { id: 'blank', title: 'Blank' },
  ];
  const chosen = template?.id ?? 'blank';
  return (
    <div className="flex flex-col gap-6">
      <title>{`New assembly · ${project.name} · Skinwright`}</title>
      <nav aria-label="Breadcrumb" className="-mt-2 text-sm">
        <Link to={base}>Assemblies</Link> <span aria-hidden="true">/</span> New
      </nav>
      <TitledSection title="Start from" heading="label-caps" className="flex flex-col gap-2">
        <ul className="flex flex-wrap gap-2">
          {choices.map((c) => (
            <li key={c.id}>
              <ButtonLink
                variant={c.id === chosen ? 'primary' : 'secondary'}
                aria-current={c.id === chosen ? 'page' : undefined}
                to={`${base}/new?start=${c.id}`}
                replace
                className="text-left"
              >
                {c.title}
              </ButtonLink>
            </li>
          ))}
        </ul>
        <p className="text-sm text-ink-muted">
          {template
            ? `Template: ${TEMPLATE_NOTE} Check every layer, bridge and joint against the project before relying on it.`
            : 'Starting blank: choose the wall category, then add the layers from the outside in.'}
        </p>
      </TitledSection>
      <AssemblyBuilder
        key={chosen}
        projectId={project.id}
        initial={initial}
        firmName={library.firmName}
        firmMaterials={library.firmMaterials}
        bridgeValues={library.bridgeValues}
        onCreated={(a) => navigate(`${base}/${a.id}`, { replace: true })}
      />
    </div>
  );
}
