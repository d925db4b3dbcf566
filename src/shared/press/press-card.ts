import type { PeelKind, PressureClass } from '../names';
import { geometryProblems, maxGaugePsiFromKpa, overMaximumProblem, readingForPressureClass, type AirPressGeometry } from './air-press';
import { pressCautions } from './cautions';
import { forceReading, pressureReading, temperatureReading } from './dual-units';
import type { LowTempSuggestion, PressCard, PressCardLayer, PressGauge, PressStep, RecipeRecord } from './press-contract';
import { celsiusToFahrenheit, mmToInches, roundTo, type ShopUnits } from './units';

/**
 * How far (°C) an under-layer's recipe may be from the card's temperature before the card warns.
 * Rule of thumb (common practice, no published source): a platen's face varies by a few degrees
 * from centre to edge, so differences within 5 °C are inside what any press already does.
 */
export const TEMPERATURE_MISMATCH_TOLERANCE_C = 5;

/** The source line added when an air press's gauge comes from the pressure-class targets. */
export const PRESSURE_CLASS_SOURCE = 'Platen pressure per pressure class: rule of thumb, common practice, no published source.';

/** A film as laid on the garment. */
export interface CardFilm {
  filmId: number;
  filmTypeId: number;
  colour: string;
}

/** A film type with its low-temperature partner, if the shop named one. */
export interface CardFilmType {
  id: number;
  name: string;
  lowTempFilmTypeId: number | null;
}

/** A Recipe book entry in stored units (°C, s). */
export type CardRecipe = RecipeRecord;

/** The garment's fabric and the hottest it takes. */
export interface CardFabric {
  id: number;
  name: string;
  maxTempC: number;
}

/** A press in stored units (mm, kPa). */
export interface CardPress {
  id: number;
  name: string;
  kind: 'manual' | 'air';
  platenWidthMm: number;
  platenHeightMm: number;
  boreMm: number | null;
  maxGaugeKpa: number | null;
  notes: string;
}

/** Everything the card is resolved from: plain data, no database. */
export interface PressCardInput {
  /** In pressing order: the first is the bottom layer, the last the top. */
  layers: CardFilm[];
  fabric: CardFabric;
  filmTypes: CardFilmType[];
  recipes: CardRecipe[];
  press: CardPress;
  heatExposureLimitS: number;
  units: ShopUnits;
}

/** Why no card can be made; the message is a sentence a person can act on. */
export interface PressCardStop {
  kind: 'no_layers' | 'missing_recipe' | 'press_not_usable';
  message: string;
  missing?: { filmTypeId: number; filmTypeName: string; fabricId: number; fabricName: string }[];
}

/** A resolved card, or the reason there is none. */
export type PressCardResult = { ok: true; card: PressCard } | { ok: false; stop: PressCardStop };

interface ResolvedLayer {
  film: CardFilm;
  type: CardFilmType;
  recipe: CardRecipe;
}

/** "150 °C (302 °F)" or "302 °F (150 °C)", in the shop's units first. */
function temperatureText(celsius: number, units: ShopUnits): string {
  const reading = temperatureReading(celsius, units);
  return `${reading.primary} (${reading.secondary})`;
}

function filmTypeName(types: Map<number, CardFilmType>, id: number): string {
  return types.get(id)?.name ?? `film type ${id}`;
}

/** Picks each layer's recipe, or says which film x fabric pairs the Recipe book lacks. */
function resolveLayers(input: PressCardInput, types: Map<number, CardFilmType>): ResolvedLayer[] | PressCardStop {
  const resolved: ResolvedLayer[] = [];
  const missing: NonNullable<PressCardStop['missing']> = [];
  for (const film of input.layers) {
    const recipe = input.recipes.find((r) => r.filmTypeId === film.filmTypeId && r.fabricId === input.fabric.id);
    const type = types.get(film.filmTypeId) ?? { id: film.filmTypeId, name: filmTypeName(types, film.filmTypeId), lowTempFilmTypeId: null };
    if (recipe) resolved.push({ film, type, recipe });
    else if (!missing.some((m) => m.filmTypeId === film.filmTypeId)) {
      missing.push({ filmTypeId: film.filmTypeId, filmTypeName: type.name, fabricId: input.fabric.id, fabricName: input.fabric.name });
    }
  }
  if (missing.length === 0) return resolved;
  const pairs = missing.map((m) => `${m.filmTypeName} on ${m.fabricName}`).join(', nor for ');
  return {
    kind: 'missing_recipe',
    message: `The Recipe book has no recipe for ${pairs}. Ask the owner or a lead to add one from the film supplier's sheet; Dwell does not guess a temperature.`,
    missing,
  };
}

/** The fabric-cap warning for one layer and, when one exists, its low-temperature alternative. */
function capWarning(layer: ResolvedLayer, input: PressCardInput, types: Map<number, CardFilmType>): { warning: string; suggestion: LowTempSuggestion | null } {
  const { fabric, units } = input;
  let warning =
    `${layer.type.name} asks for ${temperatureText(layer.recipe.tempC, units)}, but ${fabric.name} takes at most ` +
    `${temperatureText(fabric.maxTempC, units)}, so the card is capped there; the film may not bond fully: press a test piece first.`;
  const lowTempId = layer.type.lowTempFilmTypeId;
  if (lowTempId === null) return { warning, suggestion: null };
  const lowName = filmTypeName(types, lowTempId);
  const lowRecipe = input.recipes.find((r) => r.filmTypeId === lowTempId && r.fabricId === fabric.id);
  if (!lowRecipe) {
    warning += ` Its low-temperature film, ${lowName}, has no recipe for ${fabric.name} yet.`;
    return { warning, suggestion: null };
  }
  warning += ` Better: cut this layer from ${lowName}, whose recipe for ${fabric.name} is ${temperatureText(lowRecipe.tempC, units)}.`;
  return {
    warning,
    suggestion: {
      forFilmTypeId: layer.type.id,
      filmTypeId: lowTempId,
      filmTypeName: lowName,
      recipeId: lowRecipe.id,
      tempC: lowRecipe.tempC,
      tempF: Math.round(celsiusToFahrenheit(lowRecipe.tempC)),
    },
  };
}

/** The air press in inches and psi, from stored mm and kPa. */
function airGeometry(press: CardPress): AirPressGeometry {
  return {
    boreIn: mmToInches(press.boreMm ?? 0),
    platenWidthIn: mmToInches(press.platenWidthMm),
    platenHeightIn: mmToInches(press.platenHeightMm),
    maxGaugePsi: maxGaugePsiFromKpa(press.maxGaugeKpa),
  };
}

/** The gauge setting for the pressure class on an air press, or why the press cannot give it. */
function airGauge(press: CardPress, pressureClass: PressureClass): PressGauge | PressCardStop {
  const geometry = airGeometry(press);
  const problems = geometryProblems(geometry, press.name);
  if (problems.length > 0) {
    return { kind: 'press_not_usable', message: `${problems.join(' ')} Ask the owner to correct the press in the equipment list.` };
  }
  const reading = readingForPressureClass(pressureClass, geometry);
  const overMax = overMaximumProblem(reading.gaugePsi, geometry, press.name);
  if (overMax) return { kind: 'press_not_usable', message: `${pressureClass[0]!.toUpperCase()}${pressureClass.slice(1)} pressure needs more than this press gives. ${overMax}` };
  // Rounded for the card only: a gauge reads to about 1 psi, the platen figure is a small number.
  return {
    gaugePsi: roundTo(reading.gaugePsi, 1),
    gaugeKPa: roundTo(reading.gaugeKPa, 1),
    platenPsi: roundTo(reading.platenPsi, 2),
    forceLbf: roundTo(reading.forceLbf, 1),
    forceN: roundTo(reading.forceN, 1),
  };
}

/**
 * Resolves the press card for films on a fabric on a press.
 *
 * The card's single temperature is the top (last-pressed) layer's recipe temperature, capped at the
 * fabric's maximum: the top layer gets the full dwell, and the heat reaches the layers under it.
 * An under-layer whose own (capped) recipe temperature differs by more than
 * TEMPERATURE_MISMATCH_TOLERANCE_C gets a warning. Dwell, pressure class, peel and second press come
 * from the top layer's recipe; pre-press is done once and takes the longest any layer asks for.
 */
export function resolvePressCard(input: PressCardInput): PressCardResult {
  const { fabric, press, units } = input;
  if (input.layers.length === 0) {
    return { ok: false, stop: { kind: 'no_layers', message: 'A press card needs at least one layer of film. Add the job\'s layers first.' } };
  }
  const types = new Map(input.filmTypes.map((t) => [t.id, t]));
  const resolved = resolveLayers(input, types);
  if (!Array.isArray(resolved)) return { ok: false, stop: resolved };

  const top = resolved[resolved.length - 1]!;
  const under = resolved.slice(0, -1);
  const effectiveTemp = (recipe: CardRecipe) => Math.min(recipe.tempC, fabric.maxTempC);
  const temperatureC = Math.round(effectiveTemp(top.recipe));
  const warnings: string[] = [];
  const suggestions: LowTempSuggestion[] = [];

  const cappedTypes = new Set<number>();
  for (const layer of resolved) {
    if (layer.recipe.tempC <= fabric.maxTempC || cappedTypes.has(layer.type.id)) continue;
    cappedTypes.add(layer.type.id);
    const { warning, suggestion } = capWarning(layer, input, types);
    warnings.push(warning);
    if (suggestion) suggestions.push(suggestion);
  }

  for (const layer of under) {
    const own = effectiveTemp(layer.recipe);
    if (Math.abs(own - temperatureC) > TEMPERATURE_MISMATCH_TOLERANCE_C) {
      warnings.push(
        `The under-layer ${layer.type.name} ${layer.film.colour} has a recipe at ${temperatureText(own, units)}, but the card uses the top layer's ` +
          `${temperatureText(temperatureC, units)}: check with a lead that these films may be pressed together.`,
      );
    }
    if (layer.recipe.tackS <= 0) {
      warnings.push(
        `${layer.type.name} has no tack time in its recipe for ${fabric.name}, so it is meant as the top layer only: check the layer order with a lead.`,
      );
    }
  }

  const steps: PressStep[] = [
    ...under.map((layer): PressStep => ({ filmId: layer.film.filmId, seconds: layer.recipe.tackS, kind: 'tack' })),
    { filmId: top.film.filmId, seconds: top.recipe.dwellS, kind: 'dwell' },
  ];
  const prePressS = Math.max(...resolved.map((layer) => layer.recipe.prePressS));
  const secondPressS = top.recipe.secondPressS && top.recipe.secondPressS > 0 ? top.recipe.secondPressS : null;
  const totalHeatS = prePressS + steps.reduce((sum, step) => sum + step.seconds, 0) + (secondPressS ?? 0);
  if (totalHeatS > input.heatExposureLimitS) {
    warnings.push(
      `Each garment gets ${totalHeatS} s of heat in all, more than the shop's limit of ${input.heatExposureLimitS} s: the fabric may scorch, shine or bleed. Check with a lead before pressing.`,
    );
  }

  const sources = [...new Set(resolved.map((layer) => layer.recipe.source))];
  let gauge: PressGauge | undefined;
  if (press.kind === 'air') {
    const result = airGauge(press, top.recipe.pressureClass);
    if ('kind' in result) return { ok: false, stop: result };
    gauge = result;
    sources.push(PRESSURE_CLASS_SOURCE);
  }

  const layers: PressCardLayer[] = resolved.map((layer, i) => ({
    position: i + 1,
    filmId: layer.film.filmId,
    filmTypeId: layer.type.id,
    filmTypeName: layer.type.name,
    colour: layer.film.colour,
    recipeId: layer.recipe.id,
    recipeTempC: layer.recipe.tempC,
    pressureClass: layer.recipe.pressureClass,
    peel: layer.recipe.peel,
    notes: layer.recipe.notes,
  }));

  return {
    ok: true,
    card: {
      steps,
      temperatureC,
      temperatureF: Math.round(celsiusToFahrenheit(temperatureC)),
      dwellS: top.recipe.dwellS,
      prePressS,
      secondPressS,
      pressureClass: top.recipe.pressureClass,
      peel: top.recipe.peel,
      ...(gauge ? { gauge } : {}),
      totalHeatS,
      heatExposureLimitS: input.heatExposureLimitS,
      capped: top.recipe.tempC > fabric.maxTempC,
      warnings,
      cautions: pressCautions(),
      sources,
      layers,
      suggestions,
      fabric: { id: fabric.id, name: fabric.name, maxTempC: fabric.maxTempC },
      press: { id: press.id, name: press.name, kind: press.kind, note: press.notes },
      units,
      display: {
        temperature: temperatureReading(temperatureC, units),
        ...(gauge
          ? {
              gauge: pressureReading(gauge.gaugePsi, units, 0),
              platenPressure: pressureReading(gauge.platenPsi, units, 2),
              force: forceReading(gauge.forceLbf, units),
            }
          : {}),
      },
    },
  };
}
