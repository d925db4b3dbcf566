/** Bytes of randomness in a bag token: 256 bits, well past the 128 an unguessable token needs. */
export const BAG_TOKEN_BYTES = 32;
/** A bag token is 43 base64url characters (32 bytes, no padding). */
export const BAG_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

const BASE64URL = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';

/** Encodes bytes as base64url without padding (RFC 4648, section 5). */
export function toBase64Url(bytes: Uint8Array): string {
  let out = '';
  for (let i = 0; i < bytes.length; i += 3) {
    const a = bytes[i]!;
    const b = bytes[i + 1];
    const c = bytes[i + 2];
    out += BASE64URL[a >> 2]!;
    out += BASE64URL[((a & 3) << 4) | ((b ?? 0) >> 4)]!;
    if (b !== undefined) out += BASE64URL[((b & 15) << 2) | ((c ?? 0) >> 6)]!;
    if (c !== undefined) out += BASE64URL[c & 63]!;
  }
  return out;
}

/** A fresh unguessable bag token for the QR code: 32 random bytes from the platform's CSPRNG, base64url. */
export function newBagToken(): string {
  const bytes = new Uint8Array(BAG_TOKEN_BYTES);
  globalThis.crypto.getRandomValues(bytes);
  return toBase64Url(bytes);
}

/** Whether text has the shape of a bag token (says nothing about whether the bag exists). */
export function isBagTokenShape(text: string): boolean {
  return BAG_TOKEN_PATTERN.test(text);
}
