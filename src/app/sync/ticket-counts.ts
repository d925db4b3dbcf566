import type { StationEvent } from '../../shared/events-contract';
import type { StationDb, TicketRow } from './station-db';

/** Adds (sign 1) or takes back (sign -1) an event's effect on its cached ticket; call inside a rw transaction. */
export async function applyToTicket(db: StationDb, event: StationEvent & { size?: string }, sign: 1 | -1): Promise<void> {
  const row = await db.tickets.get(event.bagId);
  if (!row) return;
  await db.tickets.put(withEvent(row, event, sign));
}

/** The ticket row as it is once `event` is counted (or taken back). */
export function withEvent(row: TicketRow, event: StationEvent & { size?: string }, sign: 1 | -1): TicketRow {
  const ticket = structuredCloneTicket(row);
  const counts = ticket.ticket.bag.counts;
  const q = event.quantity * sign;
  switch (event.kind) {
    case 'cut_done': counts.cut += q; break;
    case 'press_done': counts.pressed += q; break;
    case 'pack_done': counts.packed += q; break;
    case 'spoil': {
      const stage = (event as StationEvent<'spoil'>).payload.stage;
      counts.spoiled += q;
      counts.spoiledAt[stage] += q;
      ticket.ticket.bag.remakeCount += q;
      break;
    }
    case 'weed_done': {
      counts.weeded += q;
      const payload = (event as StationEvent<'weed_done'>).payload;
      const lines = payload.rosterLineIds ?? [];
      if (lines.length) {
        ticket.local.weededRosterLineIds = sign > 0
          ? [...new Set([...ticket.local.weededRosterLineIds, ...lines])]
          : ticket.local.weededRosterLineIds.filter((id) => !lines.includes(id));
      }
      const size = event.size;
      if (size) ticket.local.weededBySize[size] = Math.max(0, (ticket.local.weededBySize[size] ?? 0) + q);
      break;
    }
    default: break;
  }
  return ticket;
}

function structuredCloneTicket(row: TicketRow): TicketRow {
  return JSON.parse(JSON.stringify(row)) as TicketRow;
}
