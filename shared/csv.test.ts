import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { csvField, parseCsv, toCsv } from './csv';

describe('RFC 4180 CSV', () => {
  it('quotes only fields that need it and doubles inner quotes', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(
      toCsv([
        ['a', 'b'],
        ['1', ''],
      ]),
    ).toBe('a,b\r\n1,\r\n');
  });

  it('parses quoted fields across lines and reports the line each record starts on', () => {
    const r = parseCsv('\ufeffh1,h2\r\n"two\nlines",x\r\n\r\nlast,"q ""x"""');
    expect(r).toEqual({
      ok: true,
      records: [
        { line: 1, fields: ['h1', 'h2'] },
        { line: 2, fields: ['two\nlines', 'x'] },
        { line: 5, fields: ['last', 'q "x"'] },
      ],
    });
  });

  it('refuses an unclosed quote and text after a closing quote, with the line', () => {
    expect(parseCsv('a\nb,"open\nstill')).toEqual({
      ok: false,
      line: 2,
      reason: 'a quoted field is never closed',
    });
    expect(parseCsv('a\n"x"y,z')).toMatchObject({ ok: false, line: 2 });
    // The line of the problem, after a quoted field spanning lines.
    expect(parseCsv('h\r\n"one\r\ntwo",x\r\nok\r\n"open')).toEqual({
      ok: false,
      line: 5,
      reason: 'a quoted field is never closed',
    });
  });

  it('reads a file with LF line ends as one with CRLF', () => {
    expect(parseCsv('a,b\n\n"c\nd",e\n')).toEqual({
      ok: true,
      records: [
        { line: 1, fields: ['a', 'b'] },
        { line: 3, fields: ['c\nd', 'e'] },
      ],
    });
  });

  it('neutralises text a spreadsheet would run as a formula, leaves numbers alone and reads both back', () => {
    // OWASP "CSV Injection": cells starting with = + - @, tab or CR.
    const cells = [
      '=1+1',
      '+SUM(A1)',
      '-2+3',
      '@cmd',
      '\tx',
      '\rx',
      "'=already",
      '-3.5',
      '+2',
      '1e-7',
      'a=b',
    ];
    const text = toCsv([cells]);
    expect(text).toBe(`'=1+1,'+SUM(A1),'-2+3,'@cmd,'\tx,"'\rx",''=already,-3.5,+2,1e-7,a=b\r\n`);
    expect(parseCsv(text)).toEqual({ ok: true, records: [{ line: 1, fields: cells }] });
  });

  it('reads back what it writes (any text, any shape)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(fc.string({ unit: 'binary' }), { minLength: 1, maxLength: 5 }), { maxLength: 8 }),
        (records) => {
          // A record whose only field is empty is a blank line, which the parser skips (RFC 4180 has no way to tell).
          const kept = records.filter((r) => !(r.length === 1 && r[0] === ''));
          const parsed = parseCsv(toCsv(kept));
          expect(parsed.ok && parsed.records.map((r) => r.fields)).toEqual(kept);
        },
      ),
    );
  });
});
