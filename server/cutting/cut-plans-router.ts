import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import { CutFloorEvents } from '../cutters/cut-events';
import type { FloorBroadcast } from '../events/floor-broadcast';
import type { Env } from '../config/env';
import type { Db } from '../db/tables';
import type { RollLowNotice } from '../rolls/roll-low-notice';
import { DesignStore, designsDir } from '../designs/design-store';
import { validate } from '../http/validate';
import { CutPlanService } from './cut-plan-service';
import { confirmBody, layoutQuery, previewBody } from './cut-plan-schemas';

/** /api/cut-groups and /api/cut-plans/* (mounted at /api). */
export function cutPlansRouter(db: Db, env: Env, floor?: FloorBroadcast, lowNotice?: RollLowNotice): Router {
  const router = Router();
  const plans = new CutPlanService(db, new DesignStore(designsDir(env.UPLOADS_DIR)), new CutFloorEvents(floor), lowNotice);
  // Operators at any station may read plans; only a cut station may confirm (checked in the service).
  const cutFloor = allowRoles('owner', 'lead', 'operator');

  router.get('/cut-groups', cutFloor, async (_req, res) => {
    res.json(await plans.groups());
  });

  router.post('/cut-plans/preview', cutFloor, async (req, res) => {
    const input = validate(previewBody, req.body, 'cut plan');
    res.json(await plans.preview(input));
  });

  router.get('/cut-plans/layout.svg', cutFloor, async (req, res) => {
    const input = validate(layoutQuery, req.query, 'cut plan');
    const preview = await plans.preview(input);
    const name = `layout-${preview.film.colour.replace(/[^A-Za-z0-9]+/g, '-').toLowerCase()}-${Math.round(preview.layout.lengthUsedMm)}mm.svg`;
    res.set('Content-Disposition', `attachment; filename="${name}"`);
    res.set('Content-Security-Policy', "default-src 'none'");
    res.type('image/svg+xml').send(preview.cutterSvg);
  });

  router.post('/cut-plans/confirm', cutFloor, async (req, res) => {
    const input = validate(confirmBody, req.body, 'cut');
    res.json(await plans.confirm(req.principal!, input));
  });

  return router;
}
