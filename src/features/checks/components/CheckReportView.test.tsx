import { demoAssembly, demoProject, criteriaRow as row } from '@shared/checks/fixtures';
import { runChecks } from '@shared/checks/runner';
import type { CheckRun } from '@shared/schemas/check-runs';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { CheckReportView } from './CheckReportView';

afterEach(cleanup);

/** A stored run as the page reads it: the demo wall against two thermal rows (fields the page does not read are left out). */
function run(rows = [row('max_u_factor', 0.35), row('min_effective_r', 3)]): CheckRun {
  const outputs = runChecks(demoAssembly(), demoProject(), rows);
  return {
    id: '00000000-0000-4000-8000-000000000009',
    assemblyName: 'Demo wall',
    assemblyRevision: 1,
    createdAt: '2026-12-04T12:00:00Z',
    createdBy: 'Tester',
    hash: 'a'.repeat(64),
    engineVersion: '0.3.0',
    inputs: { criteriaSet: { name: 'Table', version: 1, edition: '', categoryLabels: {} } },
    outputs,
  } as unknown as CheckRun;
}

describe('Check report', () => {
  it('names the method that decides each thermal row, with its reason and the other methods', () => {
    render(<CheckReportView run={run()} system="SI" />);
    const methods = screen.getAllByTestId('check-method');
    expect(methods).toHaveLength(2);
    for (const m of methods) {
      expect(m.textContent).toContain('Method: Energy-code path for steel framing (ASHRAE 90.1 Appendix A)');
      expect(m.textContent).toMatch(/Table A9\.2-2/);
      expect(m.textContent).toMatch(/Beside it: Parallel path \(ASHRAE\) .*Zone method for metal framing/);
    }
  });

  it('words each reason from its message in the person’s units, and a run stored with words as it was', () => {
    const r = run([row('max_u_factor', 0.35), row('max_surface_rh', 0.8)]);
    const rh = r.outputs.checks.find((c) => c.id === 'criterion.max_surface_rh')!;
    expect(rh.reason).toMatchObject({ code: 'surface_rh_highest' });
    const { container } = render(<CheckReportView run={r} system="IP" />);
    // Rsi = 0.25 m²·K/W is 1.42 h·ft²·°F/Btu (1 h·ft²·°F/Btu = 0.176 110 m²·K/W, NIST SP 811 [memory]), one decimal in IP.
    expect(container.querySelector('[data-check="criterion.max_surface_rh"]')?.textContent).toContain(
      'Rsi = 1.4\u202fh·ft²·°F/Btu',
    );
    cleanup();
    const u = r.outputs.checks.find((c) => c.id === 'criterion.max_u_factor')!;
    u.reason = 'Words a run stored before messages became data.';
    const old = render(<CheckReportView run={r} system="SI" />);
    expect(old.container.querySelector('[data-check="criterion.max_u_factor"]')?.textContent).toContain(
      'Words a run stored before messages became data.',
    );
  });
});
