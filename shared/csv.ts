/**
 * Comma-separated values as RFC 4180 defines them (§2): records end with CRLF (LF alone is accepted on
 * input), fields holding a comma, a double quote, CR or LF are enclosed in double quotes, and a double
 * quote inside such a field is written twice. Pure: no I/O.
 *
 * Formula injection (OWASP "CSV Injection"): a spreadsheet runs a cell that starts with = + - @, a tab or a
 * CR as a formula. Such a text cell is written with a leading apostrophe, which spreadsheets show as text;
 * a plain number (-3.5, +2, 1e-7) is never a formula and stays as it is. A cell that already starts with
 * apostrophes before such a character gets one more, and the reader drops one apostrophe from every cell of
 * that shape — so reading what was written returns exactly the original text.
 */

/** Starts like a formula, perhaps behind apostrophes. */
const FORMULA_START = /^'*[=+\-@\t\r]/;
/** A plain decimal number, as the writers print them. */
const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

/** A text cell a spreadsheet would run as a formula, prefixed with an apostrophe (see above). */
const neutraliseFormula = (field: string): string =>
  FORMULA_START.test(field) && !PLAIN_NUMBER.test(field) ? `'${field}` : field;

/** The reader's inverse of `neutraliseFormula`. */
const restoreFormula = (field: string): string =>
  field.startsWith("'") && FORMULA_START.test(field.slice(1)) ? field.slice(1) : field;

/** RFC 4180 §2: a field holding a comma, a double quote, CR or LF is quoted, inner quotes doubled; a formula is neutralised. */
export const csvField = (text: string): string => {
  const field = neutraliseFormula(text);
  return /[",\r\n]/.test(field) ? `"${field.replaceAll('"', '""')}"` : field;
};

/** Records → CSV text with CRLF line ends, the last record terminated too. */
export const toCsv = (records: readonly (readonly string[])[]): string =>
  records.map((r) => `${r.map(csvField).join(',')}\r\n`).join('');

/** One record with the physical line (1-based) on which it starts, for error reports. */
export interface CsvRecord {
  line: number;
  fields: string[];
}

export type CsvParse = { ok: true; records: CsvRecord[] } | { ok: false; line: number; reason: string };

/**
 * CSV text → records (RFC 4180 §2). A leading byte-order mark is dropped; blank lines are skipped; a quoted
 * field may span lines; a neutralised formula gets its apostrophe back off. Refused, with the line: a quote
 * that is never closed, and characters between a closing quote and the next comma or line end.
 */
export function parseCsv(text: string): CsvParse {
  const s = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let line = 1;
  let i = 0;
  while (i < s.length) {
    const start = line;
    const fields: string[] = [];
    let blank = true;
    for (;;) {
      let field = '';
      if (s[i] === '"') {
        blank = false;
        const open = line;
        i++;
        for (;;) {
          if (i >= s.length) return { ok: false, line: open, reason: 'a quoted field is never closed' };
          const c = s[i]!;
          if (c === '"') {
            if (s[i + 1] === '"') {
              field += '"';
              i += 2;
              continue;
            }
            i++;
            break;
          }
          if (c === '\n') line++;
          field += c;
          i++;
        }
        if (i < s.length && s[i] !== ',' && s[i] !== '\r' && s[i] !== '\n')
          return { ok: false, line, reason: 'text follows a closing quote; quote the whole field' };
      } else {
        while (i < s.length && s[i] !== ',' && s[i] !== '\r' && s[i] !== '\n') field += s[i++];
        if (field !== '') blank = false;
      }
      fields.push(restoreFormula(field));
      if (s[i] === ',') {
        blank = false;
        i++;
        continue;
      }
      break;
    }
    if (s[i] === '\r') i++;
    if (s[i] === '\n') i++;
    line++;
    if (!blank) records.push({ line: start, fields });
  }
  return { ok: true, records };
}
