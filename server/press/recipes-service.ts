import type { RecipeListItem, RecipeRevision } from '../../src/shared/press/press-contract';
import { badRequest, conflict, notFound } from '../http/http-error';
import type { RecipeValuesInput } from './press-schemas';
import type { RecipesRepository, RecipeWrite } from './recipes-repository';

const toWrite = (values: RecipeValuesInput): RecipeWrite => ({
  temp_c: values.tempC,
  dwell_s: values.dwellS,
  pressure_class: values.pressureClass,
  peel: values.peel,
  pre_press_s: values.prePressS,
  tack_s: values.tackS,
  second_press_s: values.secondPressS,
  notes: values.notes,
  source: values.source,
});

/** The Recipe book's rules: one recipe per film type and fabric, every change kept as a revision. */
export class RecipesService {
  constructor(private readonly recipes: RecipesRepository) {}

  /** Every recipe with names. */
  list(): Promise<RecipeListItem[]> {
    return this.recipes.list();
  }

  /** Adds a recipe for a film type on a fabric that has none yet. */
  async create(filmTypeId: number, fabricId: number, values: RecipeValuesInput, changedBy: number | null): Promise<RecipeListItem> {
    const [filmTypeName, fabricName] = await Promise.all([this.recipes.filmTypeName(filmTypeId), this.recipes.fabricName(fabricId)]);
    if (!filmTypeName) throw badRequest(`There is no film type ${filmTypeId}. Pick the film type from the list.`);
    if (!fabricName) throw badRequest(`There is no fabric ${fabricId}. Pick the fabric from the list.`);
    const duplicate = () => conflict(`The Recipe book already has a recipe for ${filmTypeName} on ${fabricName}. Edit that one instead.`);
    const existing = await this.recipes.findByPair(filmTypeId, fabricId);
    if (existing) throw duplicate();
    const id = await this.recipes.create(filmTypeId, fabricId, toWrite(values), changedBy);
    if (id === null) throw duplicate();
    return (await this.recipes.find(id))!;
  }

  /** Changes a recipe's values; its film type and fabric stay. */
  async update(id: number, values: RecipeValuesInput, changedBy: number | null): Promise<RecipeListItem> {
    const updated = await this.recipes.update(id, toWrite(values), changedBy);
    if (!updated) throw notFound(`There is no recipe ${id}. Reload the Recipe book and pick one from the list.`);
    return (await this.recipes.find(id))!;
  }

  /** A recipe's history, newest first. */
  async revisions(id: number): Promise<RecipeRevision[]> {
    if (!(await this.recipes.find(id))) throw notFound(`There is no recipe ${id}. Reload the Recipe book and pick one from the list.`);
    return this.recipes.revisions(id);
  }
}
