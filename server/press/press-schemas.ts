import { z } from 'zod';
import { PEEL_KINDS, PRESSURE_CLASSES } from '../../src/shared/names';

/** Sane limits for the Recipe book: heat-transfer films press between about 80 and 230 °C, for 1 to 120 s. */
export const RECIPE_LIMITS = { minTempC: 80, maxTempC: 230, minDwellS: 1, maxDwellS: 120, maxStepS: 60 } as const;

const id = (what: string) => z.number({ error: `${what} is a whole number.` }).int(`${what} is a whole number.`).positive(`${what} is a whole number above zero.`);
const inches = (what: string) => z.number({ error: `${what} is a number of inches.` }).positive(`${what} must be more than zero inches.`).max(200, `${what} is over 200 inches: check the unit.`);
const psi = (what: string) => z.number({ error: `${what} is a number of psi.` }).min(0, `${what} cannot be below zero.`).max(1000, `${what} is over 1000 psi: check the unit.`);
const seconds = (what: string, min: number, max: number) =>
  z.number({ error: `${what} is a whole number of seconds.` }).int(`${what} is a whole number of seconds.`).min(min, `${what} is at least ${min} s.`).max(max, `${what} is at most ${max} s.`);

/** POST /api/press-cards */
export const pressCardBody = z.object({ bagId: id('bagId'), pressId: id('pressId') });

/** POST /api/press-cards/preview: film ids in pressing order, bottom first. */
export const previewBody = z.object({
  layers: z.array(id('Each layer'), { error: 'layers is a list of film ids, bottom layer first.' }).min(1, 'A press card needs at least one layer.').max(8, 'A design has at most 8 layers.'),
  fabricId: id('fabricId'),
  pressId: id('pressId'),
});

/** POST /api/press-cards/gauge */
export const gaugeBody = z.object({
  boreIn: inches('boreIn'),
  platenWidthIn: inches('platenWidthIn'),
  platenHeightIn: inches('platenHeightIn'),
  gaugePsi: psi('gaugePsi'),
  maxGaugePsi: psi('maxGaugePsi').positive('maxGaugePsi must be more than zero.').optional(),
  target: z
    .object({
      platenWidthIn: inches('target.platenWidthIn'),
      platenHeightIn: inches('target.platenHeightIn'),
      boreIn: inches('target.boreIn').optional(),
      maxGaugePsi: psi('target.maxGaugePsi').positive('target.maxGaugePsi must be more than zero.').optional(),
    })
    .optional(),
});

/** PUT /api/recipes/:id: the values of a recipe (stored units: °C and s). */
export const recipeValuesBody = z.object({
  tempC: z
    .number({ error: 'tempC is the temperature in °C.' })
    .int('tempC is a whole number of °C.')
    .min(RECIPE_LIMITS.minTempC, `tempC must be at least ${RECIPE_LIMITS.minTempC} °C.`)
    .max(RECIPE_LIMITS.maxTempC, `tempC must be at most ${RECIPE_LIMITS.maxTempC} °C.`),
  dwellS: seconds('dwellS', RECIPE_LIMITS.minDwellS, RECIPE_LIMITS.maxDwellS),
  pressureClass: z.enum(PRESSURE_CLASSES, { error: `pressureClass is one of ${PRESSURE_CLASSES.join(', ')}.` }),
  peel: z.enum(PEEL_KINDS, { error: `peel is one of ${PEEL_KINDS.join(', ')}.` }),
  prePressS: seconds('prePressS', 0, RECIPE_LIMITS.maxStepS).default(0),
  tackS: seconds('tackS', 0, RECIPE_LIMITS.maxStepS).default(0),
  secondPressS: seconds('secondPressS', 1, RECIPE_LIMITS.maxStepS).nullable().default(null),
  notes: z.string({ error: 'notes is text.' }).trim().max(2000, 'notes is at most 2000 characters.').default(''),
  source: z.string({ error: "source says where the values came from, e.g. the film supplier's sheet." }).trim().min(1, "source says where the values came from, e.g. the film supplier's sheet.").max(240, 'source is at most 240 characters.'),
});

/** POST /api/recipes */
export const recipeCreateBody = recipeValuesBody.extend({ filmTypeId: id('filmTypeId'), fabricId: id('fabricId') });

/** The values of a recipe as the router hands them on. */
export type RecipeValuesInput = z.infer<typeof recipeValuesBody>;
