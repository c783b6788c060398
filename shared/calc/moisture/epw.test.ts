// @ts-expect-error psychrolib ships no type declarations; the shape used is typed below.
import psychrolibModule from 'psychrolib';
import { describe, expect, it } from 'vitest';
import { DAYS, HEADER, weatherFile } from '../../../tests/setup/weather-file';
import { CalcInputError } from '../errors';
import { monthlyClimateFromEpw, weatherFileSource } from './epw';

const psychrolib = psychrolibModule as {
  SI: number;
  SetUnitSystem(s: number): void;
  GetSatVapPres(t: number): number;
};
psychrolib.SetUnitSystem(psychrolib.SI);

describe('monthly climate from an EnergyPlus weather file (EPW layout per the EnergyPlus data dictionary)', () => {
  it('reads the station from the LOCATION line and gives steady months back exactly', () => {
    const r = monthlyClimateFromEpw(weatherFile((m) => [m - 5, 60 + m]));
    expect(r.station).toMatchObject({
      city: 'Gullhaven Point',
      country: 'XXA',
      wmo: '990001',
      elevation: 35,
    });
    expect(r.hours).toBe(8760);
    expect(r.skipped).toBe(0);
    r.months.forEach((month, m) => {
      expect(month.exteriorTemperature).toBeCloseTo(m - 5, 12);
      expect(month.exteriorRelativeHumidity).toBeCloseTo((60 + m) / 100, 12);
      expect(month.hours).toBe(DAYS[m]! * 24);
    });
  });

  it('takes the mean vapour pressure of the hours, not the mean RH (checked with psychrolib p_sat, within 1 %)', () => {
    // Half of each month's hours at 0 °C / 90 %, half at 20 °C / 40 %.
    const r = monthlyClimateFromEpw(weatherFile((_m, h) => (h % 2 === 0 ? [0, 90] : [20, 40])));
    const pMean = (0.9 * psychrolib.GetSatVapPres(0) + 0.4 * psychrolib.GetSatVapPres(20)) / 2;
    const phiExpected = pMean / psychrolib.GetSatVapPres(10);
    for (const month of r.months) {
      expect(month.exteriorTemperature).toBeCloseTo(10, 12);
      expect(month.exteriorRelativeHumidity / phiExpected).toBeGreaterThan(0.99);
      expect(month.exteriorRelativeHumidity / phiExpected).toBeLessThan(1.01);
      // The mean RH (65 %) would overstate the vapour in the air.
      expect(month.exteriorRelativeHumidity).toBeLessThan(0.65);
    }
  });

  it('leaves out hours marked missing (99.9 °C, 999 %) and names a month with too few hours', () => {
    const some = monthlyClimateFromEpw(weatherFile((m, h) => (h < 24 ? [99.9, 999] : [m, 70])));
    expect(some.skipped).toBe(12 * 24);
    expect(some.months[0]!.hours).toBe(30 * 24);
    expect(some.months[0]!.exteriorTemperature).toBeCloseTo(0, 12);

    const march = () =>
      monthlyClimateFromEpw(weatherFile((m, h) => (m === 2 && h > 100 ? [99.9, 80] : [5, 80])));
    expect(march).toThrow(CalcInputError);
    expect(march).toThrow(/month 3/);
  });

  it('refuses a file that is not a weather file, with the reason', () => {
    expect(() => monthlyClimateFromEpw('month,theta,rh\n1,2,3')).toThrow(/LOCATION/);
    expect(() => monthlyClimateFromEpw(HEADER.join('\n'))).toThrow(/no hourly records/);
    expect(() => monthlyClimateFromEpw(`${HEADER.join('\n')}\nnot,an,hour`)).toThrow(/line 9/);
  });

  it('names the station, its WMO number and the hours used as the source', () => {
    const r = monthlyClimateFromEpw(weatherFile(() => [5, 80]));
    expect(weatherFileSource(r, 'gullhaven.epw')).toBe(
      'Gullhaven Point, North Reach, XXA, WMO 990001, Invented data — monthly means of 8760 hours from the weather file gullhaven.epw',
    );
  });
});
