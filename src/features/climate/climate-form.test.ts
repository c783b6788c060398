import type { ProjectClimate } from '@shared/schemas/project';
import { describe, expect, it } from 'vitest';
import { climateFormSchema, climateToForm, mergeClimate } from './climate-form';

const climate = (t: number, humidityClass?: number): ProjectClimate => ({
  months: Array.from({ length: 12 }, (_, k) => ({
    exteriorTemperature: t + k,
    exteriorRelativeHumidity: 0.8,
  })),
  source: 'Station A, 1991–2020 means',
  ...(humidityClass === undefined ? {} : { humidityClass }),
});

describe('climate form', () => {
  it('round-trips a stored climate, with a humidity class or the fixed indoor conditions', () => {
    for (const c of [climate(-5, 3), climate(-5)])
      expect(climateFormSchema.parse(climateToForm(c))).toEqual(c);
  });

  it('refuses a blank month and a missing source', () => {
    const r = climateFormSchema.safeParse(climateToForm(null));
    expect(r.success).toBe(false);
    const paths = (r.error?.issues ?? []).map((i) => i.path.join('.'));
    expect(paths).toContain('months.0.exteriorTemperature');
    expect(paths).toContain('source');
  });
});

describe('mergeClimate (after a version conflict)', () => {
  it('keeps what this person changed and takes the saved values elsewhere', () => {
    const base = climate(-5, 3);
    const mine = structuredClone(base);
    mine.months[0]!.exteriorTemperature = -9;
    mine.source = 'Station B';
    const theirs = structuredClone(base);
    theirs.months[6]!.exteriorRelativeHumidity = 0.7;
    theirs.humidityClass = 2;
    const { merged, bothChanged, theirsChanged } = mergeClimate(base, mine, theirs);
    expect(merged.months[0]!.exteriorTemperature).toBe(-9);
    expect(merged.months[6]!.exteriorRelativeHumidity).toBe(0.7);
    expect(merged.source).toBe('Station B');
    expect(merged.humidityClass).toBe(2);
    expect(bothChanged).toEqual([]);
    expect(theirsChanged).toEqual(['July RH', 'Interior (humidity class)']);
  });

  it('names the values both changed and keeps this person’s', () => {
    const base = climate(-5, 3);
    const mine = { ...climate(-5), source: base.source };
    const theirs = climate(-5, 4);
    const { merged, bothChanged } = mergeClimate(base, mine, theirs);
    expect(merged.humidityClass).toBeUndefined();
    expect(bothChanged).toEqual(['Interior (humidity class)']);
  });

  it('takes this person’s climate whole when there was none before', () => {
    const mine = climate(0, 2);
    expect(mergeClimate(null, mine, null).merged).toEqual(mine);
  });
});
