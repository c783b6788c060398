import { canInFirm, FIRM_ROLE_LABELS } from '@shared/auth/permissions';
import { type ReactNode, useId, useState } from 'react';
import { Loaded } from '../../components/ui/Loaded';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { useAttachmentProducts } from '../../features/library/api/attachment-products';
import { useBridgeValues, useFirmMaterials } from '../../features/library/api/firm-lists';
import { useReferenceMaterials } from '../../features/library/api/get-reference-materials';
import { useInspectionTemplate } from '../../features/library/api/inspection-template';
import { AddBridgeValueForm } from '../../features/library/components/AddBridgeValueForm';
import { AddFirmMaterialForm } from '../../features/library/components/AddFirmMaterialForm';
import { AttachmentProductsTable } from '../../features/library/components/AttachmentProductsTable';
import { InspectionTemplateEditor } from '../../features/library/components/InspectionTemplateEditor';
import {
  BridgeValuesTable,
  FirmMaterialsTable,
  GenericMaterialsTable,
} from '../../features/library/components/LibraryTables';
import { useMe } from '../../features/me/api/get-me';
import { FirmPicker } from '../../features/me/components/FirmPicker';
import { firmOf } from '../../features/me/firm';

export function LibraryPage() {
  const me = useMe();
  const reference = useReferenceMaterials();
  const orgs = me.data?.organisations ?? [];
  const [chosen, setChosen] = useState<string | undefined>(undefined);
  const org = firmOf(me.data, chosen);
  const materials = useFirmMaterials(org?.id);
  const bridgeValues = useBridgeValues(org?.id);
  const products = useAttachmentProducts(org?.id);
  const checklist = useInspectionTemplate(org?.id);
  // What the firm role allows (the server enforces the same): readers read, editors add, administrators delete.
  const isAdmin = canInFirm(org?.role, 'firm.admin');
  const mayWrite = canInFirm(org?.role, 'firm.write');

  return (
    <div className="flex flex-col gap-10">
      <title>Library · Skinwright</title>
      <PageHeader
        eyebrow="Reference"
        title="Library"
        description="The values the assemblies draw on: generic materials shipped with Skinwright, and your firm's own materials, χ/ψ values, panel load–span tables and clip capacities — each with where it came from."
      />

      {orgs.length === 0 ? (
        <Notice tone="info" title="You are not a member of a firm, so there is no firm library to show." />
      ) : (
        <>
          <FirmPicker firms={orgs} value={org?.id} onChange={(id) => setChosen(id)} />
          {org && !mayWrite ? (
            <Notice
              tone="info"
              title={`Your role in ${org.name} is ${FIRM_ROLE_LABELS[org.role]}: you read the firm's library and use it in checks; its editors and administrators add to it.`}
            />
          ) : null}

          <LibrarySection
            title={<>χ and ψ values — {org?.name}</>}
            intro={
              <>
                Clips and brackets (point bridges χ) and girts and rails (linear bridges ψ), as tested or
                published. The builder offers them on every clip and girt.
                {isAdmin ? '' : ' Firm administrators can remove entries.'}
              </>
            }
          >
            <Loaded query={bridgeValues} what="Loading the firm's χ and ψ values">
              {(data) => <BridgeValuesTable orgId={org!.id} values={data} isAdmin={isAdmin} />}
            </Loaded>
            {org && mayWrite ? <AddBridgeValueForm orgId={org.id} /> : null}
          </LibrarySection>

          <LibrarySection
            title={<>Panel tables and clips — {org?.name}</>}
            intro={
              <>
                The makers’ load–span tables and clip capacities (ASD) for the wind attachment check, each
                with its source and, once uploaded, the data sheet itself. The Attachment &amp; wind page of
                every assembly offers them. The manufacturer’s current tested values govern.
              </>
            }
          >
            <Loaded query={products} what="Loading the firm's panel tables and clips">
              {(data) => (
                <AttachmentProductsTable
                  orgId={org!.id}
                  products={data}
                  isAdmin={isAdmin}
                  mayWrite={mayWrite}
                />
              )}
            </Loaded>
          </LibrarySection>

          <LibrarySection
            title={<>Materials — {org?.name}</>}
            intro={
              <>Product values from data sheets and test reports; they override the generic values below.</>
            }
          >
            <Loaded query={materials} what="Loading the firm's materials">
              {(data) => <FirmMaterialsTable orgId={org!.id} materials={data} isAdmin={isAdmin} />}
            </Loaded>
            {org && mayWrite ? <AddFirmMaterialForm orgId={org.id} /> : null}
          </LibrarySection>

          <LibrarySection
            title={<>Inspection checklist — {org?.name}</>}
            intro={
              <>
                The firm’s own items, added after the generated ones to every new inspection of its projects:
                each is looked at on the wall and passed, failed or marked not applicable. Versioned like the
                code tables: an inspection keeps the version it was made with.
              </>
            }
          >
            <Loaded query={checklist} what="Loading the firm's inspection checklist">
              {(data) => (
                <InspectionTemplateEditor key={org!.id} orgId={org!.id} template={data} mayWrite={mayWrite} />
              )}
            </Loaded>
          </LibrarySection>
        </>
      )}

      <LibrarySection
        title="Generic materials"
        intro={
          <>
            Design values for early checks only; a product's declared value overrides them. Each row names the
            table it belongs to and whether it has been checked against that table.
          </>
        }
      >
        <Loaded query={reference} what="Loading the generic materials">
          {(data) => <GenericMaterialsTable materials={data} />}
        </Loaded>
      </LibrarySection>
    </div>
  );
}

/** A part of the library: its heading with what it holds in a line under it, ruled, then its table. */
function LibrarySection({
  title,
  intro,
  children,
}: {
  title: ReactNode;
  intro: ReactNode;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="flex flex-col gap-4">
      <div className="border-b border-ink pb-1">
        <h2 id={id} className="text-2xl">
          {title}
        </h2>
        <p className="text-sm text-ink-muted">{intro}</p>
      </div>
      {children}
    </section>
  );
}
