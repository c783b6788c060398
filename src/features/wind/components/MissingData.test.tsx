import { windInputFor } from '@shared/checks/inputs';
import { cleanup, render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { afterEach, describe, expect, it } from 'vitest';
import { evaluateAttachment } from '../evaluate';
import { attachmentFormValues } from '../form';
import { demoAssembly, demoProject } from '../test-fixtures';
import { MissingData } from './MissingData';

afterEach(cleanup);

const PROJECT = '00000000-0000-4000-8000-000000000001';

describe('the list of what the schedule still needs', () => {
  it('names each missing item in plain words and links to where it is entered', () => {
    const bare = { ...demoAssembly(), windPanel: undefined };
    const ready = windInputFor(bare, demoProject(false));
    if (ready.status !== 'missing') throw new Error('expected missing data');
    render(
      <MemoryRouter>
        <MissingData projectId={PROJECT} missing={ready.missing} site={[]} errors={{}} />
      </MemoryRouter>,
    );
    expect(screen.getByText(/No schedule yet/)).toBeTruthy();
    const wind = screen.getByRole('link', { name: 'the project’s wind data' });
    expect(wind.getAttribute('href')).toBe(`/projects/${PROJECT}/wind`);
    const panel = screen.getByRole('link', { name: 'the panel’s load–span table and clip capacity' });
    expect(panel.getAttribute('href')).toBe('#panel-heading');
  });

  it('lists the values on the page that are not accepted, each linked to its box', () => {
    const a = demoAssembly();
    const values = attachmentFormValues(a);
    values.rows[1] = { ...values.rows[1]!, span: 0.5 };
    values.girtSpacing = Number.NaN;
    const e = evaluateAttachment(values, a, demoProject(), 'SI');
    // The engine refuses the table, so there is no schedule; the unreadable design spacing is named too.
    expect(e.result).toBeNull();
    render(
      <MemoryRouter>
        <MissingData projectId={PROJECT} missing={e.missing} site={e.site} errors={e.errors} />
      </MemoryRouter>,
    );
    const girt = screen.getByRole('link', { name: 'Design girt spacing' });
    expect(girt.getAttribute('href')).toBe('#wind-girtSpacing');
    const span = screen.getByRole('link', { name: 'Load–span table, row 2: span' });
    expect(span.getAttribute('href')).toBe('#wind-rows-1-span');
    expect(span.parentElement?.textContent).toMatch(/spans must increase/i);
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('sends a problem with the project’s height to its site data', () => {
    const a = demoAssembly();
    const tall = { ...demoProject(), buildingHeightM: 200 };
    const e = evaluateAttachment(attachmentFormValues(a), a, tall, 'SI');
    expect(e.site).toHaveLength(1);
    render(
      <MemoryRouter>
        <MissingData projectId={PROJECT} missing={e.missing} site={e.site} errors={e.errors} />
      </MemoryRouter>,
    );
    expect(screen.getByText(/Mean roof height h: Must be at most 152\.4\sm/)).toBeTruthy();
    expect(screen.getByRole('link', { name: /correct the project’s site data/ }).getAttribute('href')).toBe(
      `/projects/${PROJECT}?edit=1`,
    );
  });
});
