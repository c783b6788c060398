import { HUMIDITY_CLASS_EXCESS } from '@shared/calc/moisture/interior';

/*
 * ISO 13788:2012 Annex A internal humidity classes in plain words, with the vapour pressure excess each
 * adds over the outside at θ_e ≤ 0 °C (falling linearly to 0 at 20 °C). The descriptions follow the shared
 * contract's.
 */
export const HUMIDITY_CLASSES = [
  { value: 1, words: 'Storage areas' },
  { value: 2, words: 'Offices and shops' },
  { value: 3, words: 'Dwellings with low occupancy' },
  { value: 4, words: 'Dwellings with high occupancy, sports halls, kitchens, canteens' },
  { value: 5, words: 'Special buildings — laundries, breweries, swimming pools' },
].map((c) => ({ ...c, excess: HUMIDITY_CLASS_EXCESS[c.value - 1] ?? 0 }));

export const humidityClassWords = (n: number) =>
  HUMIDITY_CLASSES.find((c) => c.value === n)?.words ?? `Class ${n}`;

/** The source says the months are invented demo values (the demo project's climate does). */
export const isInventedClimate = (source: string) => /\b(invented|demo|fictional|example)\b/i.test(source);
