import type { JointScheduleResult } from '@shared/calc/joints/schema';
import type { MoistureResult } from '@shared/calc/moisture/schema';
import type { ThermalResult } from '@shared/calc/thermal/schema';
import type { TraceStep } from '@shared/calc/trace';
import type { WindScheduleResult } from '@shared/calc/wind/schema';
import type { ModuleOutcome } from '@shared/checks/report';
import type { CheckRun } from '@shared/schemas/check-runs';
import type { SheetIssuer } from '@shared/schemas/sheets';
import type { SavedSweep } from '@shared/schemas/sweeps';
import type { UnitSystem } from '@shared/units';

/** Everything one sheet prints: the stored run as it is, plus who issued it and how to verify it. */
export interface SheetData {
  run: CheckRun;
  /** Labels of the project that the run's snapshot does not carry. */
  project: { number: string; siteAddress: string };
  preparedBy: string | null;
  /** The issuing firm: its name, unique handle and whether it is verified as the sheet is printed. */
  issuer: SheetIssuer;
  /** Verification code (10 base32 characters) and the public address that confirms it. */
  code: string;
  verifyUrl: string;
  units: UnitSystem;
  /** A saved sweep of the same assembly, printed as an appendix. */
  sweep?: SavedSweep;
}

/** The result each module stores in a run, by its id. */
export interface ModuleResults {
  thermal: ThermalResult;
  moisture: MoistureResult;
  wind: WindScheduleResult;
  joints: JointScheduleResult;
}

/** The result a module stored in the run, typed by its id; null when the module did not run. */
export function moduleResult<K extends keyof ModuleResults>(run: CheckRun, id: K): ModuleResults[K] | null {
  const m = run.outputs.modules.find((x) => x.id === id);
  return m && m.status === 'ran' ? (m.result as ModuleResults[K]) : null;
}

export const moduleOutcome = (run: CheckRun, id: string): ModuleOutcome | undefined =>
  run.outputs.modules.find((x) => x.id === id);

/** A trace step of the run by id (report steps first, then the module's own trace). */
export function stepOf(run: CheckRun, id: string): TraceStep | undefined {
  const inReport = run.outputs.steps.find((s) => s.id === id);
  if (inReport) return inReport;
  for (const m of run.outputs.modules) {
    const trace = (m.result as { trace?: TraceStep[] } | null)?.trace;
    const found = trace?.find((s) => s.id === id);
    if (found) return found;
  }
  return undefined;
}
