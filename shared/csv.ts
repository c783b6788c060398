/**
 * Comma-separated values as RFC 4180 defines them (§2): records end with CRLF (LF alone is accepted on
 * input), fields holding a comma, a double quote, CR or LF are enclosed in double quotes, and a double
 * quote inside such a field is written twice. Pure: no I/O.
 */

/** RFC 4180 §2: a field holding a comma, a double quote, CR or LF is quoted, inner quotes doubled. */
export const csvField = (field: string): string =>
  /[",\r\n]/.test(field) ? `"${field.replaceAll('"', '""')}"` : field;

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
 * field may span lines. Refused, with the line: a quote that is never closed, and characters between a
 * closing quote and the next comma or line end.
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
      fields.push(field);
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
