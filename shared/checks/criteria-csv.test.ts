import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { R_IP_TO_SI, U_IP_TO_SI } from '../units';
import { CRITERIA_ZONES, CRITERION_TYPE_KEYS, CRITERION_TYPES, type CriteriaRowInput } from './criteria';
import { CSV_COLUMNS, criteriaFromCsv, criteriaToCsv } from './criteria-csv';
import { diffRows } from './criteria-diff';
import { criteriaRow as row } from './fixtures';

const header = CSV_COLUMNS.join(',');
const csv = (...lines: string[]) => [header, ...lines].join('\r\n');

describe('code tables as CSV', () => {
  it('reads SI and IP values, labels as well as keys, * for all zones and yes/no', () => {
    const r = criteriaFromCsv(
      csv(
        '5A,steel_framed,max_u_factor,0.064,Btu/(h·ft²·°F),',
        '5a,Metal building wall,Minimum effective R-value,R 19,,',
      ),
    );
    expect(r.ok).toBe(false);
    const good = criteriaFromCsv(
      csv(
        '5A,steel_framed,max_u_factor,0.064,Btu/h·ft²·°F,',
        '5a,Metal building wall,Minimum effective R-value,19,h·ft²·°F/Btu,',
        'all,steel_framed,must_dry_within_year,Yes,,',
        '*,steel_framed,max_surface_rh,80,%,mould',
        '*,steel_framed,min_deflection_limit,L/240,,',
      ),
    );
    expect(good).toEqual({
      ok: true,
      rows: [
        row('max_u_factor', 0.064 * U_IP_TO_SI),
        row('min_effective_r', 19 * R_IP_TO_SI, '5A', 'metal_building'),
        row('must_dry_within_year', true, '*'),
        { ...row('max_surface_rh', 0.8, '*'), note: 'mould' },
        row('min_deflection_limit', 240, '*'),
      ],
    });
  });

  it('rejects every bad record with its line, field and reason, and returns no rows', () => {
    const r = criteriaFromCsv(
      csv(
        '5A,steel_framed,max_u_factor,0.35,W/(m²·K),fine',
        '5Z,steel_framed,max_u_factor,0.35,W/(m²·K),',
        '5A,steel_framed,max_u_factor,0.3,W/m2K,',
        '5A,steel_framed,min_effective_r,3,,',
        '5A,steel_framed,max_surface_rh,85,,',
        '5A,steel_framed,thermal_magic,1,,',
        '5A,steel_framed,must_dry_within_year,maybe,,',
      ),
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => `${e.line} ${e.field}`)).toEqual([
      '3 climate_zone',
      '4 row',
      '5 unit',
      '6 value',
      '7 criterion',
      '8 value',
    ]);
    expect(r.errors.find((e) => e.line === 4)!.reason).toMatch(/repeats line 2/);
    expect(r.errors.find((e) => e.line === 5)!.reason).toMatch(
      /give the unit of the value: m²·K\/W or h·ft²·°F\/Btu/,
    );
    expect(r.errors.find((e) => e.line === 6)!.reason).toMatch(/fraction 0–1/);
  });

  it('reports a broken file as a whole', () => {
    expect(criteriaFromCsv('')).toMatchObject({ ok: false, errors: [{ line: 1, field: 'file' }] });
    expect(criteriaFromCsv('zone,category\n5A,mass')).toMatchObject({ ok: false });
    const unclosed = criteriaFromCsv(csv('5A,steel_framed,max_u_factor,0.35,W/(m²·K),"open'));
    expect(unclosed).toEqual({
      ok: false,
      errors: [{ line: 2, field: 'file', reason: 'a quoted field is never closed' }],
    });
    const extra = criteriaFromCsv(`${header},colour\n5A,steel_framed,max_u_factor,0.35,W/(m²·K),,red`);
    expect(extra).toMatchObject({ ok: false, errors: [{ line: 1, reason: /unknown column “colour”/ }] });
  });

  it('round-trips any valid table through export and import (SI exactly, IP to 1e-9)', () => {
    const rowArb = fc
      .record({
        climateZone: fc.constantFrom(...CRITERIA_ZONES),
        wallCategory: fc.constantFrom(
          'metal_building',
          'steel_framed',
          'mass',
          'wood_framed',
          'other' as const,
        ),
        criterion: fc.constantFrom(...CRITERION_TYPE_KEYS),
        note: fc.string({ maxLength: 40 }).map((s) => s.trim()),
        fraction: fc.double({ min: 0.001, max: 1, noNaN: true }),
        flag: fc.boolean(),
      })
      .map(({ fraction, flag, ...r }): CriteriaRowInput => {
        const spec = CRITERION_TYPES[r.criterion];
        // Inside the sane range, clear of its ends (a value within rounding of a bound is no real table's).
        const lo = Math.max(spec.range.min, 1e-3);
        const value = spec.kind === 'boolean' ? flag : lo + fraction * 0.999 * (spec.range.max - lo);
        return { ...r, value };
      });
    fc.assert(
      fc.property(
        fc.uniqueArray(rowArb, {
          selector: (r) => `${r.climateZone}|${r.wallCategory}|${r.criterion}`,
          maxLength: 20,
        }),
        (rows) => {
          expect(criteriaFromCsv(criteriaToCsv(rows, 'SI'))).toEqual({ ok: true, rows });
          const ip = criteriaFromCsv(criteriaToCsv(rows, 'IP'));
          expect(ip.ok).toBe(true);
          if (!ip.ok) return;
          ip.rows.forEach((r, i) => {
            const want = rows[i]!.value;
            if (typeof want === 'number')
              expect(Math.abs((r.value as number) - want)).toBeLessThanOrEqual(1e-9 * want);
            else expect(r.value).toBe(want);
          });
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('the difference between two versions', () => {
  it('lists rows added, removed and changed by (zone, category, criterion)', () => {
    const v1 = [row('max_u_factor', 0.35), row('max_surface_rh', 0.8, '*'), row('min_effective_r', 3)];
    const v2 = [row('max_u_factor', 0.3), row('min_effective_r', 3), row('must_dry_within_year', true)];
    expect(diffRows(v1, v2)).toEqual({
      added: [row('must_dry_within_year', true)],
      removed: [row('max_surface_rh', 0.8, '*')],
      changed: [
        {
          climateZone: '5A',
          wallCategory: 'steel_framed',
          criterion: 'max_u_factor',
          from: { value: 0.35, note: '' },
          to: { value: 0.3, note: '' },
        },
      ],
      unchanged: 1,
    });
  });
});
