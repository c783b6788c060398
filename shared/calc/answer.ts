import { z } from 'zod';

/**
 * A number of a calculation's answer whose description ends in its unit symbol (shared/calc/trace-units):
 * `measure('Net volume', M3)` describes "Net volume, m³" in the API document.
 */
export const measure = (what: string, unit: string) => z.number().describe(`${what}, ${unit}`);
