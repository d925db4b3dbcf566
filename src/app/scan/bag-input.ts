import { isBagTokenShape } from '../../shared/intake/bag-token';

/** What a scan or a typed entry names: a bag by its QR token or by its printed code. */
export type BagReference = { token: string } | { code: string };

/** Bag codes as printed on labels: the order number, a dash, the bag letter(s), e.g. "1043-B". */
const BAG_CODE = /^(\d{1,8})\s*-\s*([A-Za-z]{1,3})$/;

/** A label from somewhere else: the sentence to show instead of looking it up. */
export interface ForeignLabel {
  refused: string;
}

/**
 * Reads a bag reference from a QR text, a bag URL, a bare token or a typed code; null when it is none of these.
 * With `origin` (this hub's address), a bag URL from another address is refused with a sentence.
 */
export function parseBagInput(text: string, origin?: string): BagReference | ForeignLabel | null {
  const trimmed = text.trim();
  if (!trimmed) return null;
  if (origin && /^https?:\/\//i.test(trimmed)) {
    let url: URL | null = null;
    try {
      url = new URL(trimmed);
    } catch {
      return null;
    }
    if (url.origin !== new URL(origin).origin) {
      return { refused: `This label is from another address (${url.host}), not this shop's Dwell. Scan a bag label printed here.` };
    }
  }
  const fromUrl = /\/bag\/([A-Za-z0-9_-]+)\/?(?:[?#].*)?$/.exec(trimmed);
  if (fromUrl) return isBagTokenShape(fromUrl[1]!) ? { token: fromUrl[1]! } : null;
  if (isBagTokenShape(trimmed)) return { token: trimmed };
  const code = BAG_CODE.exec(trimmed);
  if (code) return { code: `${code[1]}-${code[2]!.toUpperCase()}` };
  return null;
}

/** Tells a USB scanner (a keyboard that types very fast, then Enter) from a person typing. */
export class KeystrokeBurst {
  private chars = '';
  private lastAt = -Infinity;
  private slow = false;

  /** `maxGapMs`: a scanner types a character every few ms; people take 80 ms or more between keys. */
  constructor(private readonly maxGapMs = 35, private readonly minLength = 4) {}

  /** Feeds one key; returns the scanned text when Enter ends a fast burst, else null. */
  key(key: string, at: number): string | null {
    const gap = at - this.lastAt;
    this.lastAt = at;
    if (key === 'Enter') {
      const text = this.chars;
      const fast = !this.slow && gap <= this.maxGapMs * 3;
      this.reset();
      return fast && text.length >= this.minLength ? text : null;
    }
    if (key.length !== 1) return null;
    if (this.chars && gap > this.maxGapMs) {
      // A pause longer than a scanner makes starts a new burst.
      this.chars = '';
      this.slow = false;
    }
    this.chars += key;
    return null;
  }

  private reset(): void {
    this.chars = '';
    this.slow = false;
    this.lastAt = -Infinity;
  }
}
