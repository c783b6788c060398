import { z } from 'zod';

/*
 * The engine's and the runner's messages are data — `{ path, code, values }` — and are worded here, once, for
 * the screens and the compliance sheet alike. `path` says where the thing is put right (an assembly or project
 * field, or the calculation's own field path); no code reads a field back out of the words.
 */

const none = z.object({});
const message = <C extends string, V extends z.ZodObject>(code: C, values: V) =>
  z.object({ code: z.literal(code), path: z.string(), values });

export const engineMessageSchema = z.discriminatedUnion('code', [
  /** A layer has no vapour data (`path` vapour.<i>; `layer` is the index i). */
  message('vapour_missing', z.object({ layer: z.number().int().min(0), name: z.string() })),
  message('climate_missing', none),
  message('wind_missing', none),
  message('panel_missing', none),
  message('joints_missing', none),
  message('takeoff_missing', none),
  /** A calculation refused its input (`CalcInputError`): `path` is the calculation's field, `reason` its words. */
  message('calc_refused', z.object({ reason: z.string() })),
]);
export type EngineMessage = z.infer<typeof engineMessageSchema>;
export type EngineMessageCode = EngineMessage['code'];

/** A message built in code, its values checked against its code. */
export const engineMessage = <C extends EngineMessageCode>(
  code: C,
  path: string,
  values: Extract<EngineMessage, { code: C }>['values'],
): EngineMessage => ({ code, path, values }) as EngineMessage;

/** Engine reasons may carry raw floats ("got 0.5027093596059113"); six significant figures are plenty to read. */
export const readableNumbers = (t: string): string =>
  t.replace(/\d+\.\d{7,}/g, (x) => String(Number(Number(x).toPrecision(6))));

/** A message in plain words (lower case, no full stop: it is put into sentences). */
export function messageText(m: EngineMessage): string {
  switch (m.code) {
    case 'vapour_missing':
      return `vapour data of layer ${m.values.layer + 1} (${m.values.name})`;
    case 'climate_missing':
      return 'the project’s monthly climate';
    case 'wind_missing':
      return 'the project’s wind data';
    case 'panel_missing':
      return 'the panel’s load–span table and clip capacity';
    case 'joints_missing':
      return 'the joint schedule';
    case 'takeoff_missing':
      return 'the elevation for the takeoff';
    case 'calc_refused':
      return `${m.path}: ${readableNumbers(m.values.reason)}`;
  }
}

/** Text as a sentence: capital first, a full stop at the end, raw floats to six significant figures. */
export function sentence(text: string): string {
  const t = readableNumbers(text);
  const s = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?]$/.test(s) ? s : `${s}.`;
}

/** "a", "a and b", "a, b and c". */
export const listWords = (items: readonly string[]): string =>
  items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;

/** A stored message: data (runs since messages became data) or the words a run stored before. */
export const storedMessageSchema = z.union([engineMessageSchema, z.string()]);
export type StoredMessage = z.infer<typeof storedMessageSchema>;
export const storedMessageText = (m: StoredMessage): string => (typeof m === 'string' ? m : messageText(m));

/** "the project’s wind data is missing", "a and b are missing". */
export const missingText = (items: readonly StoredMessage[]): string =>
  `${listWords(items.map(storedMessageText))} ${items.length > 1 ? 'are' : 'is'} missing`;
