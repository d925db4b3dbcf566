import { Router } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { validate } from '../http/validate';
import { toCustomer } from './customer-view';
import { CustomersRepository } from './customers-repository';

const searchQuery = z.object({ q: z.string().trim().max(100, 'A search is at most 100 characters.').default('') });

/** /api/customers: owners and leads find a customer for a new order. */
export function customersRouter(db: Db): Router {
  const router = Router();
  const customers = new CustomersRepository(db);

  router.get('/', allowRoles('owner', 'lead'), async (req, res) => {
    const { q } = validate(searchQuery, req.query, 'customer search');
    res.json((await customers.search(q, 20)).map(toCustomer));
  });

  return router;
}
