import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { orderCreateSchema, orderPageSchema, orderUpdateSchema } from './order-schemas';
import { OrdersService } from './orders-service';

const orderParams = idParams('order');

/** /api/orders: the Orders list, creating, changing and cancelling orders. */
export function ordersRouter(db: Db): Router {
  const router = Router();
  const orders = new OrdersService(db);
  const leads = allowRoles('owner', 'lead');

  router.get('/', leads, async (req, res) => {
    res.json(await orders.list(validate(orderPageSchema, req.query, 'order search')));
  });

  router.post('/', leads, async (req, res) => {
    const body = validate(orderCreateSchema, req.body, 'order');
    res.status(201).json(await orders.create(body, req.principal!.userId ?? null));
  });

  router.get('/:id', leads, async (req, res) => {
    const { id } = validate(orderParams, req.params, 'order address');
    res.json(await orders.detail(id));
  });

  router.patch('/:id', leads, async (req, res) => {
    const { id } = validate(orderParams, req.params, 'order address');
    res.json(await orders.update(id, validate(orderUpdateSchema, req.body, 'order change')));
  });

  router.post('/:id/cancel', leads, async (req, res) => {
    const { id } = validate(orderParams, req.params, 'order address');
    res.json(await orders.cancel(id));
  });

  return router;
}
