import { describeLength, describeWidth } from './length-units';
import { checkMediaWidth, type CutterMedia } from './media-limits';

/**
 * Film kept back at the end of a roll for loading and the last turns on the core; a roll must have
 * this much left beyond the cut. 150 mm: common practice, no published source.
 */
export const LEADER_ALLOWANCE_MM = 150;

/** A roll on the rack (from the rolls table), in mm. */
export interface RackRoll {
  id: number;
  label: string;
  filmId: number;
  widthMm: number;
  lengthMm: number;
  remainingMm: number;
  reorderMm: number;
  rackSlot: string;
}

/** What a cut needs from a roll. */
export interface CutNeed {
  filmId: number;
  /** From the layout: its far side plus an edge margin. */
  widthNeededMm: number;
  lengthUsedMm: number;
}

/** The roll to take, or why there is none and what to do instead. */
export type RollChoice =
  | { kind: 'roll'; roll: RackRoll; partlyUsed: boolean; sentence: string }
  | { kind: 'split'; shortMm: number; rolls: [RackRoll, RackRoll]; sentence: string }
  | { kind: 'none'; shortMm: number | null; sentence: string };

/**
 * Chooses the roll for a cut: the same film (type and colour), wide enough, taken by the cutter,
 * with the cut plus the leader allowance left. Partly used rolls go first (the one with least left
 * that still fits, to use up ends), then the narrowest width.
 */
export function chooseRoll(need: CutNeed, rolls: readonly RackRoll[], cutter?: CutterMedia): RollChoice {
  const ofFilm = rolls.filter((r) => r.filmId === need.filmId && r.remainingMm > 0);
  const takeable = ofFilm.filter((r) => !cutter || checkMediaWidth(cutter, r.widthMm).fits);
  const wideEnough = takeable.filter((r) => r.widthMm >= need.widthNeededMm);
  const required = need.lengthUsedMm + LEADER_ALLOWANCE_MM;
  const fitting = wideEnough.filter((r) => r.remainingMm >= required);
  if (fitting.length > 0) {
    const [roll] = [...fitting].sort(preferenceOrder);
    const partlyUsed = roll.remainingMm < roll.lengthMm;
    const where = roll.rackSlot ? ` from rack slot ${roll.rackSlot}` : '';
    return {
      kind: 'roll',
      roll,
      partlyUsed,
      sentence: `Take roll ${roll.label}${where}: ${describeWidth(roll.widthMm)}, ${describeLength(roll.remainingMm)} left${partlyUsed ? ' (a partly used roll)' : ''}.`,
    };
  }
  if (ofFilm.length === 0) return { kind: 'none', shortMm: null, sentence: 'No roll of this film and colour is on the rack.' };
  if (takeable.length === 0) return { kind: 'none', shortMm: null, sentence: `No roll of this film fits ${cutter?.name ?? 'the cutter'}.` };
  if (wideEnough.length === 0) {
    return { kind: 'none', shortMm: null, sentence: `No roll of this film is ${describeWidth(need.widthNeededMm)} wide or wider: lay the cut out on a narrower roll.` };
  }
  const longest = [...wideEnough].sort((a, b) => b.remainingMm - a.remainingMm);
  const shortMm = required - longest[0].remainingMm;
  const base =
    `No single roll has ${describeLength(need.lengthUsedMm)} plus the ${LEADER_ALLOWANCE_MM} mm leader: the longest, ` +
    `${longest[0].label}, is ${describeLength(shortMm)} short.`;
  if (longest.length >= 2 && usable(longest[0]) + usable(longest[1]) >= need.lengthUsedMm) {
    return {
      kind: 'split',
      shortMm,
      rolls: [longest[0], longest[1]],
      sentence: `${base} Split the cut across two rolls, ${longest[0].label} and ${longest[1].label}, and lay out each part again.`,
    };
  }
  return { kind: 'none', shortMm, sentence: `${base} Not even two rolls together have enough: receive more film or split the order.` };
}

function usable(roll: RackRoll): number {
  return Math.max(0, roll.remainingMm - LEADER_ALLOWANCE_MM);
}

function preferenceOrder(a: RackRoll, b: RackRoll): number {
  const aPartly = a.remainingMm < a.lengthMm ? 0 : 1;
  const bPartly = b.remainingMm < b.lengthMm ? 0 : 1;
  if (aPartly !== bPartly) return aPartly - bPartly;
  if (aPartly === 0 && a.remainingMm !== b.remainingMm) return a.remainingMm - b.remainingMm;
  return a.widthMm - b.widthMm || a.remainingMm - b.remainingMm || a.id - b.id;
}
