import { owedAt, ROUTE, type BagCounts } from '../../shared/events/bag-progress';
import { SIZES, type BagSummary, type SizeQuantities } from '../../shared/intake-contract';
import type { TicketRow } from '../sync/station-db';

/** What this tablet itself recorded on a bag at the pack bench (from its outbox). */
export interface LocalPackHistory {
  /** Pieces this tablet marked packed, by size. */
  packedBySize: SizeQuantities;
}

/** One line of the Pack check list: a size of a plain job, or one roster line of a personalised job. */
export interface PackLine {
  key: string;
  /** The size, or the name on a roster line. */
  title: string;
  /** "#7 · M" for a roster line; empty for a size. */
  detail: string;
  size: string;
  ordered: number;
  /** Pieces of this line already packed before this count. */
  packed: number;
  rosterLineId?: number;
}

/** Where a bag stands for the pack bench. */
export interface PackProgress {
  pieces: number;
  pressed: number;
  packed: number;
  /** Pieces still to go into the bag. */
  toPack: number;
  /** Pressed pieces not yet packed (and not spoiled at the pack bench). */
  readyToPack: number;
  /** Spoiled pieces whose remake has not been pressed yet. */
  remakesOwed: number;
  /** Pieces of the first run not pressed yet. */
  notPressed: number;
}

/** Nothing recorded here yet. */
export const NO_PACK_HISTORY: LocalPackHistory = { packedBySize: {} };

/**
 * The bag's numbers for the pack bench, by the shared counting rules, from the ticket's spoils per
 * stage (the hub's, plus this tablet's events not yet acknowledged), wherever they were logged.
 */
export function packProgress(bag: BagSummary): PackProgress {
  const { spoiledAt } = bag.counts;
  const counts: BagCounts = {
    pieces: bag.pieces,
    cut: bag.counts.cut,
    weeded: bag.counts.weeded,
    pressed: bag.counts.pressed,
    packed: bag.counts.packed,
    spoiledAt,
  };
  const spoiled = ROUTE.reduce((sum, stage) => sum + spoiledAt[stage], 0);
  const stillToPress = Math.max(0, owedAt(counts, 'press') - counts.pressed);
  // A shortfall at the press is put down to remakes first: those are the pieces the bench is waiting on.
  const remakesOwed = Math.min(spoiled, stillToPress);
  return {
    pieces: bag.pieces,
    pressed: counts.pressed,
    packed: counts.packed,
    toPack: Math.max(0, owedAt(counts, 'pack') - counts.packed),
    // A piece spoiled at the pack bench was pressed but can never go in the bag.
    readyToPack: Math.max(0, counts.pressed - spoiledAt.pack - counts.packed),
    remakesOwed,
    notPressed: stillToPress - remakesOwed,
  };
}

/**
 * The lines to count for a bag. The hub counts packed pieces per bag, not per size or name: pieces
 * this tablet packed go to their sizes; pieces packed elsewhere fill the lines in order.
 */
export function packLines(row: TicketRow, history: LocalPackHistory = NO_PACK_HISTORY): PackLine[] {
  const { ticket } = row;
  const budget: Record<string, number> = { ...history.packedBySize };
  if (ticket.rosterLines.length) {
    const lines = ticket.rosterLines.filter((line) => line.bagId === null || line.bagId === ticket.bag.id);
    const byHere = lines.map((line) => take(budget, line.size, 1));
    let elsewhere = Math.max(0, ticket.bag.counts.packed - byHere.reduce((a, b) => a + b, 0));
    return lines.map((line, i) => {
      let packed = byHere[i]!;
      if (!packed && elsewhere > 0) {
        packed = 1;
        elsewhere -= 1;
      }
      return { key: `line-${line.id}`, title: line.name, detail: `${line.number ? `#${line.number} · ` : ''}${line.size}`, size: line.size, ordered: 1, packed, rosterLineId: line.id };
    });
  }
  const sizes = Object.entries(ticket.bag.sizes)
    .map(([size, n]) => [size, n ?? 0] as const)
    .filter(([, n]) => n > 0)
    .sort(([a], [b]) => sizeRank(a) - sizeRank(b));
  const byHere = sizes.map(([size, ordered]) => take(budget, size, ordered));
  let elsewhere = Math.max(0, ticket.bag.counts.packed - byHere.reduce((a, b) => a + b, 0));
  return sizes.map(([size, ordered], i) => {
    const extra = Math.min(ordered - byHere[i]!, elsewhere);
    elsewhere -= extra;
    return { key: `size-${size}`, title: size, detail: '', size, ordered, packed: byHere[i]! + extra };
  });
}

/** Pieces per size in a count, keyed by line: what a pack_done event carries. */
export function sizesOf(lines: readonly PackLine[], counted: Readonly<Record<string, number>>): SizeQuantities {
  const sizes: Record<string, number> = {};
  for (const line of lines) {
    const n = counted[line.key] ?? 0;
    if (n > 0) sizes[line.size] = (sizes[line.size] ?? 0) + n;
  }
  return sizes as SizeQuantities;
}

function take(budget: Record<string, number>, size: string, most: number): number {
  const n = Math.min(most, Math.max(0, budget[size] ?? 0));
  budget[size] = (budget[size] ?? 0) - n;
  return n;
}

function sizeRank(size: string): number {
  const at = (SIZES as readonly string[]).indexOf(size);
  return at === -1 ? SIZES.length : at;
}
