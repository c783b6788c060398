import Papa from 'papaparse';

/**
 * Comma-separated values as RFC 4180 defines them (§2), read and written by papaparse: records end with CRLF
 * on output (a file's own line ends, CRLF or LF, are read), fields holding a comma, a double quote, CR or LF
 * — or a leading or trailing space — are enclosed in double quotes, and a double quote inside such a field
 * is written twice. Pure: no I/O.
 *
 * Formula injection (OWASP "CSV Injection"): a spreadsheet runs a cell that starts with = + - @, a tab or a
 * CR as a formula. Such a text cell is written with a leading apostrophe, which spreadsheets show as text;
 * a plain number (-3.5, +2, 1e-7) is never a formula and stays as it is. A cell that already starts with
 * apostrophes before such a character gets one more, and the reader drops one apostrophe from every cell of
 * that shape — so reading what was written returns exactly the original text. (papaparse's own
 * `escapeFormulae` would also quote every such cell and knows no reader's inverse, so the writer
 * neutralises the cells itself and hands papaparse plain text.)
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

const WRITE: Papa.UnparseConfig = { delimiter: ',', quoteChar: '"', escapeChar: '"', newline: '\r\n' };

/** Records → CSV text with CRLF line ends, the last record terminated too; formulas neutralised. */
export const toCsv = (records: readonly (readonly string[])[]): string =>
  records.map((r) => `${Papa.unparse([r.map(neutraliseFormula)], WRITE)}\r\n`).join('');

/** One field as `toCsv` writes it (quoted when it must be, a formula neutralised). */
export const csvField = (text: string): string => Papa.unparse([[neutraliseFormula(text)]], WRITE);

/** One record with the physical line (1-based) on which it starts, for error reports. */
export interface CsvRecord {
  line: number;
  fields: string[];
}

export type CsvParse = { ok: true; records: CsvRecord[] } | { ok: false; line: number; reason: string };

const REASONS: Record<string, string> = {
  MissingQuotes: 'a quoted field is never closed',
  InvalidQuotes: 'text follows a closing quote; quote the whole field',
};

/**
 * CSV text → records (RFC 4180 §2). A leading byte-order mark is dropped; blank lines are skipped; a quoted
 * field may span lines; a neutralised formula gets its apostrophe back off. Refused, with the line: a quote
 * that is never closed, and characters between a closing quote and the next comma or line end (papaparse
 * reports both and reads on; here either refuses the file).
 */
export function parseCsv(text: string): CsvParse {
  const s = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  // Physical line of a character offset, counted on from the last one asked (offsets only grow).
  let seen = 0;
  let line = 1;
  const lineAt = (offset: number) => {
    for (; seen < offset; seen++) if (s.charCodeAt(seen) === 10) line++;
    return line;
  };
  const records: CsvRecord[] = [];
  let failure: { line: number; reason: string } | undefined;
  let start = 0;
  Papa.parse<string[]>(s, {
    delimiter: ',',
    quoteChar: '"',
    escapeChar: '"',
    step: (row, parser) => {
      const first = lineAt(start);
      const [error] = row.errors;
      if (error) {
        const at = typeof error.index === 'number' ? Math.max(error.index, start) : start;
        failure = { line: lineAt(at), reason: REASONS[error.code] ?? error.message };
        parser.abort();
        return;
      }
      start = row.meta.cursor;
      const fields = row.data;
      if (!(fields.length === 1 && fields[0] === ''))
        records.push({ line: first, fields: fields.map(restoreFormula) });
    },
  });
  return failure ? { ok: false, ...failure } : { ok: true, records };
}
