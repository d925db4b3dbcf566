import { plainTicket } from '../sync/station-testing';
import { emptyTally, type TicketRow } from '../sync/station-db';
import { withEvent } from '../sync/ticket-counts';
import type { StationEvent, StationTicket } from '../../shared/events-contract';
import type { StationKind } from '../../shared/names';
import { packLines, packProgress } from './pack-lines';

// The expected numbers below are worked by hand from the counting rules (a remake is owed for every
// spoiled piece until the press has delivered it); they are Dwell's own rules, no outside source.

type Counts = StationTicket['bag']['counts'];

/** A bag of 4 S and 6 M with these counts; spoils are given per stage and the total follows them. */
function bag(counts: Partial<Omit<Counts, 'spoiled' | 'spoiledAt'>>, spoiledAt: Partial<Record<StationKind, number>> = {}, sizes: Record<string, number> = { S: 4, M: 6 }): StationTicket {
  const ticket = plainTicket(1, sizes);
  const perStage = { ...ticket.bag.counts.spoiledAt, ...spoiledAt };
  const spoiled = Object.values(perStage).reduce((a, b) => a + b, 0);
  ticket.bag.counts = { ...ticket.bag.counts, ...counts, spoiled, spoiledAt: perStage };
  return ticket;
}

function row(ticket: StationTicket): TicketRow {
  return { bagId: ticket.bag.id, token: ticket.bag.token, code: ticket.bag.code, version: ticket.version, ticket, local: emptyTally() };
}

describe('packProgress', () => {
  it('owes no remakes when every piece is pressed and nothing was spoiled', () => {
    expect(packProgress(bag({ pressed: 10 }).bag)).toEqual({ pieces: 10, pressed: 10, packed: 0, toPack: 10, readyToPack: 10, remakesOwed: 0, notPressed: 0 });
  });

  it('counts pieces spoiled at the press and not yet pressed again as remakes owed', () => {
    // 3 spoiled at the press, 8 good pressed: the press owes 10, 2 short, both remakes.
    expect(packProgress(bag({ pressed: 8 }, { press: 3 }).bag)).toMatchObject({ remakesOwed: 2, notPressed: 0, readyToPack: 8, toPack: 10 });
  });

  it('counts a piece spoiled at the weed bench as a remake the press still owes', () => {
    // 1 spoiled at weed, 9 good pressed: the press owes 10 (a weed spoil adds nothing later), 1 short.
    expect(packProgress(bag({ pressed: 9 }, { weed: 1 }).bag)).toMatchObject({ remakesOwed: 1, notPressed: 0, readyToPack: 9 });
  });

  it('owes nothing once the remakes are pressed', () => {
    expect(packProgress(bag({ pressed: 10 }, { cut: 1, press: 2 }).bag)).toMatchObject({ remakesOwed: 0, readyToPack: 10 });
  });

  it('counts a spoil at the pack bench as a remake the press owes, and not as a piece ready to pack', () => {
    // 10 pressed, 1 spoiled while packing: the press owes 11, so one remake; 9 good pieces to pack.
    expect(packProgress(bag({ pressed: 10 }, { pack: 1 }).bag)).toMatchObject({ remakesOwed: 1, readyToPack: 9, toPack: 10 });
  });

  it('handles a pack-bench spoil logged on another tablet from the ticket alone', () => {
    // Another pack tablet spoiled 2 pieces after 10 were pressed and 3 packed; this tablet's outbox
    // holds nothing, yet the press owes 12, so 2 remakes; 10 - 2 spoiled - 3 packed = 5 ready to pack.
    const fromHub = bag({ pressed: 10, packed: 3 }, { pack: 2 });
    expect(packProgress(fromHub.bag)).toEqual({ pieces: 10, pressed: 10, packed: 3, toPack: 7, readyToPack: 5, remakesOwed: 2, notPressed: 0 });
  });

  it('moves a pack-bench spoil logged on this tablet into the ticket the same way as one from the hub', () => {
    const spoil: StationEvent<'spoil'> = {
      id: '8c1f0c2e-4d5b-4f7a-9e21-3a6b7c8d9e01', bagId: 1, stationId: 4, userId: 7, kind: 'spoil', quantity: 2,
      clientAt: '2030-01-01T09:00:00Z', payload: { stage: 'pack', reasonId: 5, note: '', hasPhoto: false },
    };
    const here = withEvent(row(bag({ pressed: 10, packed: 3 })), spoil, 1).ticket.bag;
    expect(packProgress(here)).toEqual(packProgress(bag({ pressed: 10, packed: 3 }, { pack: 2 }).bag));
  });

  it('tells first-run pieces not pressed yet apart from remakes', () => {
    expect(packProgress(bag({ pressed: 5 }, { press: 1 }).bag)).toMatchObject({ remakesOwed: 1, notPressed: 4 });
  });
});

describe('packLines', () => {
  it('puts pieces this tablet packed on their size and fills the rest in size order', () => {
    const ticket = bag({ pressed: 10, packed: 5 }, {}, { M: 6, S: 4 });
    const lines = packLines(row(ticket), { packedBySize: { M: 2 } });
    // 2 M packed here; the other 3 packed elsewhere fill S first (4 room), so S 3, M 2.
    expect(lines.map((line) => [line.title, line.packed, line.ordered])).toEqual([['S', 3, 4], ['M', 2, 6]]);
  });
});
