import { BAG_TOKEN_PATTERN, newBagToken, toBase64Url } from '../../src/shared/intake/bag-token';

describe('bag tokens', () => {
  it('are 43 url-safe characters and unique across 100,000', () => {
    const seen = new Set<string>();
    for (let i = 0; i < 100_000; i++) {
      const token = newBagToken();
      expect(token).toMatch(BAG_TOKEN_PATTERN);
      seen.add(token);
    }
    expect(seen.size).toBe(100_000);
  });

  it('encode bytes exactly as Node encodes base64url', () => {
    // Independent reference: Node's Buffer base64url (RFC 4648, section 5).
    for (const length of [0, 1, 2, 3, 31, 32, 33]) {
      const bytes = Uint8Array.from({ length }, (_, i) => (i * 37 + length) & 255);
      expect(toBase64Url(bytes)).toBe(Buffer.from(bytes).toString('base64url'));
    }
  });
});
