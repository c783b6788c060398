import { canInFirm, FIRM_ROLE_LABELS } from '@shared/auth/permissions';
import { useState } from 'react';
import { Button } from '../../components/ui/Button';
import { Loaded } from '../../components/ui/Loaded';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { useCriteriaSets } from '../../features/criteria/api/get-criteria-sets';
import { CriteriaSetTable } from '../../features/criteria/components/CriteriaSetTable';
import { NewCriteriaSetForm } from '../../features/criteria/components/NewCriteriaSetForm';
import { useMe } from '../../features/me/api/get-me';
import { FirmPicker } from '../../features/me/components/FirmPicker';
import { firmOf } from '../../features/me/firm';

/** The firm's code tables: the criteria its adopted code sets, entered by the firm, one table per code. */
export function CodeTablesPage() {
  const me = useMe();
  const orgs = me.data?.organisations ?? [];
  const [chosen, setChosen] = useState<string | undefined>(undefined);
  const [adding, setAdding] = useState(false);
  const org = firmOf(me.data, chosen);
  const sets = useCriteriaSets(org?.id);
  // The firm's editors and administrators write its tables (the server enforces the same).
  const mayWrite = canInFirm(org?.role, 'firm.write');

  return (
    <div className="flex flex-col gap-8">
      <title>Code tables · Skinwright</title>
      <PageHeader
        eyebrow="Criteria"
        title="Code tables"
        description="Jurisdictions adopt different editions and amendments, so Skinwright does not supply “the code”: your firm enters the values its adopted code requires, by climate zone and wall category, and every check run compares an assembly with them."
        actions={
          org && mayWrite && !adding ? (
            <Button variant="primary" onClick={() => setAdding(true)}>
              New code table
            </Button>
          ) : null
        }
      />
      {orgs.length === 0 ? (
        <Notice
          tone="info"
          title="You are not a member of a firm, so there are no code tables of yours to show."
        >
          <p>Tables of a firm whose project you work on open from that project’s check pages.</p>
        </Notice>
      ) : (
        <>
          <FirmPicker firms={orgs} value={org?.id} onChange={(id) => setChosen(id)} />
          {org && !mayWrite ? (
            <p className="text-sm text-ink-muted">
              Your role in {org.name} is {FIRM_ROLE_LABELS[org.role]}: you read its code tables and check
              against them; its editors and administrators write them.
            </p>
          ) : null}
          {adding && mayWrite && org ? (
            <section aria-labelledby="new-table" className="flex flex-col gap-3 border-b border-rule pb-8">
              <h2 id="new-table" className="text-2xl">
                New code table for {org.name}
              </h2>
              <NewCriteriaSetForm orgId={org.id} />
              <div>
                <Button variant="quiet" onClick={() => setAdding(false)}>
                  Cancel
                </Button>
              </div>
            </section>
          ) : null}
          <Loaded
            query={sets}
            what="Loading the code tables"
            empty={
              <p className="text-ink-muted">
                No code table yet. Create one and enter the values your adopted code sets.
              </p>
            }
          >
            {(data) => <CriteriaSetTable sets={data} caption={`Code tables of ${org?.name}`} />}
          </Loaded>
        </>
      )}
    </div>
  );
}
