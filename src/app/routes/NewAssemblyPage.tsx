import { can } from '@shared/auth/permissions';
import { useMemo } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import { Notice } from '../../components/ui/Notice';
import { AssemblyBuilder } from '../../features/assemblies/components/AssemblyBuilder';
import { startingInput } from '../../features/assemblies/form';
import { useProject } from '../../features/projects/api/get-project';
import { useBuilderLibrary } from './AssemblyBuilderPage';

export function NewAssemblyPage() {
  const { id = '' } = useParams();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { data: project } = useProject(id);
  const start = params.get('start') === 'blank' ? 'blank' : 'sample';
  const initial = useMemo(() => startingInput(start), [start]);
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

  return (
    <div className="flex flex-col gap-6">
      <title>{`New assembly · ${project.name} · Skinwright`}</title>
      <nav aria-label="Breadcrumb" className="-mt-2 text-sm">
        <Link to={base}>Assemblies</Link> <span aria-hidden="true">/</span> New
      </nav>
      <p className="text-sm text-ink-muted">
        {start === 'sample' ? (
          <>
            Starting from the sample metal-panel rainscreen wall.{' '}
            <Link to={`${base}/new?start=blank`}>Start blank instead</Link>
          </>
        ) : (
          <>
            Starting blank. <Link to={`${base}/new`}>Start from the sample wall instead</Link>
          </>
        )}
      </p>
      <AssemblyBuilder
        key={start}
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
