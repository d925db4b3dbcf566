import { Router } from 'express';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { BoardService } from './board-service';

/** GET /api/board: the floor board for leads, the owner and wall displays. */
export function boardRouter(db: Db): Router {
  const router = Router();
  const board = new BoardService(db);

  router.get('/', allowRoles('owner', 'lead', 'display'), async (_req, res) => {
    res.set('Cache-Control', 'no-store');
    res.json(await board.board());
  });

  return router;
}
