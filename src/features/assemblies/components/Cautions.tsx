/**
 * The cautions that sit with every thermal result, in the same place on every page that shows one and at
 * the end of every sheet.
 */
export const THERMAL_CAUTIONS = [
  'This result is an aid to, not a substitute for, the licensed professional of record, who checks and seals the design.',
  "The manufacturer's tested χ and ψ values govern over any value entered or taken from a library here; generic material values are for early checks only.",
  'The local code official decides what the code requires and which method is accepted.',
];
