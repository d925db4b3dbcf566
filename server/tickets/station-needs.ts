import type { StationKind } from '../../src/shared/names';
import type { BagRow, OrderRow } from '../db/tables';

/**
 * Whether a station of this kind keeps a bag's ticket: every station keeps the bags still on the
 * floor (order not cancelled, not yet packed). A cut station keeps them from the queue on; weed,
 * press and pack stations once anything has been cut, so a scan works offline whichever bag arrives
 * (two benches can share a bag, and remakes come back through).
 */
export function stationNeedsBag(kind: StationKind, bag: Pick<BagRow, 'stage' | 'qty_cut'> & { order_status: OrderRow['status'] }): boolean {
  if (bag.order_status === 'cancelled' || bag.stage === 'packed') return false;
  return kind === 'cut' || bag.qty_cut > 0;
}
