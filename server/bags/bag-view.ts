import type { BagSummary, SizeQuantities } from '../../src/shared/intake-contract';
import { noSpoils } from '../../src/shared/events/bag-progress';
import type { BagRow } from '../db/tables';
import type { SpoiledAtByBag } from './bags-repository';

/** A bag row as lists show it, with its spoils per stage from `spoiledAt` (read for all the bags of a reply at once). */
export function toBagSummary(row: BagRow, spoiledAt: SpoiledAtByBag): BagSummary {
  return {
    id: row.id,
    code: row.code,
    token: row.token,
    jobId: row.job_id,
    stage: row.stage,
    sizes: row.sizes as SizeQuantities,
    pieces: row.pieces,
    counts: {
      cut: row.qty_cut,
      weeded: row.qty_weeded,
      pressed: row.qty_pressed,
      packed: row.qty_packed,
      spoiled: row.qty_spoiled,
      spoiledAt: { ...(spoiledAt.get(row.id) ?? noSpoils()) },
    },
    remakeCount: row.remake_count,
    overCount: Boolean(row.over_count),
  };
}
