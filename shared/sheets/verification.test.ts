import { createHash } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  base32,
  formatVerificationCode,
  normaliseVerificationCode,
  verificationCode,
  verificationUrl,
} from './verification';

const bytes = (s: string) => new TextEncoder().encode(s);

describe('verification codes', () => {
  it('encodes base32 as RFC 4648 §10 test vectors (padding left off)', () => {
    expect(base32(bytes(''))).toBe('');
    expect(base32(bytes('f'))).toBe('MY');
    expect(base32(bytes('fo'))).toBe('MZXQ');
    expect(base32(bytes('foo'))).toBe('MZXW6');
    expect(base32(bytes('foob'))).toBe('MZXW6YQ');
    expect(base32(bytes('fooba'))).toBe('MZXW6YTB');
    expect(base32(bytes('foobar'))).toBe('MZXW6YTBOI');
  });

  it('takes the first 10 base32 characters of the run hash', () => {
    // SHA-256("foobar") = c3ab8ff1 3720e8ad …; base32 of c3 ab 8f f1 37 20 → YOVY74JXED (worked by hand: 11000 01110 10101 11000 11111 11100 01001 10111 00100 00011)
    const hash = createHash('sha256').update('foobar').digest('hex');
    expect(hash.startsWith('c3ab8ff13720e8ad')).toBe(true);
    expect(verificationCode(hash)).toBe('YOVY74JXED');
    expect(verificationCode(hash)).toBe(base32(Buffer.from(hash, 'hex')).slice(0, 10));
    expect(() => verificationCode('not hex')).toThrow();
  });

  it('prints grouped and reads back in any case, with or without the hyphen', () => {
    expect(formatVerificationCode('YOVY74JXED')).toBe('YOVY7-4JXED');
    expect(normaliseVerificationCode('yovy7-4jxed')).toBe('YOVY74JXED');
    expect(normaliseVerificationCode(' YOVY7 4JXED ')).toBe('YOVY74JXED');
    // 0, 1, 8 and 9 are not base32 letters; wrong lengths are not codes.
    expect(normaliseVerificationCode('YOVY74JXE0')).toBeNull();
    expect(normaliseVerificationCode('YOVY74JXE')).toBeNull();
    expect(normaliseVerificationCode('YOVY74JXEDD')).toBeNull();
    expect(normaliseVerificationCode('../../etc')).toBeNull();
    expect(verificationUrl('http://localhost:5180/', 'YOVY74JXED')).toBe(
      'http://localhost:5180/verify/YOVY74JXED',
    );
  });

  it('always yields a well-formed code for any hash', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 32, maxLength: 32 }), (b) => {
        const code = verificationCode(Buffer.from(b).toString('hex'));
        expect(normaliseVerificationCode(formatVerificationCode(code))).toBe(code);
      }),
    );
  });
});
