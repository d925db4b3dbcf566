import type { BagSummary, SizeQuantities } from '../../src/shared/intake-contract';
import type { BagRow } from '../db/tables';

/** A bag row as lists show it. */
export const toBagSummary = (row: BagRow): BagSummary => ({
  id: row.id,
  code: row.code,
  token: row.token,
  jobId: row.job_id,
  stage: row.stage,
  sizes: row.sizes as SizeQuantities,
  pieces: row.pieces,
  counts: { cut: row.qty_cut, weeded: row.qty_weeded, pressed: row.qty_pressed, packed: row.qty_packed, spoiled: row.qty_spoiled },
  remakeCount: row.remake_count,
  overCount: Boolean(row.over_count),
});
