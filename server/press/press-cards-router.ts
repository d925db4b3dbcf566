import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { validate } from '../http/validate';
import { gaugeAnswer, PressCardService } from './press-card-service';
import { PressRepository } from './press-repository';
import { gaugeBody, pressCardBody, previewBody } from './press-schemas';

/** /api/press-cards: the Press card for a bag or a film x fabric preview, and the air-press gauge calculator. */
export function pressCardsRouter(db: Db): Router {
  const router = Router();
  const cards = new PressCardService(new PressRepository(db));
  const floor = allowRoles('owner', 'lead', 'operator');

  router.post('/', floor, async (req, res) => {
    const { bagId, pressId } = validate(pressCardBody, req.body, 'press card request');
    res.json(await cards.forBag(bagId, pressId));
  });

  router.post('/preview', floor, async (req, res) => {
    const { layers, fabricId, pressId } = validate(previewBody, req.body, 'press card preview');
    res.json(await cards.preview(layers, fabricId, pressId));
  });

  router.post('/gauge', floor, (req, res) => {
    res.json(gaugeAnswer(validate(gaugeBody, req.body, 'gauge calculation')));
  });

  return router;
}
