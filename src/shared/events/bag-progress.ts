import type { BagStage, EventKind, StationKind } from '../names';

/** A bag's running counts. Done counts are good pieces leaving a stage; spoils are pieces lost at one. */
export interface BagCounts {
  pieces: number;
  cut: number;
  weeded: number;
  pressed: number;
  packed: number;
  /** Pieces spoiled, by the stage where they were spoiled. */
  spoiledAt: Record<StationKind, number>;
}

/** Spoils per stage of a bag with none yet. */
export function noSpoils(): Record<StationKind, number> {
  return { cut: 0, weed: 0, press: 0, pack: 0 };
}

/** The stages of work in the order a bag meets them. */
export const ROUTE: readonly StationKind[] = ['cut', 'weed', 'press', 'pack'];
const STAGE_AFTER: Record<StationKind, BagStage> = { cut: 'cut', weed: 'weeded', press: 'pressed', pack: 'packed' };
const COUNT_OF: Record<StationKind, 'cut' | 'weeded' | 'pressed' | 'packed'> = { cut: 'cut', weed: 'weeded', press: 'pressed', pack: 'packed' };
const STAGE_WORD: Record<StationKind, string> = { cut: 'cut', weed: 'weeded', press: 'pressed', pack: 'packed' };

/** The station kind whose count a done event adds to. */
export const DONE_STAGE: Partial<Record<EventKind, StationKind>> = { cut_done: 'cut', weed_done: 'weed', press_done: 'press', pack_done: 'pack' };

/** The event kinds each station kind may report. */
export const KINDS_FOR_STATION: Record<StationKind, readonly EventKind[]> = {
  cut: ['scan', 'test_cut', 'cut_done', 'spoil'],
  weed: ['scan', 'weed_done', 'spoil'],
  press: ['scan', 'press_done', 'spoil'],
  pack: ['scan', 'pack_done', 'spoil'],
};

/**
 * Good pieces a stage must deliver: the bag's pieces plus every piece spoiled at a LATER stage,
 * because a remake of a piece spoiled at the press has to be cut and weeded again.
 */
export function owedAt(counts: BagCounts, stage: StationKind): number {
  const later = ROUTE.slice(ROUTE.indexOf(stage) + 1);
  return counts.pieces + later.reduce((sum, kind) => sum + counts.spoiledAt[kind], 0);
}

/** The furthest stage whose good count reached what it owes; "queued" when none has. */
export function stageOf(counts: BagCounts): BagStage {
  for (const kind of [...ROUTE].reverse()) {
    if (counts[COUNT_OF[kind]] >= owedAt(counts, kind)) return STAGE_AFTER[kind];
  }
  return 'queued';
}

/**
 * Sentences naming every over-count in the bag's counts: a stage that handled more pieces (good
 * plus spoiled) than the stage before handed on, or delivered more good pieces than it owes.
 */
export function overCountProblems(counts: BagCounts): string[] {
  const problems: string[] = [];
  ROUTE.forEach((kind, i) => {
    const handled = counts[COUNT_OF[kind]] + counts.spoiledAt[kind];
    const before = ROUTE[i - 1];
    if (before && handled > counts[COUNT_OF[before]]) {
      problems.push(`${handled} pieces were ${STAGE_WORD[kind]} or spoiled at ${kind} but only ${counts[COUNT_OF[before]]} were ${STAGE_WORD[before]}.`);
    }
    const owed = owedAt(counts, kind);
    if (counts[COUNT_OF[kind]] > owed) {
      problems.push(`${counts[COUNT_OF[kind]]} pieces were ${STAGE_WORD[kind]} but the bag owes ${owed} at ${kind}.`);
    }
  });
  return problems;
}

/** The counts after one event; scans and test cuts change nothing. */
export function applyEvent(counts: BagCounts, kind: EventKind, quantity: number, spoilStage?: StationKind): BagCounts {
  const done = DONE_STAGE[kind];
  if (done) return { ...counts, [COUNT_OF[done]]: counts[COUNT_OF[done]] + quantity };
  if (kind === 'spoil' && spoilStage) return { ...counts, spoiledAt: { ...counts.spoiledAt, [spoilStage]: counts.spoiledAt[spoilStage] + quantity } };
  return counts;
}
