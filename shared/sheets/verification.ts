/*
 * Verification codes of compliance sheets. A code is the first 10 characters of the RFC 4648 base32
 * encoding of the run's stored SHA-256 `hash` (50 bits), so anyone holding the run can derive it and a
 * changed run can never keep its code. Shown grouped "ABCDE-FGHIJ"; typed in any case, with or without
 * the hyphen or spaces.
 */

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ234567';
export const VERIFICATION_CODE_LENGTH = 10;

/** RFC 4648 base32 (no padding) of bytes. */
export function base32(bytes: Uint8Array): string {
  let out = '';
  let buffer = 0;
  let bits = 0;
  for (const byte of bytes) {
    buffer = (buffer << 8) | byte;
    bits += 8;
    while (bits >= 5) {
      out += ALPHABET[(buffer >>> (bits - 5)) & 31];
      bits -= 5;
    }
    buffer &= (1 << bits) - 1;
  }
  if (bits > 0) out += ALPHABET[(buffer << (5 - bits)) & 31];
  return out;
}

function hexBytes(hex: string): Uint8Array {
  if (!/^(?:[0-9a-f]{2})+$/i.test(hex)) throw new Error('the run hash must be hexadecimal');
  const bytes = new Uint8Array(hex.length / 2);
  for (let i = 0; i < bytes.length; i++) bytes[i] = Number.parseInt(hex.slice(2 * i, 2 * i + 2), 16);
  return bytes;
}

/** The code of a run from its SHA-256 hash (hex): 10 base32 characters, e.g. `K3QF7ZC2MA`. */
export const verificationCode = (hashHex: string): string =>
  base32(hexBytes(hashHex)).slice(0, VERIFICATION_CODE_LENGTH);

/** `K3QF7ZC2MA` → `K3QF7-ZC2MA`, as printed on the sheet. */
export const formatVerificationCode = (code: string): string => `${code.slice(0, 5)}-${code.slice(5)}`;

/** A typed or scanned code in canonical form, or null when it cannot be a code at all. */
export function normaliseVerificationCode(input: string): string | null {
  const code = input.replace(/[\s-]/g, '').toUpperCase();
  return code.length === VERIFICATION_CODE_LENGTH && /^[A-Z2-7]+$/.test(code) ? code : null;
}

/** The public page that confirms a sheet: `<APP_URL>/verify/<code>`. */
export const verificationUrl = (appUrl: string, code: string): string =>
  `${appUrl.replace(/\/+$/, '')}/verify/${code}`;

/** How a sheet and the verification page word the issuer's standing (a firm's name alone proves nothing). */
export const ISSUER_VERIFIED = 'verified by Skinwright’s site administrator';
export const ISSUER_NOT_VERIFIED = 'issuer not verified by Skinwright’s site administrator';
