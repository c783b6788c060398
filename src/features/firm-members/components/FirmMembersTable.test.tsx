import type { FirmMember } from '@shared/schemas/firm-members';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { FirmMembersTable } from './FirmMembersTable';

afterEach(cleanup);

const members: FirmMember[] = [
  { userId: 'u-admin', name: 'Ada Admin', email: 'ada@firm.example', role: 'admin', since: '2026-01-01' },
  { userId: 'u-read', name: 'Rae Reader', email: 'rae@firm.example', role: 'reader', since: '2026-01-02' },
];

const renderAs = (isAdmin: boolean, myUserId: string) =>
  render(
    <QueryClientProvider client={new QueryClient()}>
      <FirmMembersTable orgId="o1" firmName="Firm" members={members} isAdmin={isAdmin} myUserId={myUserId} />
    </QueryClientProvider>,
  );

describe('FirmMembersTable', () => {
  it('lets an administrator change and remove others, never their own row', () => {
    renderAs(true, 'u-admin');
    const select = screen.getByLabelText('Firm role for Rae Reader') as HTMLSelectElement;
    expect([...select.options].map((o) => o.textContent)).toEqual(['Firm administrator', 'Editor', 'Reader']);
    expect(select.value).toBe('reader');
    expect(screen.queryByLabelText('Firm role for Ada Admin')).toBeNull();
    expect(screen.getAllByRole('button', { name: /^Remove from the firm/ })).toHaveLength(1);
  });

  it('shows a reader everyone’s firm role and no actions', () => {
    renderAs(false, 'u-read');
    expect(screen.getByText('Firm administrator')).toBeTruthy();
    expect(screen.getByText('(you)')).toBeTruthy();
    expect(screen.queryByRole('combobox')).toBeNull();
    expect(screen.queryByRole('button')).toBeNull();
  });
});
