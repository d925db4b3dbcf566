import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { recipeCreateBody, recipeValuesBody } from './press-schemas';
import { RecipesRepository } from './recipes-repository';
import { RecipesService } from './recipes-service';

const recipeParams = idParams('recipe');

/** /api/recipes: the Recipe book; everyone on the floor reads it, the owner and leads edit it. */
export function recipesRouter(db: Db): Router {
  const router = Router();
  const recipes = new RecipesService(new RecipesRepository(db));
  const editors = allowRoles('owner', 'lead');

  router.get('/', allowRoles('owner', 'lead', 'operator'), async (_req, res) => {
    res.json(await recipes.list());
  });

  router.post('/', editors, async (req, res) => {
    const { filmTypeId, fabricId, ...values } = validate(recipeCreateBody, req.body, 'recipe');
    res.status(201).json(await recipes.create(filmTypeId, fabricId, values, req.principal!.userId));
  });

  router.put('/:id', editors, async (req, res) => {
    const { id } = validate(recipeParams, req.params, 'recipe address');
    const values = validate(recipeValuesBody, req.body, 'recipe');
    res.json(await recipes.update(id, values, req.principal!.userId));
  });

  router.get('/:id/revisions', editors, async (req, res) => {
    const { id } = validate(recipeParams, req.params, 'recipe address');
    res.json(await recipes.revisions(id));
  });

  return router;
}
