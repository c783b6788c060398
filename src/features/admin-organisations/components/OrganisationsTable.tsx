import type { AdminOrganisation } from '@shared/schemas/organisations';
import { InlineConfirm } from '../../../components/ui/InlineConfirm';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { formatDate } from '../../../lib/format';
import { useSetVerification } from '../api/set-verification';

/**
 * Every firm with its handle and standing. Firms of one name come side by side and are marked, since a
 * copy takes an existing firm's name; verifying (or withdrawing it) asks to be confirmed first.
 */
export function OrganisationsTable({ organisations }: { organisations: AdminOrganisation[] }) {
  const count = new Map<string, number>();
  for (const o of organisations) count.set(o.name.toLowerCase(), (count.get(o.name.toLowerCase()) ?? 0) + 1);
  return (
    <Table caption={`${organisations.length} firm${organisations.length === 1 ? '' : 's'}`}>
      <thead>
        <tr>
          <Th>Firm and handle</Th>
          <Th>Standing</Th>
          <Th>
            <span className="sr-only">Verify or withdraw</span>
          </Th>
          <Th numeric>People</Th>
          <Th>Created</Th>
        </tr>
      </thead>
      <tbody>
        {organisations.map((o) => (
          <OrganisationRow key={o.id} firm={o} sameName={(count.get(o.name.toLowerCase()) ?? 0) > 1} />
        ))}
      </tbody>
    </Table>
  );
}

function OrganisationRow({ firm, sameName }: { firm: AdminOrganisation; sameName: boolean }) {
  const mutation = useSetVerification();
  const verified = firm.verifiedAt !== null;

  return (
    <tr data-firm={firm.handle}>
      <Td className="min-w-44">
        <span className="font-semibold">{firm.name}</span>
        <span className="num block break-all">{firm.handle}</span>
        {sameName ? (
          <span className="block text-xs text-warning">
            <span aria-hidden="true">▲ </span>another firm has this name
          </span>
        ) : null}
      </Td>
      <Td className="min-w-32">
        {verified ? (
          <span className="text-meets">
            <span aria-hidden="true">✓ </span>verified {formatDate(firm.verifiedAt!)}
            {firm.verifiedBy ? ` by ${firm.verifiedBy}` : ''}
          </span>
        ) : (
          <span className="text-ink-muted">not verified</span>
        )}
      </Td>
      <Td className="min-w-56">
        <InlineConfirm
          opener={verified ? 'Withdraw…' : 'Verify…'}
          who={firm.handle}
          question={
            verified
              ? `Withdraw the verification of ${firm.handle}? Its sheets, those already handed out too, will show “issuer not verified”.`
              : `Verify ${firm.handle}? Only when you have confirmed, outside Skinwright, that it is “${firm.name}”. Its sheets will show it as verified.`
          }
          confirmLabel={
            <>
              {verified ? 'Withdraw' : 'Verify'}
              <span className="sr-only"> {firm.handle}</span>
            </>
          }
          confirmVariant={verified ? 'danger' : 'primary'}
          busy={mutation.isPending}
          busyLabel={verified ? 'Withdrawing…' : 'Verifying…'}
          cancelLabel="Cancel"
          onConfirm={(close) =>
            mutation.mutate({ orgId: firm.id, verified: !verified }, { onSuccess: close })
          }
          className="flex flex-col items-start gap-2"
        />
        {mutation.isError ? (
          <p role="alert" className="mt-1 text-xs text-caution">
            {errorMessage(mutation.error)}
          </p>
        ) : null}
      </Td>
      <Td numeric>{firm.members}</Td>
      <Td className="whitespace-nowrap">{formatDate(firm.createdAt)}</Td>
    </tr>
  );
}
