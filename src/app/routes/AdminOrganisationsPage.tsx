import { useState } from 'react';
import { Field } from '../../components/ui/Field';
import { Loaded } from '../../components/ui/Loaded';
import { PageHeader } from '../../components/ui/PageHeader';
import { TextInput } from '../../components/ui/TextInput';
import { useOrganisations } from '../../features/admin-organisations/api/get-organisations';
import { OrganisationsTable } from '../../features/admin-organisations/components/OrganisationsTable';

/** Site administration: every firm, and verifying who a firm is (its sheets and verification page show it). */
export function AdminOrganisationsPage() {
  const firms = useOrganisations();
  const [filter, setFilter] = useState('');
  const needle = filter.trim().toLowerCase();
  return (
    <>
      <title>Firms · Skinwright</title>
      <PageHeader
        eyebrow="Site administration"
        title="Firms"
        description="Anyone can make a firm of any name, so a sheet names its issuer by the firm's handle too. Verify a firm once you have confirmed, outside Skinwright, that the account is the firm it names: its sheets and their verification page then say so."
      />
      <Loaded query={firms} what="Loading firms">
        {(data) => (
          <div className="flex flex-col gap-4">
            <Field label="Find a firm" hint="By name or handle." className="max-w-sm">
              {(c) => (
                <TextInput {...c} type="search" value={filter} onChange={(e) => setFilter(e.target.value)} />
              )}
            </Field>
            <OrganisationsTable
              organisations={data.filter(
                (o) => !needle || o.name.toLowerCase().includes(needle) || o.handle.includes(needle),
              )}
            />
          </div>
        )}
      </Loaded>
    </>
  );
}
