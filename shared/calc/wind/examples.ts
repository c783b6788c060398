import type { LoadSpanTable, Panel, WindScheduleInput, WindSite } from './schema';

/*
 * INVENTED DEMO DATA — not any maker's product. The load–span table and clip capacity below were made up to look
 * plausible for a ribbed steel wall panel on clips; they exist for the demo, the unit tests and the benchmark and
 * must never be used for a design. Real schedules use the manufacturer's published, tested values.
 */

/** Demo site: a one-storey warehouse in open terrain (ASCE 7-16, 51.4 m/s ≈ 115 mph, exposure C). */
export const demoSite = (): WindSite => ({
  edition: 'ASCE 7-16',
  basicWindSpeed: 51.4,
  riskCategory: 'II',
  exposure: 'C',
  Kzt: 1,
  groundElevation: 150,
  enclosure: 'enclosed',
  meanRoofHeight: 9.1,
  planLength: 60,
  planWidth: 30,
  roofSlopeDeg: 2,
});

/** INVENTED demo load–span table: two-span panel, ASD allowables in Pa, deflection column at L/180. */
export const demoLoadSpanTable = (): LoadSpanTable => ({
  spanCondition: 'double',
  deflectionLimit: 'L/180',
  rows: [
    { span: 0.9, allowableInward: 4690, allowableOutward: 4070, allowableDeflectionPressure: 6940 },
    { span: 1.2, allowableInward: 2640, allowableOutward: 2290, allowableDeflectionPressure: 2930 },
    { span: 1.5, allowableInward: 1690, allowableOutward: 1470, allowableDeflectionPressure: 1500 },
    { span: 1.8, allowableInward: 1170, allowableOutward: 1020, allowableDeflectionPressure: 870 },
    { span: 2.1, allowableInward: 860, allowableOutward: 750, allowableDeflectionPressure: 550 },
    { span: 2.4, allowableInward: 660, allowableOutward: 570, allowableDeflectionPressure: 370 },
    { span: 2.7, allowableInward: 520, allowableOutward: 450, allowableDeflectionPressure: 260 },
    { span: 3.0, allowableInward: 420, allowableOutward: 370, allowableDeflectionPressure: 190 },
  ],
});

/** INVENTED demo panel: 0.6 m module on horizontal girts, clip with two fasteners of 1150 N (ASD) each. */
export const demoPanel = (): Panel => ({
  loadSpanTable: demoLoadSpanTable(),
  clip: { fastenerCapacity: 1150, fastenersPerClip: 2 },
  panelModuleWidth: 0.6,
  girtOrientation: 'horizontal',
  designLevel: 'ASD',
});

/** The demo schedule input: demo site + demo panel. */
export const demoWindSchedule = (): WindScheduleInput => ({ site: demoSite(), panel: demoPanel() });
