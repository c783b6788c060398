import { CalcInputError } from '@shared/calc/errors';
import { calculateWindSchedule } from '@shared/calc/wind/attachment';
import { checkDesignSpacing } from '@shared/calc/wind/design';
import {
  type DesignSpacings,
  type WindScheduleInput,
  type WindScheduleResult,
  windSiteSchema,
  type ZoneDesign,
} from '@shared/calc/wind/schema';
import { type ProjectForChecks, windDesignInputFor } from '@shared/checks/inputs';
import { type EngineMessage, sentence } from '@shared/format';
import { type AssemblyInput, attachmentSchema } from '@shared/schemas/assembly';
import type { UnitSystem } from '@shared/units';
import { issueWords, type ZodIssueLike } from '../../lib/issue-words';
import {
  type AttachmentFormValues,
  panelCandidate,
  panelIsBlank,
  panelSchemaFor,
  toFormPath,
  type WindPanel,
  withAttachment,
} from './form';
import { toShownWind, trimNumber, type WindMeasure, windUnit } from './units';

/** A problem with the project's data (not editable on this page), with where to put it right. */
export interface SiteProblem {
  /** Plain words: "Mean roof height h: must be at most 152.4 m". */
  text: string;
  /** Which project page fixes it. */
  where: 'wind' | 'site';
}

export interface AttachmentEvaluation {
  /** The engine input, when everything needed is there and valid. */
  input: WindScheduleInput | null;
  /** The engine's schedule; its trace is followed by the steps of the design-spacing check. */
  result: WindScheduleResult | null;
  /** The engine's check of the design spacings, zone by zone (`checkDesignSpacing`). */
  zones: ZoneDesign[];
  /** The panel as it would be saved (undefined while blank or invalid). */
  panel: WindPanel | undefined;
  design: DesignSpacings;
  /** Form path → reason, shown beside its field. */
  errors: Record<string, string>;
  /** What `windDesignInputFor` says is missing (messages, worded by shared/format). */
  missing: EngineMessage[];
  site: SiteProblem[];
}

/** Which quantity a form field holds, by the last segment of its path (to word range errors in the person's units). */
const FIELD_MEASURES: Record<string, WindMeasure> = {
  girtSpacing: 'span',
  clipSpacing: 'spacing',
  span: 'span',
  allowableInward: 'pressure',
  allowableOutward: 'pressure',
  allowableDeflectionPressure: 'pressure',
  allowableLoad: 'force',
  fastenerCapacity: 'force',
  fastenersPerClip: 'count',
  panelModuleWidth: 'spacing',
  continuityFactor: 'ratio',
  deflectionWindFactor: 'ratio',
};

const SITE_FIELDS: Record<string, { label: string; measure?: WindMeasure; where: SiteProblem['where'] }> = {
  edition: { label: 'ASCE 7 edition', where: 'wind' },
  basicWindSpeed: { label: 'Basic wind speed V', measure: 'speed', where: 'wind' },
  riskCategory: { label: 'Risk category', where: 'wind' },
  exposure: { label: 'Exposure category', where: 'wind' },
  Kzt: { label: 'Topographic factor K_zt', measure: 'ratio', where: 'wind' },
  groundElevation: { label: 'Ground elevation (site data)', measure: 'length', where: 'site' },
  enclosure: { label: 'Enclosure', where: 'wind' },
  roofSlopeDeg: { label: 'Roof slope θ', measure: 'angle', where: 'wind' },
  meanRoofHeight: { label: 'Mean roof height h', measure: 'length', where: 'site' },
  planLength: { label: 'Plan length', measure: 'length', where: 'site' },
  planWidth: { label: 'Plan width', measure: 'length', where: 'site' },
  heightOfComponent: { label: 'Height of the component', measure: 'length', where: 'site' },
};

type Issue = ZodIssueLike;

/** A zod issue in a practitioner's words (issue-words.ts), bounds in the person's units; table rows by name. */
export function issueText(issue: Issue, measure: WindMeasure | undefined, system: UnitSystem): string {
  if (issue.code === 'invalid_format') return 'Write it as L/ and a number, for example L/180.';
  if (issue.origin === 'array' && issue.code === 'too_small')
    return `Give at least ${String(issue.minimum)} rows.`;
  if (issue.origin === 'array' && issue.code === 'too_big') return `At most ${String(issue.maximum)} rows.`;
  return issueWords(issue, (si) => {
    if (!measure) return String(si);
    const unit = windUnit(measure, system);
    const shown = trimNumber(toShownWind(si, measure, system), 4);
    return unit === '' ? shown : unit === '°' ? `${shown}°` : `${shown}\u202f${unit}`;
  });
}

function collect(issues: Issue[], system: UnitSystem, out: Record<string, string>) {
  for (const issue of issues) {
    const raw = (issue.path ?? []).map(String).join('.');
    const path = toFormPath(raw);
    const last = String(issue.path?.[issue.path.length - 1] ?? '');
    const text = issueText(issue, FIELD_MEASURES[last], system);
    if (!(path in out)) out[path] = text;
  }
}

function optionalSpacing(
  value: number | null,
  key: 'girtSpacing' | 'clipSpacing',
  system: UnitSystem,
  errors: Record<string, string>,
): number | undefined {
  if (value === null) return undefined;
  if (Number.isNaN(value)) {
    errors[key] = 'Enter a number, or leave it empty until the spacing is chosen.';
    return undefined;
  }
  const parsed = attachmentSchema.shape[key].safeParse(value);
  if (!parsed.success) {
    errors[key] = issueText(parsed.error.issues[0] as Issue, FIELD_MEASURES[key], system);
    return undefined;
  }
  return parsed.data;
}

/**
 * Everything the page shows, computed in the browser from what the form holds right now: the engine's schedule,
 * the design-spacing checks, and — where it cannot compute — the reason, next to its field or in the list of
 * what is missing. Never a NaN.
 */
export function evaluateAttachment(
  values: AttachmentFormValues,
  assembly: AssemblyInput,
  project: ProjectForChecks,
  system: UnitSystem,
): AttachmentEvaluation {
  const errors: Record<string, string> = {};
  const design = {
    girtSpacing: optionalSpacing(values.girtSpacing, 'girtSpacing', system, errors),
    clipSpacing: optionalSpacing(values.clipSpacing, 'clipSpacing', system, errors),
  };
  for (const key of ['continuityFactor', 'deflectionWindFactor'] as const)
    if (values[key] !== null && Number.isNaN(values[key]))
      errors[key] = 'Enter a number, or leave it empty for the default.';

  const blank = panelIsBlank(values);
  let panel: WindPanel | undefined;
  if (!blank) {
    const parsed = panelSchemaFor(values.clipKind).safeParse(panelCandidate(values));
    if (parsed.success) panel = parsed.data;
    else collect(parsed.error.issues as Issue[], system, errors);
  }

  const empty: AttachmentEvaluation = {
    input: null,
    result: null,
    zones: [],
    panel,
    design,
    errors,
    missing: [],
    site: [],
  };

  // Ask the shared builder what is missing; a panel that is entered but not yet valid is not "missing" —
  // its fields say what is wrong.
  const placeholder = !blank && !panel ? (panelCandidate(values) as WindPanel) : panel;
  const ready = windDesignInputFor(withAttachment(assembly, placeholder, design), project);
  if (ready.status === 'missing') return { ...empty, missing: ready.missing };
  // The schedule needs a valid panel; a design spacing that is not accepted only leaves its own check out.
  if (!panel || Object.keys(errors).some((k) => k !== 'girtSpacing' && k !== 'clipSpacing')) return empty;

  const { design: _design, ...input } = ready.input;
  const siteCheck = windSiteSchema.safeParse(input.site);
  if (!siteCheck.success) {
    const site = siteCheck.error.issues.map((issue) => {
      const key = String(issue.path[0] ?? '');
      const f = SITE_FIELDS[key];
      return {
        text: `${f?.label ?? key}: ${issueText(issue as Issue, f?.measure, system)}`,
        where: f?.where ?? 'wind',
      } satisfies SiteProblem;
    });
    return { ...empty, site };
  }

  try {
    const result = calculateWindSchedule(input);
    const checked = checkDesignSpacing(ready.input, result);
    return {
      ...empty,
      input,
      result: { ...result, trace: [...result.trace, ...checked.trace] },
      zones: checked.zones,
    };
  } catch (e) {
    if (!(e instanceof CalcInputError)) throw e;
    if (e.field.startsWith('site.')) {
      const key = e.field.slice('site.'.length);
      const f = SITE_FIELDS[key];
      return { ...empty, site: [{ text: `${f?.label ?? key}: ${e.reason}`, where: f?.where ?? 'wind' }] };
    }
    return { ...empty, errors: { ...errors, [toFormPath(e.field)]: sentence(e.reason) } };
  }
}
