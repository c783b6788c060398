/*
 * Weather files written for the tests in the EPW layout of EnergyPlus "Auxiliary Programs", "EnergyPlus Weather File
 * (EPW) Data Dictionary" (8 header lines, then year, month, day, hour, minute, flags, dry bulb °C, dew point °C,
 * RH %, pressure Pa, … per hour). The station, Gullhaven Point, and all its values are invented for the test.
 */
export const DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
export const HEADER = [
  'LOCATION,Gullhaven Point,North Reach,XXA,Invented,990001,51.20,-2.80,0.0,35.0',
  'DESIGN CONDITIONS,0',
  'TYPICAL/EXTREME PERIODS,0',
  'GROUND TEMPERATURES,0',
  'HOLIDAYS/DAYLIGHT SAVINGS,No,0,0,0',
  'COMMENTS 1,invented station for a test',
  'COMMENTS 2,',
  'DATA PERIODS,1,1,Data,Sunday, 1/ 1,12/31',
];

/** An hourly record with the fields the reader uses and plausible filler for the rest (35 fields in all). */
const record = (month: number, day: number, hour: number, theta: number | string, rh: number | string) =>
  [2021, month, day, hour, 60, '?9?9?9?9E0?9?9?9', theta, 5.0, rh, 101325, ...new Array(25).fill(0)].join(
    ',',
  );

/** A year of hours; `hourly(m, h)` gives [θ, RH %] for month m (0–11) and hour h of that month. */
export function weatherFile(hourly: (m: number, h: number) => [number | string, number | string]): string {
  const lines = [...HEADER];
  DAYS.forEach((days, m) => {
    for (let h = 0; h < days * 24; h++) {
      const [theta, rh] = hourly(m, h);
      lines.push(record(m + 1, Math.floor(h / 24) + 1, (h % 24) + 1, theta, rh));
    }
  });
  return `${lines.join('\r\n')}\r\n`;
}
