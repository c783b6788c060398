import type { BridgeDetailInput } from './computed';
import { edgeModel } from './edges';
import type { BridgeModelInput } from './schema';
import { clipModel, fastenerModel, girtModel } from './templates';

/** The solver model of a detail (throws `CalcInputError` naming the template field for impossible inputs). */
export function detailModel(d: BridgeDetailInput): BridgeModelInput {
  if (d.template === 'girt') return girtModel(d.input);
  if (d.template === 'clip') return clipModel(d.input);
  if (d.template === 'fastener') return fastenerModel(d.input);
  return edgeModel(d.input);
}
