import { checkMediaWidth, TYPICAL_PRODUCTION_CUTTER } from '../../src/shared/cutting/media-limits';

describe('media limits', () => {
  // Common practice, no published source: a 24 in carriage takes 12 in sheets to 20 in rolls; 1 in = 25.4 mm (NIST SP 811).
  const cutter = { name: 'Cutter 1', ...TYPICAL_PRODUCTION_CUTTER };

  it('takes common 12, 15 and 20 inch rolls', () => {
    for (const inches of [12, 15, 20]) expect(checkMediaWidth(cutter, inches * 25.4)).toEqual({ fits: true });
  });

  it('refuses a roll narrower than the narrowest media with a sentence', () => {
    const check = checkMediaWidth(cutter, 254);
    expect(check).toMatchObject({ fits: false, reason: 'too-narrow' });
    expect(check.fits === false && check.sentence).toBe('Cutter 1 takes media from 305 mm (12 in) wide; this 254 mm (10 in) roll is too narrow for its pinch rollers.');
  });

  it('refuses a roll wider than the widest media, and never wider than the carriage', () => {
    expect(checkMediaWidth(cutter, 24 * 25.4)).toMatchObject({ fits: false, reason: 'too-wide' });
    expect(checkMediaWidth({ ...cutter, maxMediaMm: 1000 }, 25 * 25.4)).toMatchObject({ fits: false, reason: 'too-wide' });
  });
});
