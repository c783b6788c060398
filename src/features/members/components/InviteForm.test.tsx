import type { ProjectRole } from '@shared/auth/permissions';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { InviteForm } from './InviteForm';

afterEach(cleanup);

const offered = (myRole: ProjectRole) => {
  render(
    <QueryClientProvider client={new QueryClient()}>
      <InviteForm projectId="p1" myRole={myRole} />
    </QueryClientProvider>,
  );
  return within(screen.getByLabelText(/Role on this project/))
    .getAllByRole('option')
    .map((o) => o.textContent);
};

describe('InviteForm roles', () => {
  it('offers an owner every role', () => {
    expect(offered('owner')).toEqual([
      'Owner / admin',
      'Architect',
      'Envelope consultant',
      'Engineer',
      'Cladding subcontractor',
      'Viewer',
    ]);
  });

  it('offers an architect only the roles an architect may grant: no owner, no subcontractor', () => {
    expect(offered('architect')).toEqual(['Architect', 'Envelope consultant', 'Engineer', 'Viewer']);
  });
});
