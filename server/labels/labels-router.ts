import { Router, type Request } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Env } from '../config/env';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { LABEL_STOCKS } from './label-pdf';
import { LabelsService } from './labels-service';

const pdfQuery = z.object({ stock: z.enum(LABEL_STOCKS, { error: 'The label stock is 4x6, a4 or letter.' }).default('4x6') });

/** GET /api/orders/:id/labels.pdf and GET /api/bags/:id/label.svg (mounted at /api). */
export function labelsRouter(db: Db, env: Env): Router {
  const router = Router();
  const labels = new LabelsService(db);
  const leads = allowRoles('owner', 'lead');
  // The QR must point where tablets reach the hub: PUBLIC_URL when set, else the address this request came to.
  const origin = (req: Request) => env.PUBLIC_URL ?? `${req.protocol}://${req.get('host')}`;

  router.get('/orders/:id/labels.pdf', leads, async (req, res) => {
    const { id } = validate(idParams('order'), req.params, 'order address');
    const { stock } = validate(pdfQuery, req.query, 'label options');
    const { code, pdf } = await labels.orderPdf(id, stock, origin(req));
    res.type('application/pdf').set('Content-Disposition', `inline; filename="bag-labels-${code}.pdf"`).send(Buffer.from(pdf));
  });

  router.get('/bags/:id/label.svg', leads, async (req, res) => {
    const { id } = validate(idParams('bag'), req.params, 'bag address');
    const { code, svg } = await labels.bagSvg(id, origin(req));
    res.type('image/svg+xml').set('Content-Disposition', `inline; filename="bag-label-${code}.svg"`).send(svg);
  });

  return router;
}
