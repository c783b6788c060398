import { can, canInFirm } from '@shared/auth/permissions';
import type { AssemblyRevision, BridgeValue, BridgeValueInput } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import type { ReactNode } from 'react';
import { TitledSection } from '../../components/ui/TitledSection';
import { AssemblyBuilder } from '../../features/assemblies/components/AssemblyBuilder';
import { AssemblyView } from '../../features/assemblies/components/AssemblyView';
import { DuplicateAssembly } from '../../features/assemblies/components/DuplicateAssembly';
import { RevisionHistory } from '../../features/assemblies/components/RevisionHistory';
import { useAddBridgeValue, useBridgeValues, useFirmMaterials } from '../../features/library/api/firm-lists';
import { useMe } from '../../features/me/api/get-me';
import { firmOf } from '../../features/me/firm';
import { useAssemblyCopyTargets } from '../../features/projects/api/get-projects';
import { formatDateTime } from '../../lib/format';
import { useAssemblyFrame } from '../layout/AssemblyLayout';

/**
 * The firm library offered in the builder: the person's firm that owns the project if they belong to it,
 * else their first firm. (Composed here so that the assemblies and library features stay apart.)
 */
export function useBuilderLibrary(project: Project | undefined) {
  const org = firmOf(useMe().data, project?.organisationId);
  const materials = useFirmMaterials(org?.id);
  const bridgeValues = useBridgeValues(org?.id);
  const add = useAddBridgeValue();
  return {
    firmName: org?.name ?? null,
    firmMaterials: materials.data ?? [],
    bridgeValues: bridgeValues.data ?? [],
    // Only the firm's editors and administrators add to its library.
    saveBridgeValue:
      org && canInFirm(org.role, 'firm.write')
        ? { firmName: org.name, add: (input: BridgeValueInput) => add.mutateAsync({ orgId: org.id, input }) }
        : undefined,
  };
}

/**
 * A saved revision read-only, exactly as it was stored (input and stored result), under a heading: what it is,
 * when and by whom it was saved, its name, a `detail` line under the name and `children` below (a notice).
 */
export function SavedRevisionView({
  revision: r,
  what,
  name,
  bridgeValues,
  detail,
  children,
}: {
  revision: AssemblyRevision;
  what: string;
  name: string;
  bridgeValues: readonly BridgeValue[];
  detail?: ReactNode;
  children?: ReactNode;
}) {
  return (
    <AssemblyView
      input={r.input}
      storedResult={r.thermalResult}
      engineVersion={r.engineVersion}
      bridgeValues={bridgeValues}
      heading={
        <header className="flex flex-col gap-3">
          <div>
            <p className="label-caps">
              {what} saved {formatDateTime(r.createdAt)}
              {r.createdBy ? ` by ${r.createdBy}` : ''} · read-only
            </p>
            <h2 className="text-3xl">{name}</h2>
            {detail}
          </div>
          {children}
        </header>
      }
    />
  );
}

export function AssemblyBuilderPage() {
  const { project, assembly: a } = useAssemblyFrame();
  const library = useBuilderLibrary(project);
  const targets = useAssemblyCopyTargets();
  const mayWrite = can(project.myRole, 'assembly.write') && project.archivedAt === null;

  return (
    <>
      <title>{`${a.name} · ${project.name} · Skinwright`}</title>
      {mayWrite ? (
        <AssemblyBuilder
          key={a.id}
          projectId={project.id}
          initial={a.current.input}
          assembly={a}
          firmName={library.firmName}
          firmMaterials={library.firmMaterials}
          bridgeValues={library.bridgeValues}
          saveBridgeValue={library.saveBridgeValue}
        />
      ) : (
        <SavedRevisionView
          revision={a.current}
          what={`Assembly · revision ${a.revision}`}
          name={a.name}
          bridgeValues={library.bridgeValues}
          detail={
            <p className="mt-1 text-sm text-ink-muted">
              {project.archivedAt
                ? 'The project is archived, so its assemblies are shown read-only.'
                : 'Your role on this project shows assemblies read-only.'}
            </p>
          }
        />
      )}
      <RevisionHistory
        projectId={project.id}
        assemblyId={a.id}
        currentRevision={a.revision}
        openRevision={a.revision}
      />
      {project.archivedAt === null && targets.length > 0 ? (
        <TitledSection
          title="Duplicate"
          heading="w-full border-b border-ink pb-2 text-2xl"
          className="flex flex-col items-start gap-3"
        >
          <DuplicateAssembly key={a.id} assembly={a} projectId={project.id} targets={targets} />
        </TitledSection>
      ) : null}
    </>
  );
}
