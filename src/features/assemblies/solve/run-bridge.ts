import { solveBridge } from '@shared/calc/bridge/bridge';
import type { ComputedBridge } from '@shared/calc/bridge/computed';
import { surfaceCheck } from '@shared/calc/bridge/detail';
import { type BridgeModelInput, type BridgeResult, bridgeModelSchema } from '@shared/calc/bridge/schema';
import { type Section, sectionOf } from '@shared/calc/bridge/section';
import { CalcInputError } from '@shared/calc/errors';

import type { BridgeRunner } from './runners';

/** A finished solve: the result without its field, and the section the map draws. */
export type Solved = {
  result: Omit<BridgeResult, 'field'>;
  section: Section | null;
  /** The same model with Rsi = 0.25 m²·K/W inside: f_Rsi for the ISO 13788 surface check. */
  surface: ComputedBridge['surface'] | null;
};
/** What comes back from a solve: the answer, or why the model was refused (a template or solver field). */
export type SolveOutcome = { ok: true; solved: Solved } | { ok: false; field: string; reason: string };

/**
 * Solve one model and keep only what the dialog shows (the 3-D field stays here, its section goes); then once
 * more with Rsi = 0.25 m²·K/W inside for the surface-humidity check.
 */
export function runBridge(model: BridgeModelInput): SolveOutcome {
  try {
    const result = solveBridge(bridgeModelSchema.parse(model));
    const { field: _field, ...rest } = result;
    const surface = result.fRsi === null ? null : surfaceCheck(model);
    return { ok: true, solved: { result: rest, section: sectionOf(result), surface } };
  } catch (e) {
    if (e instanceof CalcInputError) return { ok: false, field: e.field, reason: e.reason };
    return { ok: false, field: 'model', reason: e instanceof Error ? e.message : String(e) };
  }
}

/** On this thread (tests): the same outcome, after a tick so that the "solving" state is seen. */
export const directRunner: BridgeRunner = (model) => ({
  outcome: new Promise((resolve) => setTimeout(() => resolve(runBridge(model)), 0)),
  cancel: () => {},
});
