/**
 * Unit symbols of trace values (`v(x, M)`, a step's unit), spelled once for every engine, so that the sheet
 * and the pages read the same symbol whichever engine wrote the step. SI throughout.
 */
export const ONE = '1';
export const PCT = '%';
export const PCS = 'pcs';
export const M = 'm';
export const M2 = 'm²';
export const M3 = 'm³';
export const K = 'K';
export const PER_K = '1/K';
export const PA = 'Pa';
export const N = 'N';
export const RK = 'm²·K/W';
export const UK = 'W/(m²·K)';
export const WMK = 'W/(m·K)';
