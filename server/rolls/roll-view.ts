import type { RollMovement, RollView } from '../../src/shared/cutting/cut-plan-contract';
import type { RollMovementRow, RollRow } from '../db/tables';

/** A roll row joined with its film, as the repository selects it. */
export type RollWithFilm = RollRow & { film_type_name: string; colour: string; colour_hex: string };

/** A stored roll as the API shows it; "low" once below its reorder length. */
export function toRollView(row: RollWithFilm): RollView {
  return {
    id: row.id,
    label: row.label,
    filmId: row.film_id,
    widthMm: row.width_mm,
    lengthMm: row.length_mm,
    remainingMm: row.remaining_mm,
    reorderMm: row.reorder_mm,
    rackSlot: row.rack_slot,
    filmTypeName: row.film_type_name,
    colour: row.colour,
    colourHex: row.colour_hex,
    low: row.remaining_mm < row.reorder_mm,
  };
}

/** A movement row joined with its cutter's and person's names. */
export type MovementWithNames = RollMovementRow & { cutter_name: string | null; user_name: string | null };

/** A stored movement as the Roll rack's history shows it. */
export function toRollMovement(row: MovementWithNames, bagCodes: ReadonlyMap<number, string>): RollMovement {
  const bagIds: number[] = typeof row.bag_ids === 'string' ? JSON.parse(row.bag_ids) : (row.bag_ids ?? []);
  return {
    id: row.id,
    kind: row.kind,
    changeMm: row.change_mm,
    remainingMm: row.remaining_mm,
    cutLengthMm: row.cut_length_mm,
    testCutMm: row.test_cut_mm,
    cutterName: row.cutter_name,
    userName: row.user_name,
    bagCodes: bagIds.map((id) => bagCodes.get(id) ?? `bag ${id}`),
    note: row.note,
    at: row.created_at.toISOString(),
  };
}
