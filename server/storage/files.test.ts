import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { detectAllowedType, displayName, withTypeExtension } from './files';

describe('display names of uploads', () => {
  it('keeps only the last path part and drops control and bidi characters', () => {
    expect(displayName('../../etc/passwd')).toBe('passwd');
    expect(displayName('C:\\Users\\x\\Desktop\\site photo.png')).toBe('site photo.png');
    expect(displayName('rep\u0000ort\u0007.pdf')).toBe('report.pdf');
    expect(displayName('invoice\u202egpj.exe')).toBe('invoicegpj.exe');
    expect(displayName('  ..hidden  name .pdf ')).toBe('hidden name .pdf');
    expect(displayName('../')).toBe('file');
    expect(displayName('\u0000\u0001')).toBe('file');
    expect(displayName('naïve façade.pdf')).toBe('naïve façade.pdf');
    const long = `${'a'.repeat(300)}.pdf`;
    expect(displayName(long)).toHaveLength(180);
    expect(displayName(long).endsWith('.pdf')).toBe(true);
  });

  it('never returns a path, a control character or an empty name', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 400 }), (raw) => {
        const name = displayName(raw);
        expect(name.length).toBeGreaterThan(0);
        expect(name.length).toBeLessThanOrEqual(180);
        expect(name).not.toMatch(/[/\\]/);
        for (const ch of name) {
          const cp = ch.codePointAt(0)!;
          expect(cp <= 0x1f || (cp >= 0x7f && cp <= 0x9f) || (cp >= 0x202a && cp <= 0x202e)).toBe(false);
        }
        expect(name.startsWith('.')).toBe(false);
      }),
    );
  });

  it('adds the extension of the detected type when the name says otherwise', () => {
    expect(withTypeExtension('photo.pdf', 'image/png')).toBe('photo.pdf.png');
    expect(withTypeExtension('scan.JPEG', 'image/jpeg')).toBe('scan.JPEG');
    expect(withTypeExtension('report.pdf', 'application/pdf')).toBe('report.pdf');
  });
});

describe('upload types are judged by content', () => {
  it('accepts PDF, PNG, JPEG and DWG and refuses anything else, whatever the name', async () => {
    expect(await detectAllowedType(Buffer.from('%PDF-1.7\n%âãÏÓ\n'), 'a.txt')).toBe('application/pdf');
    expect(await detectAllowedType(Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex'), 'x')).toBe(
      'image/png',
    );
    expect(await detectAllowedType(Buffer.from('ffd8ffe000104a464946', 'hex'), 'x')).toBe('image/jpeg');
    expect(await detectAllowedType(Buffer.concat([Buffer.from('AC1032'), Buffer.alloc(64)]), 'x')).toBe(
      'image/vnd.dwg',
    );
    await expect(detectAllowedType(Buffer.from('hello'), 'fake.pdf')).rejects.toMatchObject({
      kind: 'unsupported',
      code: 'unsupported_type',
    });
    await expect(detectAllowedType(Buffer.from('504b030414000000', 'hex'), 'a.pdf')).rejects.toMatchObject({
      kind: 'unsupported',
    });
    await expect(detectAllowedType(Buffer.alloc(0), 'empty.pdf')).rejects.toMatchObject({
      kind: 'malformed',
      code: 'empty_file',
    });
  });
});
