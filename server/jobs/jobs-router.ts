import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import type { Env } from '../config/env';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { jobCreateSchema } from './job-schemas';
import { JobsService } from './jobs-service';

/** POST /api/orders/:id/jobs and DELETE /api/jobs/:id (mounted at /api). */
export function jobsRouter(db: Db, env: Env): Router {
  const router = Router();
  const jobs = new JobsService(db, env.UPLOADS_DIR);
  const leads = allowRoles('owner', 'lead');

  router.post('/orders/:id/jobs', leads, async (req, res) => {
    const { id } = validate(idParams('order'), req.params, 'order address');
    res.status(201).json(await jobs.create(id, validate(jobCreateSchema, req.body, 'job')));
  });

  router.delete('/jobs/:id', leads, async (req, res) => {
    const { id } = validate(idParams('job'), req.params, 'job address');
    await jobs.delete(id);
    res.status(204).end();
  });

  return router;
}
