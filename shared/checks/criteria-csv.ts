import { parseCsv, toCsv } from '../csv';
import { WALL_CATEGORIES, WALL_CATEGORY_LABELS } from '../schemas/assembly';
import { CLIMATE_ZONES } from '../schemas/project';
import type { UnitSystem } from '../units';
import {
  ALL_ZONES,
  type CategoryLabels,
  CRITERION_TYPE_KEYS,
  type CriteriaRowInput,
  type CriteriaZone,
  type CriterionType,
  criterionSpec,
  normaliseUnit,
  rowIssues,
  valueProblem,
  type WallCategory,
} from './criteria';

/*
 * A code table as CSV (RFC 4180): one criterion per record under the header
 *   climate_zone,wall_category,criterion,value,unit,note
 * Zones are ASHRAE 169 designations or * (all zones); categories and criteria are keys (labels are
 * accepted on import); the unit column says whether the value is SI or IP. An import is all or nothing:
 * either every record is valid, or the caller gets every problem with its line and nothing is written.
 */

export const CSV_COLUMNS = ['climate_zone', 'wall_category', 'criterion', 'value', 'unit', 'note'] as const;
export type CsvColumn = (typeof CSV_COLUMNS)[number];

export interface CsvIssue {
  /** Physical line (1-based) of the record, header = 1. */
  line: number;
  /** Column the problem is in, or `row` for the record as a whole, `file` for the text as a whole. */
  field: CsvColumn | 'row' | 'file';
  reason: string;
}

export type CriteriaCsvImport = { ok: true; rows: CriteriaRowInput[] } | { ok: false; errors: CsvIssue[] };

/** At most this many problems are listed (a wrong file would otherwise list thousands). */
export const MAX_CSV_ISSUES = 200;

/** 12 significant digits: drops floating-point noise of a unit conversion, keeps every real digit. */
const round12 = (x: number): string => String(Number(x.toPrecision(12)));

/** The rows as CSV: SI values exactly as stored, or IP values in the grid's IP units. */
export function criteriaToCsv(rows: readonly CriteriaRowInput[], system: UnitSystem = 'SI'): string {
  const records = rows.map((r) => {
    const spec = criterionSpec(r.criterion);
    const value =
      typeof r.value === 'boolean'
        ? r.value
          ? 'yes'
          : 'no'
        : system === 'SI'
          ? String(r.value)
          : round12(r.value / spec.display.IP.toSI);
    const unit = spec.kind === 'boolean' ? '' : system === 'SI' ? spec.unit : spec.display.IP.symbol;
    return [r.climateZone, r.wallCategory, r.criterion, value, unit, r.note];
  });
  return toCsv([[...CSV_COLUMNS], ...records]);
}

const lower = (s: string) => s.trim().toLowerCase();

function readZone(text: string): CriteriaZone | null {
  const t = lower(text);
  if (t === '*' || t === 'all' || t === 'all zones') return ALL_ZONES;
  const z = CLIMATE_ZONES.find((c) => c.toLowerCase() === t);
  return z ?? null;
}

function readCategory(text: string, labels: CategoryLabels): WallCategory | null {
  const t = lower(text);
  return (
    WALL_CATEGORIES.find(
      (c) => c === t || lower(WALL_CATEGORY_LABELS[c]) === t || (labels[c] && lower(labels[c]!) === t),
    ) ?? null
  );
}

function readCriterion(text: string): CriterionType | null {
  const t = lower(text);
  return CRITERION_TYPE_KEYS.find((k) => k === t || lower(criterionSpec(k).label) === t) ?? null;
}

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;
const YES = ['yes', 'y', 'true', '1'];
const NO = ['no', 'n', 'false', '0'];

function unitList(type: CriterionType): string {
  const spec = criterionSpec(type);
  const symbols = [...new Set([spec.unit, spec.display.SI.symbol, spec.display.IP.symbol])].filter(Boolean);
  return symbols.join(' or ');
}

/** One record → a row (SI), or its problems. */
function readRecord(
  fields: string[],
  columns: Record<CsvColumn, number>,
  labels: CategoryLabels,
  line: number,
): { row?: CriteriaRowInput; issues: CsvIssue[] } {
  const issues: CsvIssue[] = [];
  const get = (c: CsvColumn) => (fields[columns[c]] ?? '').trim();
  const fail = (field: CsvIssue['field'], reason: string) => issues.push({ line, field, reason });

  const zone = readZone(get('climate_zone'));
  if (zone === null)
    fail(
      'climate_zone',
      get('climate_zone') === ''
        ? 'enter a climate zone (e.g. 5A), or * for all zones'
        : `“${get('climate_zone')}” is not an ASHRAE 169 climate zone (0A … 8) nor * for all zones`,
    );
  const category = readCategory(get('wall_category'), labels);
  if (category === null)
    fail(
      'wall_category',
      `“${get('wall_category')}” is not a wall category; use one of ${WALL_CATEGORIES.join(', ')}`,
    );
  const criterion = readCriterion(get('criterion'));
  if (criterion === null)
    fail(
      'criterion',
      `“${get('criterion')}” is not a criterion type; use one of ${CRITERION_TYPE_KEYS.join(', ')}`,
    );
  const note = get('note');
  if (note.length > 500) fail('note', 'a note holds at most 500 characters');
  if (criterion === null) return { issues };

  const spec = criterionSpec(criterion);
  const rawValue = get('value');
  const rawUnit = get('unit');
  let value: number | boolean | null = null;
  if (spec.kind === 'boolean') {
    const t = lower(rawValue);
    value = YES.includes(t) ? true : NO.includes(t) ? false : null;
    if (value === null) fail('value', `enter yes or no (found “${rawValue}”)`);
    if (rawUnit !== '') fail('unit', 'a yes/no criterion has no unit; leave the column empty');
  } else {
    const text = criterion === 'min_deflection_limit' ? rawValue.replace(/^l\s*\/\s*/i, '') : rawValue;
    const factor = spec.accepts[normaliseUnit(rawUnit)];
    if (!NUMBER.test(text))
      fail('value', rawValue === '' ? 'enter a value' : `“${rawValue}” is not a number`);
    if (factor === undefined)
      fail(
        'unit',
        rawUnit === ''
          ? `give the unit of the value: ${unitList(criterion)}`
          : `“${rawUnit}” is not a unit of ${spec.label}; use ${unitList(criterion)}`,
      );
    if (NUMBER.test(text) && factor !== undefined) {
      value = Number(text) * factor;
      const problem = valueProblem(criterion, value);
      if (problem) fail('value', problem);
    }
  }
  if (issues.length > 0 || zone === null || category === null || value === null) return { issues };
  return { row: { climateZone: zone, wallCategory: category, criterion, value, note }, issues };
}

/**
 * CSV text → rows (SI), all or nothing: any problem anywhere — a wrong header, a bad field, a repeated
 * criterion — returns every problem found with its line, and no rows.
 */
export function criteriaFromCsv(text: string, labels: CategoryLabels = {}): CriteriaCsvImport {
  const parsed = parseCsv(text);
  if (!parsed.ok) return { ok: false, errors: [{ line: parsed.line, field: 'file', reason: parsed.reason }] };
  const [header, ...records] = parsed.records;
  if (!header)
    return {
      ok: false,
      errors: [{ line: 1, field: 'file', reason: 'the file is empty; it needs a header row' }],
    };

  const names = header.fields.map(lower);
  const columns = {} as Record<CsvColumn, number>;
  const errors: CsvIssue[] = [];
  for (const c of CSV_COLUMNS) {
    const at = names.indexOf(c);
    if (at < 0 && c !== 'note')
      errors.push({ line: header.line, field: 'file', reason: `the header has no “${c}” column` });
    columns[c] = at;
  }
  const unknown = names.filter((n) => n !== '' && !(CSV_COLUMNS as readonly string[]).includes(n));
  if (unknown.length > 0)
    errors.push({
      line: header.line,
      field: 'file',
      reason: `unknown column${unknown.length > 1 ? 's' : ''} ${unknown.map((n) => `“${n}”`).join(', ')}; the columns are ${CSV_COLUMNS.join(', ')}`,
    });
  if (errors.length > 0) return { ok: false, errors };

  const rows: CriteriaRowInput[] = [];
  const lines: number[] = [];
  for (const record of records) {
    if (record.fields.length > names.length)
      errors.push({
        line: record.line,
        field: 'row',
        reason: `has ${record.fields.length} fields but the header has ${names.length}; quote a field that holds a comma`,
      });
    const { row, issues } = readRecord(record.fields, columns, labels, record.line);
    errors.push(...issues);
    if (row) {
      rows.push(row);
      lines.push(record.line);
    }
  }
  for (const issue of rowIssues(rows))
    errors.push({
      line: lines[issue.index]!,
      field: issue.field === 'row' ? 'row' : 'value',
      reason: issue.reason.replace(
        /repeats row (\d+)/,
        (_m, n: string) => `repeats line ${lines[Number(n) - 1]}`,
      ),
    });
  if (errors.length > 0)
    return { ok: false, errors: errors.sort((a, b) => a.line - b.line).slice(0, MAX_CSV_ISSUES) };
  return { ok: true, rows };
}
