import { Router } from 'express';
import type { FabricOption, FilmOption } from '../../src/shared/intake-contract';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { MaterialsRepository } from './materials-repository';

/** /api/films and /api/fabrics: what a job can be made of. */
export function materialsRouter(db: Db): Router {
  const router = Router();
  const materials = new MaterialsRepository(db);
  const floor = allowRoles('owner', 'lead', 'operator');

  router.get('/films', floor, async (_req, res) => {
    const films: FilmOption[] = (await materials.films()).map((row) => ({
      id: row.id,
      filmTypeId: row.film_type_id,
      filmTypeName: row.film_type_name,
      colour: row.colour,
      colourHex: row.colour_hex,
      wearClass: row.wear_class,
    }));
    res.json(films);
  });

  router.get('/fabrics', floor, async (_req, res) => {
    const fabrics: FabricOption[] = (await materials.fabrics()).map((row) => ({ id: row.id, name: row.name, maxTempC: row.max_temp_c }));
    res.json(fabrics);
  });

  return router;
}
