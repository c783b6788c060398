import { z } from 'zod';
import { TEXT_MAX, text } from '../schemas/common';

/**
 * Where an entered value came from — a maker's data sheet, a test report, a published catalogue — in words,
 * and the firm library entry it was copied from, if it was. Stored with the value, so a later change to the
 * library never changes a saved revision, and printed beside the value on the compliance sheet.
 */
export const valueSourceSchema = z.object({
  text: text(TEXT_MAX.line)
    .min(1, 'name the source of the values (data sheet or test report, with its date or revision)')
    .describe('Where the value comes from: data sheet or test report, with its date or revision'),
  libraryEntryId: z.uuid().optional().describe('The firm library entry the value was copied from'),
});
export type ValueSource = z.infer<typeof valueSourceSchema>;
