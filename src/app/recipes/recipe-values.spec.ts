import { checkRecipe, type RecipeDraft } from './recipe-values';

const DRAFT: RecipeDraft = {
  temperature: '305',
  dwellS: '12',
  pressureClass: 'medium',
  peel: 'warm',
  prePressS: '3',
  tackS: '3',
  secondPressS: '',
  notes: '',
  source: 'Supplier sheet',
};

describe('checking a recipe before it goes to the hub', () => {
  it('converts °F to whole °C', () => {
    const check = checkRecipe(DRAFT, 'imperial');

    // (305 − 32) / 1.8 = 151.67 °C, stored as 152 °C (NIST SP 811, appendix B.8)
    expect(check.ok && check.values.tempC).toBe(152);
  });

  it('refuses 460 °F, which is 238 °C, above the hub\'s 230 °C limit, and states the limit in °F', () => {
    const check = checkRecipe({ ...DRAFT, temperature: '460' }, 'imperial');

    // 230 °C × 1.8 + 32 = 446 °F; 80 °C = 176 °F (NIST SP 811, appendix B.8)
    expect(check.ok ? null : check.problems.temperature).toContain('from 176 to 446 °F');
  });

  it('refuses a dwell of 0 s or of text, a second press of 61 s, and a missing source, each with its own sentence', () => {
    const check = checkRecipe({ ...DRAFT, dwellS: 'ten', secondPressS: '61', source: ' ' }, 'metric');

    expect(check.ok).toBe(false);
    if (check.ok) return;
    expect(check.problems.dwellS).toContain('whole number of seconds');
    expect(check.problems.secondPressS).toContain('from 1 to 60 s');
    expect(check.problems.source).toContain("film supplier's sheet");
    expect(checkRecipe({ ...DRAFT, dwellS: '0' }, 'metric').ok).toBe(false);
  });

  it('sends no second press when the field is blank', () => {
    const check = checkRecipe({ ...DRAFT, temperature: '150' }, 'metric');

    expect(check.ok).toBe(true);
    expect(check.ok && check.values.secondPressS).toBeNull();
  });
});
