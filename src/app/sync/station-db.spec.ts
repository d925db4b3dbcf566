import 'fake-indexeddb/auto';
import Dexie from 'dexie';
import { plainTicket } from './station-testing';
import { StationDb, emptyTally } from './station-db';

describe('StationDb', () => {
  const name = `dwell-station-upgrade-spec-${Math.random().toString(36).slice(2)}`;

  afterEach(() => Dexie.delete(name));

  it('gives tickets cached before spoils per stage their total at the press and pulls every ticket afresh', async () => {
    // A tablet's database as version 1 left it: a ticket whose counts hold only the spoiled total.
    const before = new Dexie(name);
    before.version(1).stores({ tickets: 'bagId, token, code, version', outbox: 'id, seq, state, [state+seq], ackedAt', photos: 'eventId, state', meta: 'name' });
    const ticket = plainTicket(1, { M: 4 });
    const { spoiledAt: _dropped, ...oldCounts } = ticket.bag.counts;
    const oldTicket = { ...ticket, bag: { ...ticket.bag, counts: { ...oldCounts, spoiled: 2 } } };
    await before.table('tickets').put({ bagId: 1, token: ticket.bag.token, code: ticket.bag.code, version: 7, ticket: oldTicket, local: emptyTally() });
    await before.table('meta').put({ name: 'lastVersion', value: 7 });
    before.close();

    const after = new StationDb(name);
    const counts = (await after.tickets.get(1))!.ticket.bag.counts;
    expect(counts.spoiledAt).toEqual({ cut: 0, weed: 0, press: 2, pack: 0 });
    expect(counts.spoiled).toBe(2);
    expect(await after.meta.get('lastVersion')).toBeUndefined();
    after.close();
  });
});
