import { CalcInputError } from '@shared/calc/errors';
import { calculateMoisture } from '@shared/calc/moisture/monthly';
import {
  type MoistureInput,
  type MoistureResult,
  moistureInputSchema,
  type Vapour,
} from '@shared/calc/moisture/schema';
import { moistureInputFor, type ProjectForChecks } from '@shared/checks/inputs';
import { type EngineMessage, messageText, sentence } from '@shared/format';
import type { AssemblyInput } from '@shared/schemas/assembly';

/*
 * Runs the shared moisture engine in the browser on the vapour data as typed. The result, or every reason it
 * cannot be computed — each tied to where it is put right: a vapour row on this page, a layer of the
 * build-up, or the project's climate — in words, never a NaN.
 */

/** Where a reason is put right. */
export type Where =
  | { kind: 'vapour'; layer: number }
  | { kind: 'buildup'; layer: number | null }
  | { kind: 'climate' }
  | { kind: 'indoor' }
  | { kind: 'other' };

export interface Problem {
  where: Where;
  /** What is wrong or missing, in a practitioner's words. */
  text: string;
  /** What it is about, when the text does not say: "Layer 7 (Polyethylene film)". */
  subject?: string;
  /** The engine's message code, when the problem is one of its messages (e.g. `vapour_missing`). */
  code?: EngineMessage['code'];
}

export type MoistureEvaluation =
  | { status: 'ready'; input: MoistureInput; result: MoistureResult }
  | { status: 'blocked'; problems: Problem[] };

/** An engine or schema path (`layers.6.vapour.mu`, `months.3.exteriorTemperature`) → where to fix it. */
export function whereOf(path: string): Where {
  const parts = path.split('.');
  if (parts[0] === 'layers' && parts[1] !== undefined && /^\d+$/.test(parts[1])) {
    const layer = Number(parts[1]);
    return parts[2] === 'vapour' ? { kind: 'vapour', layer } : { kind: 'buildup', layer };
  }
  if (parts[0] === 'layers' || parts[0] === 'heatFlow') return { kind: 'buildup', layer: null };
  if (parts[0] === 'months') return { kind: 'climate' };
  if (parts[0] === 'interior') return parts[1] === 'humidityClass' ? { kind: 'climate' } : { kind: 'indoor' };
  return { kind: 'other' };
}

/** The items of `moistureInputFor`'s missing list, tied to where each is entered (by code, never by words). */
export function whereMissing(item: EngineMessage): Where {
  if (item.code === 'vapour_missing') return { kind: 'vapour', layer: item.values.layer };
  if (item.code === 'climate_missing') return { kind: 'climate' };
  return { kind: 'other' };
}

/** Layer index of a problem for ordering; problems not about a layer come after the layers. */
const layerOf = (p: Problem) =>
  (p.where.kind === 'vapour' || p.where.kind === 'buildup') && p.where.layer !== null ? p.where.layer : 1000;

const MONTHS = 'January February March April May June July August September October November December'.split(
  ' ',
);

function describeSchemaIssue(path: string, code: string | undefined, message: string): string {
  const month = /^months\.(\d+)\.(\w+)/.exec(path);
  if (month) {
    const name = MONTHS[Number(month[1])] ?? `Month ${Number(month[1]) + 1}`;
    const what = month[2] === 'exteriorTemperature' ? 'exterior temperature' : 'exterior relative humidity';
    return `${name}: ${what} — ${message}`;
  }
  return code === 'invalid_type' ? `${path}: enter a value` : `${path}: ${message}`;
}

/**
 * The moisture result of an assembly whose vapour list is `vapour`, against the project's climate and
 * indoor conditions. `rowErrors` are the vapour rows that could not be read as typed.
 */
export function evaluateMoisture(
  assembly: AssemblyInput,
  vapour: readonly (Vapour | null)[],
  rowErrors: Readonly<Record<number, string>>,
  project: ProjectForChecks,
): MoistureEvaluation {
  const layerName = (i: number) => `Layer ${i + 1} (${assembly.thermal.layers[i]?.name ?? '?'})`;
  /** Reasons about a layer name the layer; the list is ordered outside → inside. */
  const named = (list: Problem[]): Problem[] =>
    list
      .map((p) =>
        (p.where.kind === 'vapour' || p.where.kind === 'buildup') &&
        p.where.layer !== null &&
        p.code !== 'vapour_missing'
          ? { ...p, subject: layerName(p.where.layer) }
          : p,
      )
      .sort((a, b) => layerOf(a) - layerOf(b));
  const problems: Problem[] = Object.entries(rowErrors).map(([i, text]) => ({
    where: { kind: 'vapour', layer: Number(i) },
    text,
  }));
  const built = moistureInputFor({ ...assembly, vapour: [...vapour] }, project);
  if (built.status === 'missing') {
    for (const item of built.missing) {
      const where = whereMissing(item);
      // A row already reported as unreadable is not "missing" as well.
      if (where.kind === 'vapour' && rowErrors[where.layer] !== undefined) continue;
      problems.push({ where, text: sentence(messageText(item)), code: item.code });
    }
  }
  if (problems.length > 0 || built.status !== 'ready')
    return { status: 'blocked', problems: named(problems) };

  const parsed = moistureInputSchema.safeParse(built.input);
  if (!parsed.success) {
    return {
      status: 'blocked',
      problems: named(
        parsed.error.issues.map((issue) => {
          const path = issue.path.map(String).join('.');
          return {
            where: whereOf(path),
            text: sentence(describeSchemaIssue(path, issue.code, issue.message)),
          };
        }),
      ),
    };
  }
  try {
    return { status: 'ready', input: parsed.data, result: calculateMoisture(parsed.data) };
  } catch (e) {
    if (e instanceof CalcInputError)
      return { status: 'blocked', problems: named([{ where: whereOf(e.field), text: sentence(e.reason) }]) };
    return {
      status: 'blocked',
      problems: [
        {
          where: { kind: 'other' },
          text: e instanceof Error ? sentence(e.message) : 'The calculation failed.',
        },
      ],
    };
  }
}
