import { KeystrokeBurst, parseBagInput } from './bag-input';

const TOKEN = 'Ab3_dE-fGh1jKlMnOpQrStUvWxYz0123456789abcde';
const ORIGIN = 'https://hub.dwell.test:4200';

describe('parseBagInput', () => {
  it('has a 43-character token to work with', () => {
    expect(TOKEN).toHaveLength(43);
  });

  it('reads the token from a bag label address of this hub', () => {
    expect(parseBagInput(`${ORIGIN}/bag/${TOKEN}`, ORIGIN)).toEqual({ token: TOKEN });
    expect(parseBagInput(`  ${ORIGIN}/bag/${TOKEN}/?from=label  `, ORIGIN)).toEqual({ token: TOKEN });
  });

  it('reads a bare token', () => {
    expect(parseBagInput(TOKEN, ORIGIN)).toEqual({ token: TOKEN });
  });

  it('reads a typed bag code in any case and with spaces', () => {
    expect(parseBagInput('1043-B')).toEqual({ code: '1043-B' });
    expect(parseBagInput(' 1043 - b ')).toEqual({ code: '1043-B' });
    expect(parseBagInput('1043-ab', ORIGIN)).toEqual({ code: '1043-AB' });
  });

  it('refuses a bag address from another hub with a sentence naming that address', () => {
    const result = parseBagInput(`https://elsewhere.example/bag/${TOKEN}`, ORIGIN);
    expect(result).toEqual({ refused: expect.stringContaining('elsewhere.example') });
    expect((result as { refused: string }).refused).toMatch(/another address/);
  });

  it('names nothing for text that is neither a code, a token nor a bag address', () => {
    expect(parseBagInput('')).toBeNull();
    expect(parseBagInput('hello there')).toBeNull();
    expect(parseBagInput(`${ORIGIN}/bag/short`, ORIGIN)).toBeNull();
    expect(parseBagInput('1043B')).toBeNull();
  });
});

describe('KeystrokeBurst', () => {
  function feed(burst: KeystrokeBurst, text: string, gapMs: number, start = 1000): string | null {
    let at = start;
    let out: string | null = null;
    for (const key of [...text, 'Enter']) {
      out = burst.key(key, at);
      at += gapMs;
    }
    return out;
  }

  it('takes a fast burst of keys ending in Enter as a scan', () => {
    expect(feed(new KeystrokeBurst(), '1043-C', 8)).toBe('1043-C');
  });

  it('takes slow typing as typing, not as a scan', () => {
    expect(feed(new KeystrokeBurst(), '1043-C', 150)).toBeNull();
  });

  it('starts a new burst after a pause, so typed keys before a scan do not join it', () => {
    const burst = new KeystrokeBurst();
    burst.key('x', 0);
    burst.key('y', 200);
    expect(feed(burst, '1041-A', 5, 2000)).toBe('1041-A');
  });

  it('ignores shift and other named keys inside a burst', () => {
    const burst = new KeystrokeBurst();
    let at = 0;
    for (const key of ['1', '0', '4', '3', '-', 'Shift', 'C']) burst.key(key, (at += 6));
    expect(burst.key('Enter', at + 6)).toBe('1043-C');
  });
});
