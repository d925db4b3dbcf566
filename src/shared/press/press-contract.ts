import type { PeelKind, PressureClass } from '../names';
import type { DualReading } from './dual-units';
import type { ShopUnits } from './units';

/** One timed press of the layer sequence: a tack for each under-layer, the full dwell on the last. */
export interface PressStep {
  filmId: number;
  seconds: number;
  kind: 'tack' | 'dwell';
}

/** Gauge setting on an air press that gives the recipe's pressure class, with what it does on the platen. */
export interface PressGauge {
  gaugePsi: number;
  gaugeKPa: number;
  platenPsi: number;
  forceLbf: number;
  forceN: number;
}

/** What the card says about each layer, bottom (pressed first) to top. */
export interface PressCardLayer {
  position: number;
  filmId: number;
  filmTypeId: number;
  filmTypeName: string;
  colour: string;
  recipeId: number;
  /** The recipe's own temperature, before any fabric cap. */
  recipeTempC: number;
  pressureClass: PressureClass;
  peel: PeelKind;
  notes: string;
}

/** A film with a recipe at a lower temperature, offered when the fabric caps a layer's recipe. */
export interface LowTempSuggestion {
  forFilmTypeId: number;
  filmTypeId: number;
  filmTypeName: string;
  recipeId: number;
  tempC: number;
  tempF: number;
}

/** POST /api/press-cards and /api/press-cards/preview: the resolved press card. */
export interface PressCard {
  steps: PressStep[];
  temperatureC: number;
  temperatureF: number;
  dwellS: number;
  prePressS: number;
  /** Seconds of the second press after peeling, or null when the recipe has none. */
  secondPressS: number | null;
  pressureClass: PressureClass;
  peel: PeelKind;
  gauge?: PressGauge;
  totalHeatS: number;
  heatExposureLimitS: number;
  /** True when the fabric's maximum lowered the card's temperature. */
  capped: boolean;
  warnings: string[];
  cautions: string[];
  sources: string[];
  layers: PressCardLayer[];
  suggestions: LowTempSuggestion[];
  fabric: { id: number; name: string; maxTempC: number };
  press: { id: number; name: string; kind: 'manual' | 'air'; note: string };
  units: ShopUnits;
  /** Ready-made readings in the shop's units first and the other system second. */
  display: {
    temperature: DualReading;
    gauge?: DualReading;
    platenPressure?: DualReading;
    force?: DualReading;
  };
}

/** POST /api/press-cards */
export interface PressCardRequest {
  bagId: number;
  pressId: number;
}

/** POST /api/press-cards/preview: films in pressing order (first is the bottom layer). */
export interface PressCardPreviewRequest {
  layers: number[];
  fabricId: number;
  pressId: number;
}

/** POST /api/press-cards/gauge */
export interface GaugeRequest {
  boreIn: number;
  platenWidthIn: number;
  platenHeightIn: number;
  gaugePsi: number;
  maxGaugePsi?: number;
  target?: { platenWidthIn: number; platenHeightIn: number; boreIn?: number; maxGaugePsi?: number };
}

/** Reply of POST /api/press-cards/gauge (rounded for display). */
export interface GaugeReply {
  platenPsi: number;
  forceLbf: number;
  forceN: number;
  platenKPa: number;
  targetGaugePsi?: number;
  targetGaugeKPa?: number;
}

/** A recipe as stored (°C, s), with its film type and fabric. */
export interface RecipeRecord extends Required<RecipeValues> {
  id: number;
  filmTypeId: number;
  fabricId: number;
}

/** A recipe in the Recipe book (GET /api/recipes). */
export interface RecipeListItem extends RecipeRecord {
  filmTypeName: string;
  fabricName: string;
  tempF: number;
  updatedAt: string;
}

/** PUT /api/recipes/:id: the recipe's values (its film type and fabric stay). */
export interface RecipeValues {
  tempC: number;
  dwellS: number;
  pressureClass: PressureClass;
  peel: PeelKind;
  prePressS?: number;
  tackS?: number;
  secondPressS?: number | null;
  notes?: string;
  source: string;
}

/** POST /api/recipes */
export interface RecipeCreate extends RecipeValues {
  filmTypeId: number;
  fabricId: number;
}

/** One change in a recipe's history (GET /api/recipes/:id/revisions), newest first. */
export interface RecipeRevision {
  id: number;
  recipeId: number;
  changedAt: string;
  changedBy: { id: number; name: string } | null;
  before: Record<string, unknown> | null;
  after: Record<string, unknown>;
}

/** A press in GET /api/presses. */
export interface PressListItem {
  id: number;
  name: string;
  kind: 'manual' | 'air';
  platenWidthMm: number;
  platenHeightMm: number;
  boreMm: number | null;
  maxGaugeKpa: number | null;
  notes: string;
}
