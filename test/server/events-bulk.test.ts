import type { BatchReply, StationEvent } from '../../src/shared/events-contract';
import type { RunningHub } from '../../server/hub';
import { freshBag, openSocket, operatorOn, startTestHub, stationEvent, type ClientSocket } from './events-fixtures';

let hub: RunningHub;
const sockets: ClientSocket[] = [];

beforeAll(async () => {
  hub = await startTestHub();
});
afterAll(async () => {
  sockets.forEach((socket) => socket.disconnect());
  await hub.close();
});

const TOTAL = 5000;
const PER_BATCH = 100;

describe('a long offline outbox', () => {
  // A correctness check, not a timing check: every event stored once, in the tablet's order.
  it(
    'stores 5,000 events pushed over the socket in batches of 100 in order, with counts that match',
    async () => {
      const pack = await operatorOn(hub.url, hub.db, 'Pack 1', 0);
      const bags = await Promise.all([freshBag(hub.db, 500), freshBag(hub.db, 500), freshBag(hub.db, 500)]);
      const events: StationEvent[] = Array.from({ length: TOTAL }, (_, i) => {
        const bag = bags[i % bags.length]!;
        const at = { bagId: bag.id, stationId: pack.stationId, userId: pack.userId };
        return i % 10 === 0 ? stationEvent(at, 'scan', 0) : stationEvent(at, 'pack_done', (i % 3) + 1);
      });
      const tablet = await openSocket(hub.url, pack.cookie, sockets);

      for (let i = 0; i < TOTAL; i += PER_BATCH) {
        const reply = (await tablet.timeout(60_000).emitWithAck('events:push', { events: events.slice(i, i + PER_BATCH) })) as BatchReply;
        expect({ accepted: reply.accepted.length, rejected: reply.rejected }).toEqual({ accepted: PER_BATCH, rejected: [] });
      }

      const stored = await hub.db('events').whereIn('bag_id', bags.map((bag) => bag.id)).orderBy('seq').pluck('id');
      expect(stored).toEqual(events.map((event) => event.id));
      for (const bag of bags) {
        const expected = events.filter((event) => event.bagId === bag.id).reduce((sum, event) => sum + event.quantity, 0);
        const row = await hub.db('bags').where({ id: bag.id }).first();
        expect({ bag: bag.id, packed: row!.qty_packed }).toEqual({ bag: bag.id, packed: expected });
      }
    },
    300_000,
  );
});
