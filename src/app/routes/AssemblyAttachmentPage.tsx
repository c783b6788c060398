import { useQueryClient } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useAssembly } from '../../features/assemblies/api/get-assembly';
import { conflictingAssembly, useUpdateAssembly } from '../../features/assemblies/api/update-assembly';
import { useProject } from '../../features/projects/api/get-project';
import { AttachmentSheet } from '../../features/wind/components/AttachmentSheet';
import { errorMessage } from '../../lib/api';
import { assemblyKeys } from '../../lib/query-keys';
import { AssemblyTabs } from '../layout/AssemblyTabs';

/** The attachment (wind) sheet of one assembly: girt and clip spacing per wall zone from the panel's table. */
export function AssemblyAttachmentPage() {
  const { id = '', assemblyId = '' } = useParams();
  const { data: project } = useProject(id);
  const assembly = useAssembly(assemblyId);
  const qc = useQueryClient();
  const update = useUpdateAssembly();

  if (!project) return null;
  if (assembly.isPending) return <Loading what="Loading the assembly" />;
  if (assembly.isError) return <Notice tone="caution" title={errorMessage(assembly.error)} live />;
  const a = assembly.data;
  if (a.projectId !== project.id)
    return <Notice tone="caution" title="This assembly belongs to another project." />;

  return (
    <div className="flex flex-col gap-10">
      <title>{`Attachment & wind · ${a.name} · ${project.name} · Skinwright`}</title>
      <AssemblyTabs projectId={project.id} assemblyId={a.id} name={a.name} />
      <AttachmentSheet
        key={a.id}
        project={project}
        assembly={a}
        save={(args) => update.mutateAsync(args)}
        conflictOf={conflictingAssembly}
        onLoadTheirs={(theirs) => {
          qc.setQueryData(assemblyKeys.detail(theirs.id), theirs);
          void qc.invalidateQueries({ queryKey: assemblyKeys.revisions(theirs.id) });
        }}
        errorText={errorMessage}
      />
    </div>
  );
}
