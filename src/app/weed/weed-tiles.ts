import { SIZES } from '../../shared/intake-contract';
import type { TicketRow } from '../sync/station-db';

/** One tile of the Weed tally: a size of a plain job, or one roster line of a personalised job. */
export interface WeedTile {
  key: string;
  title: string;
  detail: string;
  done: number;
  total: number;
  size?: string;
  rosterLineId?: number;
}

/**
 * The tiles for a bag. The hub counts weeded pieces per bag, not per size or line: pieces this
 * tablet marked are shown where they were tapped; pieces counted elsewhere fill the tiles in order.
 */
export function weedTiles(row: TicketRow): WeedTile[] {
  const { ticket, local } = row;
  const weeded = ticket.bag.counts.weeded;
  if (ticket.rosterLines.length) {
    const lines = ticket.rosterLines.filter((line) => line.bagId === null || line.bagId === ticket.bag.id);
    const marked = new Set(local.weededRosterLineIds);
    let elsewhere = Math.max(0, weeded - lines.filter((line) => marked.has(line.id)).length);
    return lines.map((line) => {
      let done = marked.has(line.id) ? 1 : 0;
      if (!done && elsewhere > 0) {
        done = 1;
        elsewhere -= 1;
      }
      return { key: `line-${line.id}`, title: line.name, detail: `${line.number ? `#${line.number} · ` : ''}${line.size}`, done, total: 1, rosterLineId: line.id };
    });
  }
  const sizes = Object.entries(ticket.bag.sizes)
    .filter(([, n]) => (n ?? 0) > 0)
    .sort(([a], [b]) => sizeRank(a) - sizeRank(b));
  const byTap = sizes.map(([size, total]) => Math.min(total ?? 0, local.weededBySize[size] ?? 0));
  let elsewhere = Math.max(0, weeded - byTap.reduce((a, b) => a + b, 0));
  return sizes.map(([size, total], i) => {
    const pieces = total ?? 0;
    const extra = Math.min(pieces - byTap[i]!, elsewhere);
    elsewhere -= extra;
    const done = byTap[i]! + extra;
    return { key: `size-${size}`, title: size, detail: `${done} of ${pieces}`, done, total: pieces, size };
  });
}

function sizeRank(size: string): number {
  const at = (SIZES as readonly string[]).indexOf(size);
  return at === -1 ? SIZES.length : at;
}
