/**
 * The cautions that sit with every moisture result, in the same place as on the other pages: after the
 * result, at the end of the page.
 */
export const MOISTURE_CAUTIONS = [
  'ISO 13788 is a steady-state, monthly screening method. It ignores rain and wind-driven rain, built-in moisture, air leakage through the wall, liquid (capillary) transport and the moisture the materials store; it cannot show how wet a layer gets between the monthly steps.',
  'Where those matter — absorbent claddings, built-in moisture, air leakage, cold stores, or a result near the limit — a transient hygrothermal simulation to EN 15026 may be needed.',
  'The calculation runs through the clear field between framing members. Studs, girts, clips and fasteners are thermal bridges with colder surfaces: check them with ISO 10211 or published f_Rsi values.',
  'Generic μ values from the library are for early checks; the manufacturer’s tested permeance governs.',
  'This result is an aid to, not a substitute for, the licensed professional of record, who decides the design; the local code official decides what the code requires and which method is accepted.',
];
