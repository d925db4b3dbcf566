import { SIZES, type SizeQuantities } from '../intake-contract';

/** One bag of a split: its pieces per size and, for a roster, which roster lines (by index) go in it. */
export interface BagPlan {
  sizes: SizeQuantities;
  rosterLineIndexes?: number[];
}

/** A roster line as the split needs it: only its size. */
export interface SizedLine {
  size: string;
}

/** Beyond this many search steps the exact split gives way to first-fit decreasing (still valid, rarely one bag more). */
const SEARCH_STEP_BUDGET = 200_000;

interface Item {
  size: string;
  count: number;
}

/** Shop order of sizes; sizes Dwell does not list (e.g. one-size "OS") go last, alphabetically. */
function sizeRank(size: string): number {
  const index = (SIZES as readonly string[]).indexOf(size);
  return index >= 0 ? index : SIZES.length;
}

function compareSizes(a: string, b: string): number {
  return sizeRank(a) - sizeRank(b) || a.localeCompare(b);
}

/** Exact fewest-bins search: items in size order, each tried in the open bins in order, then a new bin. */
function exactBins(items: Item[], max: number): number[][] | null {
  const total = items.reduce((sum, item) => sum + item.count, 0);
  let steps = 0;
  for (let bins = Math.ceil(total / max); bins <= items.length; bins++) {
    const load: number[] = [];
    const members: number[][] = [];
    const place = (i: number, remaining: number): boolean | 'budget' => {
      if (++steps > SEARCH_STEP_BUDGET) return 'budget';
      if (i === items.length) return true;
      const free = (bins - load.length) * max + load.reduce((sum, l) => sum + (max - l), 0);
      if (remaining > free) return false;
      const count = items[i]!.count;
      for (let b = 0; b < load.length; b++) {
        if (load[b]! + count > max) continue;
        load[b]! += count;
        members[b]!.push(i);
        const result = place(i + 1, remaining - count);
        if (result) return result;
        load[b]! -= count;
        members[b]!.pop();
      }
      if (load.length < bins) {
        load.push(count);
        members.push([i]);
        const result = place(i + 1, remaining - count);
        if (result) return result;
        load.pop();
        members.pop();
      }
      return false;
    };
    const result = place(0, total);
    if (result === 'budget') return null;
    if (result) return members;
  }
  return null;
}

/** First-fit decreasing: the fallback when the exact search would take too long. */
function firstFitDecreasing(items: Item[], max: number): number[][] {
  const order = items.map((_, i) => i).sort((a, b) => items[b]!.count - items[a]!.count || a - b);
  const load: number[] = [];
  const members: number[][] = [];
  for (const i of order) {
    const count = items[i]!.count;
    const b = load.findIndex((l) => l + count <= max);
    if (b >= 0) {
      load[b]! += count;
      members[b]!.push(i);
    } else {
      load.push(count);
      members.push([i]);
    }
  }
  return members.map((m) => m.sort((a, b) => a - b));
}

/**
 * Splits a job's pieces into bags of at most maxPieces. A size stays in one bag unless it alone is more
 * than maxPieces; then it fills whole bags of maxPieces and its rest travels like any other size. The
 * fewest bags are used; bags come in size order (youth first, then adult), the same way every time.
 * Given roster lines, each bag also lists its lines, in roster order.
 */
export function splitIntoBags(pieces: SizeQuantities | readonly SizedLine[], maxPieces: number): BagPlan[] {
  if (!Number.isInteger(maxPieces) || maxPieces < 1) throw new RangeError('maxPieces must be a whole number of at least 1.');
  const roster = Array.isArray(pieces) ? (pieces as readonly SizedLine[]) : null;
  const quantities: Record<string, number> = {};
  if (roster) {
    for (const line of roster) quantities[line.size] = (quantities[line.size] ?? 0) + 1;
  } else {
    for (const [size, count] of Object.entries(pieces as SizeQuantities)) {
      if (count === undefined || count === 0) continue;
      if (!Number.isInteger(count) || count < 0) throw new RangeError(`The quantity for ${size} must be a whole number of 0 or more.`);
      quantities[size] = count;
    }
  }

  const sizes = Object.keys(quantities).sort(compareSizes);
  const fullBags: { size: string; count: number }[] = [];
  const items: Item[] = [];
  for (const size of sizes) {
    const count = quantities[size]!;
    for (let i = 0; i < Math.floor(count / maxPieces) && count > maxPieces; i++) fullBags.push({ size, count: maxPieces });
    const rest = count > maxPieces ? count % maxPieces : count;
    if (rest > 0) items.push({ size, count: rest });
  }

  const groups = items.length ? (exactBins(items, maxPieces) ?? firstFitDecreasing(items, maxPieces)) : [];
  const plans: { full: boolean; parts: { size: string; count: number }[] }[] = [
    ...fullBags.map((bag) => ({ full: true, parts: [bag] })),
    ...groups.map((group) => ({ full: false, parts: group.map((i) => items[i]!) })),
  ];
  // Stable sort: by first size; a size's full bags come before the bag holding its rest.
  plans.sort((a, b) => compareSizes(a.parts[0]!.size, b.parts[0]!.size) || Number(b.full) - Number(a.full));

  const nextLine = new Map<string, number[]>();
  if (roster) {
    roster.forEach((line, index) => {
      const list = nextLine.get(line.size) ?? [];
      list.push(index);
      nextLine.set(line.size, list);
    });
  }
  return plans.map((plan) => {
    const bagSizes: Record<string, number> = {};
    for (const part of plan.parts) bagSizes[part.size] = part.count;
    if (!roster) return { sizes: bagSizes as SizeQuantities };
    const lines = plan.parts.flatMap((part) => nextLine.get(part.size)!.splice(0, part.count));
    return { sizes: bagSizes as SizeQuantities, rosterLineIndexes: lines.sort((a, b) => a - b) };
  });
}

/** Total pieces in a size breakdown. */
export function countPieces(sizes: SizeQuantities): number {
  return Object.values(sizes).reduce<number>((sum, n) => sum + (n ?? 0), 0);
}

/**
 * The human code of an order's bag: index 0 is "1042-A", 25 is "1042-Z", 26 is "1042-AA", 27 "1042-AB"
 * (letters counted like spreadsheet columns, with no zero).
 */
export function bagCode(orderCode: string, index: number): string {
  if (!Number.isInteger(index) || index < 0) throw new RangeError('A bag index is a whole number of 0 or more.');
  let letters = '';
  for (let n = index + 1; n > 0; n = Math.floor((n - 1) / 26)) {
    letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  }
  return `${orderCode}-${letters}`;
}
