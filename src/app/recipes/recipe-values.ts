import { PEEL_KINDS, PRESSURE_CLASSES, type PeelKind, type PressureClass } from '../../shared/names';
import type { RecipeListItem, RecipeValues } from '../../shared/press/press-contract';
import { celsiusToFahrenheit, fahrenheitToCelsius, type ShopUnits } from '../../shared/press/units';

/** The hub's limits for a recipe (server/press/press-schemas.ts), checked here first so the sentence sits by the field. */
export const RECIPE_LIMITS = { minTempC: 80, maxTempC: 230, minDwellS: 1, maxDwellS: 120, maxStepS: 60 } as const;

/** The edit form as typed: text from the fields, temperature in the shop's units. */
export interface RecipeDraft {
  temperature: string;
  dwellS: string;
  pressureClass: PressureClass | '';
  peel: PeelKind | '';
  prePressS: string;
  tackS: string;
  secondPressS: string;
  notes: string;
  source: string;
}

/** A field of the form. */
export type RecipeField = keyof RecipeDraft;

/** The answer of checking a draft: the values to send, or a sentence per bad field. */
export type RecipeCheck = { ok: true; values: RecipeValues } | { ok: false; problems: Partial<Record<RecipeField, string>> };

/** The form's starting text for a recipe, with the temperature in the shop's units. */
export function draftFrom(recipe: RecipeListItem, units: ShopUnits): RecipeDraft {
  return {
    temperature: String(units === 'imperial' ? Math.round(celsiusToFahrenheit(recipe.tempC)) : recipe.tempC),
    dwellS: String(recipe.dwellS),
    pressureClass: recipe.pressureClass,
    peel: recipe.peel,
    prePressS: String(recipe.prePressS),
    tackS: String(recipe.tackS),
    secondPressS: recipe.secondPressS === null ? '' : String(recipe.secondPressS),
    notes: recipe.notes,
    source: recipe.source,
  };
}

const WHOLE = /^\d+$/;

function seconds(text: string, what: string, min: number, max: number, problems: Partial<Record<RecipeField, string>>, field: RecipeField): number | null {
  const trimmed = text.trim();
  if (!WHOLE.test(trimmed)) {
    problems[field] = `${what} is a whole number of seconds, from ${min} to ${max}.`;
    return null;
  }
  const value = Number(trimmed);
  if (value < min || value > max) problems[field] = `${what} must be from ${min} to ${max} s; ${value} s is outside that.`;
  return value;
}

/** Checks a draft against the hub's limits and turns it into stored units (°C, whole seconds). */
export function checkRecipe(draft: RecipeDraft, units: ShopUnits): RecipeCheck {
  const problems: Partial<Record<RecipeField, string>> = {};
  const unit = units === 'imperial' ? '°F' : '°C';
  const shown = (celsius: number) => (units === 'imperial' ? Math.round(celsiusToFahrenheit(celsius)) : celsius);
  const range = `from ${shown(RECIPE_LIMITS.minTempC)} to ${shown(RECIPE_LIMITS.maxTempC)} ${unit}`;

  let tempC = 0;
  const temperatureText = draft.temperature.trim().replace(',', '.');
  if (!/^\d+(\.\d+)?$/.test(temperatureText)) {
    problems.temperature = `Temperature is a number of ${unit}, ${range}.`;
  } else {
    const typed = Number(temperatureText);
    // The hub stores whole °C; a °F entry is converted and rounded to the nearest degree Celsius.
    tempC = Math.round(units === 'imperial' ? fahrenheitToCelsius(typed) : typed);
    if (tempC < RECIPE_LIMITS.minTempC || tempC > RECIPE_LIMITS.maxTempC) {
      problems.temperature = `Temperature must be ${range}; ${typed} ${unit} is outside what heat-transfer films take.`;
    }
  }
  const dwellS = seconds(draft.dwellS, 'Dwell', RECIPE_LIMITS.minDwellS, RECIPE_LIMITS.maxDwellS, problems, 'dwellS');
  const prePressS = seconds(draft.prePressS || '0', 'Pre-press', 0, RECIPE_LIMITS.maxStepS, problems, 'prePressS');
  const tackS = seconds(draft.tackS || '0', 'Tack', 0, RECIPE_LIMITS.maxStepS, problems, 'tackS');
  const secondPressS = draft.secondPressS.trim() === '' ? null : seconds(draft.secondPressS, 'Second press', 1, RECIPE_LIMITS.maxStepS, problems, 'secondPressS');
  if (!PRESSURE_CLASSES.includes(draft.pressureClass as PressureClass)) problems.pressureClass = 'Pick a pressure: light, medium, firm or heavy.';
  if (!PEEL_KINDS.includes(draft.peel as PeelKind)) problems.peel = 'Pick a peel: hot, warm or cold.';
  if (draft.notes.trim().length > 2000) problems.notes = 'Notes are at most 2000 characters.';
  const source = draft.source.trim();
  if (!source) problems.source = "Say where the values came from, e.g. the film supplier's sheet.";
  else if (source.length > 240) problems.source = 'The source is at most 240 characters.';

  if (Object.keys(problems).length > 0) return { ok: false, problems };
  return {
    ok: true,
    values: {
      tempC,
      dwellS: dwellS!,
      pressureClass: draft.pressureClass as PressureClass,
      peel: draft.peel as PeelKind,
      prePressS: prePressS!,
      tackS: tackS!,
      secondPressS,
      notes: draft.notes.trim(),
      source,
    },
  };
}

/** Hub field names (`tempC`, `dwellS` ...) to the form's fields, so a refused save marks the right field. */
export function fieldOfHubPath(path: string): RecipeField | null {
  if (path === 'tempC') return 'temperature';
  const fields: RecipeField[] = ['dwellS', 'pressureClass', 'peel', 'prePressS', 'tackS', 'secondPressS', 'notes', 'source'];
  return fields.find((field) => field === path) ?? null;
}
