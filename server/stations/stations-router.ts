import { Router } from 'express';
import type { PairReply, StationListItem } from '../../src/shared/auth-contract';
import { allowRoles } from '../auth/guards';
import { hashDeviceToken, newDeviceToken } from '../auth/secrets';
import type { Db, StationRow } from '../db/tables';
import { notFound } from '../http/http-error';
import { idParams, validate } from '../http/validate';
import { StationsRepository } from './stations-repository';

const stationParams = idParams('station');

const toListItem = (row: StationRow): StationListItem => ({
  id: row.id,
  name: row.name,
  kind: row.kind,
  paired: row.device_token_hash !== null,
  pairedAt: row.paired_at?.toISOString() ?? null,
  lastSeenAt: row.last_seen_at?.toISOString() ?? null,
});

/** /api/stations: the lead lists stations and pairs a tablet with one. */
export function stationsRouter(db: Db): Router {
  const router = Router();
  const stations = new StationsRepository(db);
  const leads = allowRoles('owner', 'lead');

  const findOr404 = async (id: number) => {
    const station = await stations.find(id);
    if (!station) throw notFound(`There is no station ${id}. Reload the Stations screen and pick one from the list.`);
    return station;
  };

  router.get('/', leads, async (_req, res) => {
    res.json((await stations.list()).map(toListItem));
  });

  router.post('/:id/pair', leads, async (req, res) => {
    const { id } = validate(stationParams, req.params, 'station address');
    const station = await findOr404(id);
    const deviceToken = newDeviceToken();
    await stations.pair(id, hashDeviceToken(deviceToken), req.principal!.userId!);
    const reply: PairReply = { deviceToken, station: { id: station.id, name: station.name, kind: station.kind } };
    res.status(201).json(reply);
  });

  router.delete('/:id/pair', leads, async (req, res) => {
    const { id } = validate(stationParams, req.params, 'station address');
    await findOr404(id);
    await stations.unpair(id);
    res.status(204).end();
  });

  return router;
}
