import { canInFirm } from '@shared/auth/permissions';
import { useAssemblyRevisionApi } from '../../features/assemblies/api/update-assembly';
import {
  dataSheetHref,
  useAddAttachmentProduct,
  useAttachmentProducts,
} from '../../features/library/api/attachment-products';
import { useMe } from '../../features/me/api/get-me';
import { firmOf } from '../../features/me/firm';
import { AttachmentView } from '../../features/wind/components/AttachmentView';
import type { AttachmentLibrary } from '../../features/wind/components/LibraryPick';
import { errorMessage } from '../../lib/api';
import { useAssemblyFrame } from '../layout/AssemblyLayout';

/**
 * The firm library of panel tables and clips offered on the page: the person's firm that owns the project if
 * they belong to it, else their first firm (composed here so that the wind and library features stay apart).
 */
function useAttachmentLibrary(organisationId: string | undefined): AttachmentLibrary | null {
  const org = firmOf(useMe().data, organisationId);
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

/** The attachment (wind) page of one assembly: girt and clip spacing per wall zone from the panel's table. */
export function AssemblyAttachmentPage() {
  const { project, assembly } = useAssemblyFrame();
  const revisionApi = useAssemblyRevisionApi();
  const library = useAttachmentLibrary(project.organisationId);
  return (
    <>
      <title>{`Attachment & wind · ${assembly.name} · ${project.name} · Skinwright`}</title>
      <AttachmentView
        key={assembly.id}
        project={project}
        assembly={assembly}
        library={library}
        {...revisionApi}
      />
    </>
  );
}
