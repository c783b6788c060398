import type { ProjectRole } from '@shared/auth/permissions';
import type { Member } from '@shared/schemas/members';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { MembersTable } from './MembersTable';

afterEach(cleanup);

const members: Member[] = [
  {
    id: '00000000-0000-4000-8000-000000000001',
    userId: 'u-owner',
    name: 'Olive Owner',
    email: 'olive@arch.example',
    organisationName: 'Arch & Co',
    role: 'owner',
  },
  {
    id: '00000000-0000-4000-8000-000000000002',
    userId: 'u-eng',
    name: 'Ernest Engineer',
    email: 'ernest@struct.example',
    organisationName: 'Struct Ltd',
    role: 'engineer',
  },
];

function renderAs(myRole: ProjectRole, myUserId: string) {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <MembersTable projectId="p1" members={members} myRole={myRole} myUserId={myUserId} />
    </QueryClientProvider>,
  );
}

describe('MembersTable permissions', () => {
  it('offers role changes and removal to an owner, but not on their own row', () => {
    renderAs('owner', 'u-owner');
    expect(screen.getAllByRole('button', { name: /^Remove…/ })).toHaveLength(1);
    expect(screen.getByLabelText('Role for Ernest Engineer')).toBeTruthy();
    expect(screen.queryByLabelText('Role for Olive Owner')).toBeNull();
  });

  it('offers an owner every role in a member’s role select', () => {
    renderAs('owner', 'u-owner');
    const options = screen.getByLabelText('Role for Ernest Engineer').querySelectorAll('option');
    expect(options).toHaveLength(6);
  });

  it.each<ProjectRole>(['architect', 'engineer', 'subcontractor', 'viewer'])(
    'hides member management from a %s',
    (role) => {
      renderAs(role, 'u-eng');
      expect(screen.getByText('Ernest Engineer')).toBeTruthy();
      expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
      expect(screen.queryByRole('combobox')).toBeNull();
      expect(screen.getAllByRole('columnheader')).toHaveLength(4);
    },
  );
});
