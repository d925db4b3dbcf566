import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import type { FloorBroadcast } from '../events/floor-broadcast';
import { validate } from '../http/validate';
import { shopSettingsInput } from './shop-schemas';
import { ShopService } from './shop-service';

/** /api/shop: the shop's settings; leads read them, the owner keeps them. */
export function shopRouter(db: Db, floor?: FloorBroadcast): Router {
  const router = Router();
  const shop = new ShopService(db, floor);

  router.get('/', allowRoles('owner', 'lead'), async (_req, res) => {
    res.json(await shop.read());
  });

  router.put('/', allowRoles('owner'), async (req, res) => {
    res.json(await shop.save(validate(shopSettingsInput, req.body, 'settings form')));
  });

  return router;
}
