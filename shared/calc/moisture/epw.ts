import { CalcInputError } from '../errors';
import { saturationPressureIso13788 } from './psychrometrics';

/*
 * Monthly mean exterior climate from an EnergyPlus weather file (EPW), the open hourly format described in
 * EnergyPlus "Auxiliary Programs", ch. "Weather Converter Program", section "EnergyPlus Weather File (EPW)
 * Data Dictionary": eight header lines (the first is `LOCATION,city,state/province/region,country,source,
 * WMO,latitude,longitude,time zone,elevation`), then one comma-separated line per hour — year, month, day,
 * hour, minute, data source flags, dry-bulb temperature °C (missing ≥ 99.9), dew point °C (missing ≥ 99.9),
 * relative humidity % (missing ≥ 999), … — 8760 lines for a year (8784 for a leap year).
 */

/** The station a weather file names in its LOCATION line. */
export interface WeatherStation {
  city: string;
  region: string;
  country: string;
  /** The data set the file was made from, as the file names it. */
  dataSource: string;
  wmo: string;
  latitude: number;
  longitude: number;
  elevation: number;
}

export interface MonthlyFromWeather {
  station: WeatherStation;
  /** January first: mean temperature °C and the RH (0–1) of the mean vapour pressure at that temperature. */
  months: { exteriorTemperature: number; exteriorRelativeHumidity: number; hours: number }[];
  /** Hours read in all, and hours left out for a missing temperature or humidity. */
  hours: number;
  skipped: number;
}

/** The least share of a month's hours that must be present for its mean to stand. */
const MIN_SHARE_OF_MONTH = 0.8;
/** Hours in each month of a common year (a leap-year file adds 24 to February). */
const MONTH_HOURS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31].map((d) => d * 24);
const MISSING_TEMPERATURE = 99.9;
const MISSING_RH = 999;

function stationOf(line: string): WeatherStation {
  const f = line.split(',').map((s) => s.trim());
  if (f[0]?.toUpperCase() !== 'LOCATION' || f.length < 10)
    throw new CalcInputError(
      'file',
      'this is not an EnergyPlus weather file: its first line must be LOCATION,city,region,country,source,WMO,latitude,longitude,time zone,elevation',
    );
  const num = (i: number, what: string) => {
    const v = Number(f[i]);
    if (!Number.isFinite(v)) throw new CalcInputError('file', `the LOCATION line's ${what} is not a number`);
    return v;
  };
  return {
    city: f[1] ?? '',
    region: f[2] ?? '',
    country: f[3] ?? '',
    dataSource: f[4] ?? '',
    wmo: f[5] ?? '',
    latitude: num(6, 'latitude'),
    longitude: num(7, 'longitude'),
    elevation: num(9, 'elevation'),
  };
}

/**
 * Monthly means of an EPW file. θ̄ is the mean of the hourly dry-bulb temperatures; the humidity is the mean
 * of the hourly vapour pressures p = φ·p_sat(θ) (ISO 13788:2012 p_sat), given as φ̄ = p̄ / p_sat(θ̄), so the
 * moisture check, which takes p_e = φ̄·p_sat(θ̄), sees each month's mean vapour pressure exactly (ISO 13788:2012's
 * exterior conditions are monthly means of temperature and vapour pressure). Hours with a missing value are left out;
 * a month with fewer than 80 % of its hours is refused.
 */
export function monthlyClimateFromEpw(text: string): MonthlyFromWeather {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const station = stationOf(lines[0] ?? '');
  const sumT = new Array<number>(12).fill(0);
  const sumP = new Array<number>(12).fill(0);
  const count = new Array<number>(12).fill(0);
  let hours = 0;
  let skipped = 0;
  for (let i = 8; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.trim() === '') continue;
    const f = line.split(',');
    const month = Number(f[1]);
    if (f.length < 9 || !Number.isInteger(month) || month < 1 || month > 12)
      throw new CalcInputError(
        'file',
        `line ${i + 1} is not an hourly record (year, month, day, hour, minute, flags, dry bulb, dew point, RH, …)`,
      );
    hours++;
    const theta = Number(f[6]);
    const rh = Number(f[8]);
    if (
      !Number.isFinite(theta) ||
      !Number.isFinite(rh) ||
      theta >= MISSING_TEMPERATURE ||
      rh >= MISSING_RH ||
      rh < 0 ||
      rh > 110
    ) {
      skipped++;
      continue;
    }
    const m = month - 1;
    sumT[m]! += theta;
    sumP[m]! += (Math.min(rh, 100) / 100) * saturationPressureIso13788(theta);
    count[m]!++;
  }
  if (hours === 0)
    throw new CalcInputError('file', 'the weather file has no hourly records after its 8 header lines');
  const months = MONTH_HOURS.map((expected, m) => {
    const n = count[m]!;
    if (n < MIN_SHARE_OF_MONTH * expected)
      throw new CalcInputError(
        `months.${m}`,
        `the weather file has ${n} usable hours in month ${m + 1} of ${expected}; at least ${Math.ceil(MIN_SHARE_OF_MONTH * expected)} are needed for a monthly mean`,
      );
    const theta = sumT[m]! / n;
    const phi = sumP[m]! / n / saturationPressureIso13788(theta);
    return { exteriorTemperature: theta, exteriorRelativeHumidity: Math.min(phi, 1), hours: n };
  });
  return { station, months, hours, skipped };
}

/** The climate's source line for a weather file: station, WMO number, data set and what was computed. */
export function weatherFileSource(r: MonthlyFromWeather, fileName: string): string {
  const s = r.station;
  const place = [s.city, s.region, s.country].filter((p) => p && p !== '-').join(', ');
  const wmo = s.wmo && s.wmo !== '-' ? `, WMO ${s.wmo}` : '';
  const data = s.dataSource && s.dataSource !== '-' ? `, ${s.dataSource} data` : '';
  return `${place || 'unnamed station'}${wmo}${data} — monthly means of ${r.hours - r.skipped} hours from the weather file ${fileName}`;
}
