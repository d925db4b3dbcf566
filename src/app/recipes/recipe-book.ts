import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatTableModule } from '@angular/material/table';
import { PEEL_KINDS, PRESSURE_CLASSES } from '../../shared/names';
import { temperatureReading } from '../../shared/press/dual-units';
import type { RecipeListItem, RecipeRevision } from '../../shared/press/press-contract';
import type { ShopUnits } from '../../shared/press/units';
import { apiErrorSentence } from '../core/api-error';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { checkRecipe, draftFrom, fieldOfHubPath, type RecipeDraft, type RecipeField } from './recipe-values';
import { ShopApi } from '../shop/shop-api';
import { RecipesApi } from './recipes-api';

const UNITS_KEY = 'dwell.recipes.units';

/** The stored recipe columns a revision may change, as people read them (stored units). */
const HISTORY_FIELDS: Readonly<Record<string, [label: string, unit: string]>> = {
  temp_c: ['Temperature', ' °C'],
  dwell_s: ['Dwell', ' s'],
  pressure_class: ['Pressure', ''],
  peel: ['Peel', ''],
  pre_press_s: ['Pre-press', ' s'],
  tack_s: ['Tack', ' s'],
  second_press_s: ['Second press', ' s'],
  notes: ['Notes', ''],
  source: ['Source', ''],
};

/** The Recipe book: every film-on-fabric recipe, a filter, an edit form with the hub's limits, and each recipe's history. */
@Component({
  selector: 'dw-recipe-book',
  imports: [MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatIconModule, MatInputModule, MatTableModule],
  templateUrl: './recipe-book.html',
  styleUrl: './recipe-book.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecipeBook {
  private readonly api = inject(RecipesApi);
  private readonly storage = inject(BROWSER_STORAGE);
  private readonly shop = inject(ShopApi);

  protected readonly pressureClasses = PRESSURE_CLASSES;
  protected readonly peelKinds = PEEL_KINDS;
  protected readonly columns = ['film', 'fabric', 'temperature', 'dwell', 'pressure', 'peel', 'prePress', 'tack', 'secondPress', 'source', 'edit'];

  protected readonly recipes = signal<RecipeListItem[]>([]);
  protected readonly loadProblem = signal<string | null>(null);
  protected readonly filter = signal('');
  // A unit chosen on this screen is remembered on this tablet; until then the shop's own units are used.
  private readonly chosenUnits = this.storage.getItem(UNITS_KEY);
  protected readonly units = signal<ShopUnits>(this.chosenUnits === 'metric' ? 'metric' : 'imperial');
  protected readonly unitLabel = computed(() => (this.units() === 'imperial' ? '°F' : '°C'));

  protected readonly editing = signal<RecipeListItem | null>(null);
  protected readonly draft = signal<RecipeDraft | null>(null);
  protected readonly problems = signal<Partial<Record<RecipeField, string>>>({});
  protected readonly saveProblem = signal<string | null>(null);
  protected readonly saving = signal(false);
  protected readonly saved = signal<string | null>(null);
  protected readonly history = signal<RecipeRevision[] | null>(null);
  protected readonly historyProblem = signal<string | null>(null);

  protected readonly rows = computed(() => {
    const words = this.filter().trim().toLowerCase().split(/\s+/).filter(Boolean);
    return this.recipes().filter((recipe) => {
      const haystack = `${recipe.filmTypeName} ${recipe.fabricName} ${recipe.pressureClass} ${recipe.peel} ${recipe.source}`.toLowerCase();
      return words.every((word) => haystack.includes(word));
    });
  });

  constructor() {
    void this.loadRecipes();
    if (this.chosenUnits === null) void this.useShopUnits();
  }

  private async useShopUnits(): Promise<void> {
    try {
      const { units } = await this.shop.settings();
      if (this.storage.getItem(UNITS_KEY) === null) this.units.set(units);
    } catch {
      // Without the shop's settings the screen keeps °F and its own switch still works.
    }
  }

  /** Shows temperatures in the shop's units first. */
  protected temperature(recipe: RecipeListItem) {
    return temperatureReading(recipe.tempC, this.units());
  }

  protected async loadRecipes(): Promise<void> {
    try {
      this.recipes.set(await this.api.list());
      this.loadProblem.set(null);
    } catch (error) {
      this.loadProblem.set(apiErrorSentence(error, 'The Recipe book could not be loaded. Try again.'));
    }
  }

  protected filterRecipes(text: string): void {
    this.filter.set(text);
  }

  protected switchUnits(units: ShopUnits): void {
    this.units.set(units);
    this.storage.setItem(UNITS_KEY, units);
    const recipe = this.editing();
    if (recipe) this.draft.set(draftFrom(recipe, units));
    this.problems.set({});
  }

  /** Opens the edit form and the history of one recipe. */
  protected async editRecipe(recipe: RecipeListItem): Promise<void> {
    this.editing.set(recipe);
    this.draft.set(draftFrom(recipe, this.units()));
    this.problems.set({});
    this.saveProblem.set(null);
    this.saved.set(null);
    this.history.set(null);
    this.historyProblem.set(null);
    try {
      this.history.set(await this.api.revisions(recipe.id));
    } catch (error) {
      this.historyProblem.set(apiErrorSentence(error, 'The history of this recipe could not be loaded.'));
    }
  }

  protected closeForm(): void {
    this.editing.set(null);
    this.draft.set(null);
  }

  protected updateField(field: RecipeField, value: string): void {
    this.draft.update((draft) => (draft ? { ...draft, [field]: value } : draft));
    this.problems.update(({ [field]: _gone, ...rest }) => rest);
  }

  /** Checks the form, sends °C and seconds to the hub, and shows the hub's refusal by the fields it names. */
  protected async saveRecipe(): Promise<void> {
    const recipe = this.editing();
    const draft = this.draft();
    if (!recipe || !draft) return;
    const check = checkRecipe(draft, this.units());
    if (!check.ok) {
      this.problems.set(check.problems);
      this.saveProblem.set('Some fields need a change: see the sentences under them.');
      return;
    }
    this.saving.set(true);
    this.saveProblem.set(null);
    try {
      const updated = await this.api.update(recipe.id, check.values);
      this.recipes.update((list) => list.map((item) => (item.id === updated.id ? updated : item)));
      this.saved.set(`Saved ${updated.filmTypeName} on ${updated.fabricName}.`);
      await this.editRecipe(updated);
      this.saved.set(`Saved ${updated.filmTypeName} on ${updated.fabricName}.`);
    } catch (error) {
      this.problems.set(this.hubFieldProblems(error));
      this.saveProblem.set(apiErrorSentence(error, 'The recipe could not be saved. Try again.'));
    } finally {
      this.saving.set(false);
    }
  }

  /** What changed in one revision, as "field: before → after" lines. */
  protected changes(revision: RecipeRevision): string[] {
    const before = revision.before ?? {};
    const shown = (value: unknown, unit: string) => (value === null || value === undefined || value === '' ? '—' : `${String(value)}${unit}`);
    return Object.entries(HISTORY_FIELDS)
      .filter(([key]) => key in revision.after && JSON.stringify(before[key]) !== JSON.stringify(revision.after[key]))
      .map(([key, [label, unit]]) =>
        revision.before ? `${label}: ${shown(before[key], unit)} → ${shown(revision.after[key], unit)}` : `${label}: ${shown(revision.after[key], unit)}`,
      );
  }

  private hubFieldProblems(error: unknown): Partial<Record<RecipeField, string>> {
    const details = error instanceof HttpErrorResponse ? (error.error as { details?: unknown } | null)?.details : null;
    const problems: Partial<Record<RecipeField, string>> = {};
    if (!Array.isArray(details)) return problems;
    for (const detail of details as { path?: string; message?: string }[]) {
      const field = fieldOfHubPath(detail.path ?? '');
      if (field && detail.message) problems[field] = detail.message;
    }
    return problems;
  }
}
