import 'fake-indexeddb/auto';
import { signal } from '@angular/core';
import { noSpoils } from '../../shared/events/bag-progress';
import type { BatchReply, EventBatch, StationTicket } from '../../shared/events-contract';
import { StationDb, emptyTally } from './station-db';

// jsdom hides Node's structuredClone, which fake-indexeddb needs; blobs are kept by reference, as IndexedDB would keep them.
function cloneForSpecs<T>(value: T): T {
  if (value === null || typeof value !== 'object' || value instanceof Blob) return value;
  if (value instanceof Date) return new Date(value.getTime()) as T;
  if (Array.isArray(value)) return value.map(cloneForSpecs) as T;
  return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, cloneForSpecs(v)])) as T;
}
(globalThis as { structuredClone?: unknown }).structuredClone ??= cloneForSpecs;

let dbCount = 0;
/** A fresh station database of its own for one spec. */
export function freshStationDb(): StationDb {
  dbCount += 1;
  return new StationDb(`dwell-station-spec-${dbCount}-${Math.random().toString(36).slice(2)}`);
}

/** A signed-in operator at Weed 1, as specs need from the Session. */
export function operatorSession(kind: 'weed' | 'press' = 'weed') {
  return {
    user: signal({ id: 7, name: 'Ada Fenwick', email: '', role: 'operator' as const }),
    station: signal({ id: 3, name: 'Weed 1', kind }),
    role: signal('operator' as const),
    signedIn: signal(true),
    unconfirmed: signal(false),
    load: async () => undefined,
  };
}

/** A plain (not personalised) ticket with the given sizes. */
export function plainTicket(bagId: number, sizes: Record<string, number>, weeded = 0): StationTicket {
  const pieces = Object.values(sizes).reduce((a, b) => a + b, 0);
  return {
    version: 1,
    pressCard: null,
    pressCardProblem: 'No press at a weed station.',
    bag: {
      id: bagId, code: `2001-${String.fromCharCode(64 + bagId)}`, token: `${'t'.repeat(42)}${bagId % 10}`, jobId: 1, stage: 'cut',
      sizes, pieces, counts: { cut: pieces, weeded, pressed: 0, packed: 0, spoiled: 0, spoiledAt: noSpoils() }, remakeCount: 0, overCount: false,
    },
    order: { id: 1, code: '2001', dueAt: '2030-01-01T12:00:00Z', customerName: 'Fernhollow Bowls Club' },
    job: {
      id: 1, name: 'Club crest', design: null, designWidthMm: 100, designHeightMm: 80, placement: 'left_chest', offsetXMm: null, offsetYMm: null,
      garment: 'Polo, navy', fabric: { id: 1, name: '100% cotton', maxTempC: 200 }, layers: [], quantities: sizes, pieces, personalised: false, rotationAllowed: true,
    },
    rosterLines: [],
  };
}

/** Stores a ticket straight into the cache, as a pull from the hub would. */
export async function cacheTicket(db: StationDb, ticket: StationTicket): Promise<void> {
  await db.tickets.put({ bagId: ticket.bag.id, token: ticket.bag.token, code: ticket.bag.code, version: ticket.version, ticket, local: emptyTally() });
}

/** A socket.io client stand-in: records pushes and answers them as the spec says. */
export class FakeSocket {
  connected = false;
  readonly pushes: EventBatch[] = [];
  /** How the hub answers a batch; null means the answer is lost. */
  answer: (batch: EventBatch) => BatchReply | { error: string } | null = (batch) => ({ accepted: batch.events.map((e) => e.id), duplicates: [], rejected: [] });
  private readonly handlers = new Map<string, ((...args: unknown[]) => void)[]>();

  on(event: string, handler: (...args: unknown[]) => void): this {
    this.handlers.set(event, [...(this.handlers.get(event) ?? []), handler]);
    return this;
  }

  connect(): this {
    this.connected = true;
    this.fire('connect');
    return this;
  }

  disconnect(): this {
    this.connected = false;
    this.fire('disconnect');
    return this;
  }

  emit(_name: string, batch: EventBatch, ack: (reply: BatchReply | { error: string }) => void): this {
    this.pushes.push(batch);
    const reply = this.answer(batch);
    if (reply) setTimeout(() => ack(reply), 0);
    return this;
  }

  fire(event: string, ...args: unknown[]): void {
    for (const handler of this.handlers.get(event) ?? []) handler(...args);
  }
}

/** Waits (real time) until `check` holds, or fails after `ms`. */
export async function until(check: () => boolean | Promise<boolean>, ms = 5000, everyMs = 5): Promise<void> {
  const end = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > end) throw new Error('Timed out waiting for a condition.');
    await new Promise((resolve) => setTimeout(resolve, everyMs));
  }
}
