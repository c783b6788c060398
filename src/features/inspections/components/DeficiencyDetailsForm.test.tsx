import type { Deficiency, Inspection } from '@shared/inspections/schema';
import type { Member } from '@shared/schemas/members';
import { QueryClient, QueryClientProvider, skipToken, useQuery } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { inspectionKeys } from '../../../lib/query-keys';
import { DeficiencyDetailsForm, ownerChoices } from './DeficiencyDetailsForm';
import { DueMark } from './StateMark';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const PROJECT = '00000000-0000-4000-8000-0000000000a1';
const INSPECTION = '00000000-0000-4000-8000-0000000000b1';
const member = (userId: string, name: string, role: Member['role']): Member => ({
  id: `00000000-0000-4000-8000-${userId.padStart(12, '0')}`,
  userId,
  name,
  email: `${userId}@example.test`,
  organisationName: null,
  role,
});
const members = [
  member('11', 'Sam Crew', 'subcontractor'),
  member('12', 'Kim Inspector', 'envelope_consultant'),
];

const deficiency: Deficiency = {
  id: '00000000-0000-4000-8000-0000000000d1',
  inspectionId: INSPECTION,
  itemId: '00000000-0000-4000-8000-0000000000c1',
  itemLabel: 'Clip spacing',
  number: 1,
  state: 'open',
  description: 'Clips too far apart',
  ownerId: '11',
  ownerName: 'Sam Crew',
  dueDate: '2027-01-15',
  correctionPhotoId: null,
  note: '',
  version: 1,
  createdAt: '2027-01-01T00:00:00.000Z',
  updatedAt: '2027-01-01T00:00:00.000Z',
};

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

/** The form fed from the cached inspection, as the page is (a 409 puts theirs there). */
function Harness() {
  const { data } = useQuery<Inspection>({ queryKey: inspectionKeys.detail(INSPECTION), queryFn: skipToken });
  const d = data?.deficiencies[0];
  return d ? <DeficiencyDetailsForm projectId={PROJECT} inspectionId={INSPECTION} deficiency={d} /> : null;
}

function renderForm(answerPut: (body: Record<string, unknown>) => Response) {
  const client = new QueryClient({
    defaultOptions: { mutations: { retry: false }, queries: { retry: false } },
  });
  client.setQueryData(inspectionKeys.detail(INSPECTION), {
    deficiencies: [deficiency],
  } as unknown as Inspection);
  const fetch = vi.fn(async (url: string, init?: RequestInit) =>
    url.endsWith('/members')
      ? json({ members, invitations: [] })
      : answerPut(JSON.parse(String(init?.body)) as Record<string, unknown>),
  );
  vi.stubGlobal('fetch', fetch);
  render(
    <QueryClientProvider client={client}>
      <Harness />
    </QueryClientProvider>,
  );
  return fetch;
}

describe('ownerChoices', () => {
  it('lists the members, and keeps an owner who has since left the project', () => {
    expect(ownerChoices(members, deficiency).map((o) => o.id)).toEqual(['11', '12']);
    expect(ownerChoices(members, { ownerId: '99', ownerName: 'Gone' })[0]).toEqual({
      id: '99',
      text: 'Gone',
    });
  });
});

describe('DueMark', () => {
  it('says overdue in a glyph and words when past due and not accepted', () => {
    render(<DueMark deficiency={deficiency} today="2027-01-16" />);
    expect(screen.getByTestId('deficiency-due').textContent).toBe('due 2027-01-15⚠overdue');
    cleanup();
    render(<DueMark deficiency={{ ...deficiency, state: 'accepted' }} today="2027-01-16" />);
    expect(screen.getByTestId('deficiency-due').textContent).toBe('due 2027-01-15');
    cleanup();
    render(<DueMark deficiency={{ ...deficiency, dueDate: null }} />);
    expect(screen.getByText('no due date')).toBeTruthy();
  });
});

describe('DeficiencyDetailsForm', () => {
  it('starts from the owner the server set and sends owner, due date and description with the version', async () => {
    const fetch = renderForm((body) =>
      json({ ...deficiency, ...body, ownerName: 'Kim Inspector', version: 2 }),
    );
    const owner = (await screen.findByLabelText('Owner')) as HTMLSelectElement;
    expect(owner.value).toBe('11');
    fireEvent.change(owner, { target: { value: '12' } });
    fireEvent.change(screen.getByLabelText('Due'), { target: { value: '2027-02-01' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save owner and due date' }));
    await screen.findByText('Saved');
    const put = fetch.mock.calls.find(([, init]) => init?.method === 'PUT');
    expect(JSON.parse(String(put?.[1]?.body))).toEqual({
      version: 1,
      ownerId: '12',
      dueDate: '2027-02-01',
      description: 'Clips too far apart',
    });
  });

  it('a stale save shows the app’s conflict wording and their version, not the edit', async () => {
    const theirs = { ...deficiency, dueDate: '2027-03-01', version: 2 };
    renderForm(() =>
      json({ error: { code: 'version_conflict', message: 'Changed meanwhile.' }, current: theirs }, 409),
    );
    fireEvent.change(await screen.findByLabelText('Due'), { target: { value: '2027-02-01' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save owner and due date' }));
    await screen.findByText('Someone changed this deficiency after you opened it.');
    expect(
      screen.getByText(
        'The page now shows their version; your edit was not saved. Make it again on top of theirs.',
      ),
    ).toBeTruthy();
    await waitFor(() => expect((screen.getByLabelText('Due') as HTMLInputElement).value).toBe('2027-03-01'));
  });
});
