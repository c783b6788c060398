import { canInFirm } from '@shared/auth/permissions';
import { useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useAssembly } from '../../features/assemblies/api/get-assembly';
import { useAssemblyRevisionApi } from '../../features/assemblies/api/update-assembly';
import {
  dataSheetHref,
  useAddAttachmentProduct,
  useAttachmentProducts,
} from '../../features/library/api/attachment-products';
import { useMe } from '../../features/me/api/get-me';
import { useProject } from '../../features/projects/api/get-project';
import { AttachmentSheet } from '../../features/wind/components/AttachmentSheet';
import type { AttachmentLibrary } from '../../features/wind/components/LibraryPick';
import { errorMessage } from '../../lib/api';
import { AssemblyTabs } from '../layout/AssemblyTabs';

/**
 * The firm library of panel tables and clips offered on the sheet: the person's firm that owns the project if
 * they belong to it, else their first firm (composed here so that the wind and library features stay apart).
 */
function useAttachmentLibrary(organisationId: string | undefined): AttachmentLibrary | null {
  const orgs = useMe().data?.organisations ?? [];
  const org = orgs.find((o) => o.id === organisationId) ?? orgs[0];
  const products = useAttachmentProducts(org?.id);
  const add = useAddAttachmentProduct();
  if (!org) return null;
  return {
    orgId: org.id,
    firmName: org.name,
    products: products.data ?? [],
    dataSheetHref: (productId) => dataSheetHref(org.id, productId),
    // Only the firm's editors and administrators add to its library.
    save: canInFirm(org.role, 'firm.write')
      ? (input) => add.mutateAsync({ orgId: org.id, input })
      : undefined,
    errorText: errorMessage,
  };
}

/** The attachment (wind) sheet of one assembly: girt and clip spacing per wall zone from the panel's table. */
export function AssemblyAttachmentPage() {
  const { id = '', assemblyId = '' } = useParams();
  const { data: project } = useProject(id);
  const assembly = useAssembly(assemblyId);
  const revisionApi = useAssemblyRevisionApi();
  const library = useAttachmentLibrary(project?.organisationId);

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
      <AttachmentSheet key={a.id} project={project} assembly={a} library={library} {...revisionApi} />
    </div>
  );
}
