import { PRESS_CAUTIONS } from '../../src/shared/press/cautions';
import {
  resolvePressCard,
  TEMPERATURE_MISMATCH_TOLERANCE_C,
  type CardFabric,
  type CardFilmType,
  type CardPress,
  type CardRecipe,
  type PressCardInput,
} from '../../src/shared/press/press-card';
import type { PressCard } from '../../src/shared/press/press-contract';

// Fixture data: an invented recipe book for the computation, not values to press by.
const STANDARD = 1;
const LOW_TEMP = 2;
const GLITTER = 3;
const STRETCH = 4;
const COTTON: CardFabric = { id: 10, name: '100% cotton', maxTempC: 205 };
const NYLON: CardFabric = { id: 11, name: 'Nylon', maxTempC: 130 };

const filmTypes: CardFilmType[] = [
  { id: STANDARD, name: 'Standard PU', lowTempFilmTypeId: LOW_TEMP },
  { id: LOW_TEMP, name: 'Low-temp PU', lowTempFilmTypeId: null },
  { id: GLITTER, name: 'Glitter', lowTempFilmTypeId: null },
  { id: STRETCH, name: 'Stretch PU', lowTempFilmTypeId: null },
];

let nextRecipeId = 100;
function recipe(filmTypeId: number, fabricId: number, values: Partial<CardRecipe> = {}): CardRecipe {
  return {
    id: nextRecipeId++, filmTypeId, fabricId, tempC: 150, dwellS: 12, pressureClass: 'medium', peel: 'warm',
    prePressS: 3, tackS: 2, secondPressS: null, notes: '', source: 'Fixture sheet', ...values,
  };
}

const recipes: CardRecipe[] = [
  recipe(STANDARD, COTTON.id),
  recipe(STANDARD, NYLON.id, { tempC: 150, dwellS: 10 }),
  recipe(LOW_TEMP, COTTON.id, { tempC: 135 }),
  recipe(LOW_TEMP, NYLON.id, { tempC: 125, dwellS: 10, pressureClass: 'firm', peel: 'cold' }),
  recipe(GLITTER, COTTON.id, { tempC: 160, dwellS: 15, pressureClass: 'firm', tackS: 3, source: 'Glitter fixture sheet' }),
  recipe(STRETCH, NYLON.id, { tempC: 140, dwellS: 8, peel: 'hot' }),
];

const manualPress: CardPress = { id: 1, name: 'Clamshell 15 x 15', kind: 'manual', platenWidthMm: 381, platenHeightMm: 381, boreMm: null, maxGaugeKpa: null, notes: 'Knob on top sets the pressure.' };
const airPress: CardPress = { id: 2, name: 'Air press 16 x 20', kind: 'air', platenWidthMm: 406.4, platenHeightMm: 508, boreMm: 76.2, maxGaugeKpa: 689.4757, notes: 'Gauge reads psi.' };

function input(overrides: Partial<PressCardInput> & { films?: [filmId: number, filmTypeId: number][] }): PressCardInput {
  const { films = [[501, STANDARD]], ...rest } = overrides;
  return {
    layers: films.map(([filmId, filmTypeId]) => ({ filmId, filmTypeId, colour: `colour ${filmId}` })),
    fabric: COTTON, filmTypes, recipes, press: manualPress, heatExposureLimitS: 45, units: 'imperial',
    ...rest,
  };
}

function card(overrides: Parameters<typeof input>[0]): PressCard {
  const result = resolvePressCard(input(overrides));
  if (!result.ok) throw new Error(`expected a card, got: ${result.stop.message}`);
  return result.card;
}

describe('press card resolution', () => {
  it('uses the recipe as it stands when the fabric takes its temperature', () => {
    const c = card({});
    expect(c).toMatchObject({ temperatureC: 150, temperatureF: 302, dwellS: 12, prePressS: 3, pressureClass: 'medium', peel: 'warm', capped: false });
    expect(c.steps).toEqual([{ filmId: 501, seconds: 12, kind: 'dwell' }]);
    expect(c.warnings).toEqual([]);
    expect(c.sources).toEqual(['Fixture sheet']);
  });

  it("caps the temperature at the fabric's maximum, warns in a sentence and suggests the low-temperature film", () => {
    const c = card({ fabric: NYLON });
    expect(c.temperatureC).toBe(130);
    expect(c.temperatureF).toBe(266); // 130 x 1.8 + 32 = 266 (NIST SP 811, appendix B.8)
    expect(c.capped).toBe(true);
    expect(c.warnings).toHaveLength(1);
    expect(c.warnings[0]).toMatch(/^Standard PU asks for 302 °F \(150 °C\), but Nylon takes at most 266 °F \(130 °C\)/);
    expect(c.warnings[0]).toMatch(/Low-temp PU, whose recipe for Nylon is 257 °F \(125 °C\)\./);
    expect(c.suggestions).toEqual([expect.objectContaining({ forFilmTypeId: STANDARD, filmTypeId: LOW_TEMP, filmTypeName: 'Low-temp PU', tempC: 125, tempF: 257 })]);
  });

  it('caps without a suggestion when the film has no low-temperature partner', () => {
    const c = card({ fabric: NYLON, films: [[601, STRETCH]] });
    expect(c.temperatureC).toBe(130);
    expect(c.warnings[0]).toMatch(/Stretch PU asks for .* Nylon takes at most/);
    expect(c.suggestions).toEqual([]);
  });

  it('stops and names the film type and fabric when the Recipe book has no recipe for them', () => {
    const result = resolvePressCard(input({ fabric: NYLON, films: [[501, STANDARD], [701, GLITTER]] }));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.stop.kind).toBe('missing_recipe');
    expect(result.stop.message).toMatch(/no recipe for Glitter on Nylon\./);
    expect(result.stop.message).toMatch(/does not guess a temperature/);
    expect(result.stop.missing).toEqual([{ filmTypeId: GLITTER, filmTypeName: 'Glitter', fabricId: NYLON.id, fabricName: 'Nylon' }]);
  });

  it('tacks each under-layer for its tack time and gives the last layer the full dwell', () => {
    const c = card({ films: [[501, STANDARD], [502, STANDARD], [701, GLITTER]] });
    expect(c.steps).toEqual([
      { filmId: 501, seconds: 2, kind: 'tack' },
      { filmId: 502, seconds: 2, kind: 'tack' },
      { filmId: 701, seconds: 15, kind: 'dwell' },
    ]);
    expect(c.layers.map((layer) => layer.position)).toEqual([1, 2, 3]);
    // The card's temperature is the top layer's: glitter at 160 °C.
    expect(c.temperatureC).toBe(160);
    expect(c.pressureClass).toBe('firm');
    expect(c.sources).toEqual(['Fixture sheet', 'Glitter fixture sheet']);
  });

  it(`warns when an under-layer's recipe is more than ${TEMPERATURE_MISMATCH_TOLERANCE_C} °C from the card's temperature`, () => {
    // Standard at 150 °C under glitter at 160 °C: 10 °C apart.
    expect(card({ films: [[501, STANDARD], [701, GLITTER]] }).warnings).toEqual([expect.stringMatching(/under-layer Standard PU colour 501 has a recipe at 302 °F \(150 °C\), but the card uses the top layer's 320 °F \(160 °C\)/)]);
    // Two layers of the same film: no warning.
    expect(card({ films: [[501, STANDARD], [502, STANDARD]] }).warnings).toEqual([]);
  });

  it('sums pre-press, every tack, the final dwell and the second press as the heat per garment', () => {
    const withSecond = recipes.map((r) => (r.filmTypeId === GLITTER ? { ...r, secondPressS: 5 } : r));
    const c = card({ recipes: withSecond, films: [[501, STANDARD], [502, STANDARD], [701, GLITTER]] });
    // 3 s pre-press + 2 + 2 s tacks + 15 s dwell + 5 s second press = 27 s
    expect(c.totalHeatS).toBe(27);
    expect(c.secondPressS).toBe(5);
  });

  it("warns when the heat per garment is over the shop's limit, and not when it is at the limit", () => {
    const films: [number, number][] = [[501, STANDARD], [502, STANDARD], [701, GLITTER]]; // 22 s in all
    expect(card({ films, heatExposureLimitS: 22 }).warnings.filter((w) => /heat in all/.test(w))).toEqual([]);
    const over = card({ films, heatExposureLimitS: 20 });
    expect(over.warnings).toContainEqual("Each garment gets 22 s of heat in all, more than the shop's limit of 20 s: the fabric may scorch, shine or bleed. Check with a lead before pressing.");
  });

  it('warns when an under-layer has no tack time', () => {
    const noTack = recipes.map((r) => (r.filmTypeId === GLITTER ? { ...r, tackS: 0 } : r));
    const c = card({ recipes: noTack, films: [[701, GLITTER], [501, STANDARD]] });
    expect(c.warnings).toContainEqual(expect.stringMatching(/Glitter has no tack time .* top layer only/));
  });

  it("shows the class and the shop's note on a manual press, without a gauge", () => {
    const c = card({});
    expect(c.gauge).toBeUndefined();
    expect(c.press).toEqual({ id: 1, name: 'Clamshell 15 x 15', kind: 'manual', note: 'Knob on top sets the pressure.' });
  });

  it('gives the gauge setting for the pressure class on an air press', () => {
    const c = card({ press: airPress });
    // Medium is 1.0 psi on the platen (rule of thumb): 1.0 x 320 in² / (π x 1.5² = 7.0686 in²) = 45.27 psi on the gauge.
    expect(c.gauge).toEqual({ gaugePsi: 45.3, gaugeKPa: 312.1, platenPsi: 1, forceLbf: 320, forceN: 1423.4 });
    expect(c.display.gauge).toEqual({ primary: '45 psi', secondary: '312 kPa' });
    expect(c.sources).toContainEqual(expect.stringMatching(/no published source/));
  });

  it("stops when the pressure class needs more than the press's rated gauge", () => {
    const weak = { ...airPress, maxGaugeKpa: 275.79 }; // 40 psi
    const result = resolvePressCard(input({ press: weak }));
    expect(result).toEqual({ ok: false, stop: { kind: 'press_not_usable', message: expect.stringMatching(/Medium pressure needs more .* 45\.3 psi .* above the 40 psi/) } });
  });

  it('always shows the safety cautions, and not the cutter blade one', () => {
    const c = card({});
    expect(c.cautions).toEqual([...PRESS_CAUTIONS]);
    const all = c.cautions.join(' ');
    expect(all).toMatch(/Hot platen/);
    expect(all).toMatch(/Pinch point/);
    expect(all).toMatch(/ventilate/i);
    expect(all).toMatch(/film supplier's instructions and your local workplace safety rules/);
    expect(all).not.toMatch(/blade/i);
  });

  it('stops when there are no layers', () => {
    expect(resolvePressCard(input({ films: [] }))).toEqual({ ok: false, stop: expect.objectContaining({ kind: 'no_layers' }) });
  });
});
