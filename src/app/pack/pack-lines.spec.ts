import { plainTicket } from '../sync/station-testing';
import { emptyTally } from '../sync/station-db';
import type { StationTicket } from '../../shared/events-contract';
import { packLines, packProgress } from './pack-lines';

// The expected numbers below are worked by hand from the counting rules (a remake is owed for every
// spoiled piece until the press has delivered it); they are Dwell's own rules, no outside source.

function bag(counts: Partial<StationTicket['bag']['counts']>, sizes: Record<string, number> = { S: 4, M: 6 }): StationTicket {
  const ticket = plainTicket(1, sizes);
  ticket.bag.counts = { ...ticket.bag.counts, ...counts };
  return ticket;
}

describe('packProgress', () => {
  it('owes no remakes when every piece is pressed and nothing was spoiled', () => {
    expect(packProgress(bag({ pressed: 10 }).bag)).toEqual({ pieces: 10, pressed: 10, packed: 0, toPack: 10, readyToPack: 10, remakesOwed: 0, notPressed: 0 });
  });

  it('counts spoiled pieces not yet pressed again as remakes owed', () => {
    // 3 spoiled before or at the press, 8 good pressed: 10 owed, 2 short, both remakes.
    expect(packProgress(bag({ pressed: 8, spoiled: 3 }).bag)).toMatchObject({ remakesOwed: 2, notPressed: 0, readyToPack: 8, toPack: 10 });
  });

  it('owes nothing once the remakes are pressed', () => {
    expect(packProgress(bag({ pressed: 10, spoiled: 3 }).bag)).toMatchObject({ remakesOwed: 0, readyToPack: 10 });
  });

  it('counts a spoil at the pack bench as a remake the press owes, and not as a piece ready to pack', () => {
    // 10 pressed, 1 spoiled while packing: the press owes 11, so one remake; 9 good pieces to pack.
    expect(packProgress(bag({ pressed: 10, spoiled: 1 }).bag, { packedBySize: {}, packSpoils: 1 })).toMatchObject({ remakesOwed: 1, readyToPack: 9, toPack: 10 });
  });

  it('tells first-run pieces not pressed yet apart from remakes', () => {
    expect(packProgress(bag({ pressed: 5, spoiled: 1 }).bag)).toMatchObject({ remakesOwed: 1, notPressed: 4 });
  });
});

describe('packLines', () => {
  it('puts pieces this tablet packed on their size and fills the rest in size order', () => {
    const ticket = bag({ pressed: 10, packed: 5 }, { M: 6, S: 4 });
    const lines = packLines({ bagId: 1, token: '', code: '', version: 1, ticket, local: emptyTally() }, { packedBySize: { M: 2 }, packSpoils: 0 });
    // 2 M packed here; the other 3 packed elsewhere fill S first (4 room), so S 3, M 2.
    expect(lines.map((line) => [line.title, line.packed, line.ordered])).toEqual([['S', 3, 4], ['M', 2, 6]]);
  });
});
