import type { BatchReply, StationEvent } from '../../src/shared/events-contract';
import type { EventKind, StationKind } from '../../src/shared/names';
import type { Principal } from '../auth/principal';
import type { Db } from '../db/tables';
import { applyEvent, DONE_STAGE, KINDS_FOR_STATION, overCountProblems, stageOf, type BagCounts } from '../../src/shared/events/bag-progress';
import { payloadSchemas, stationEventSchema } from './event-schemas';
import { EventsRepository, type LockedBag } from './events-repository';
import type { EventFollowers } from './event-followers';

/** How far ahead of the hub's clock a tablet's clock may run before its events are refused. */
export const MAX_CLIENT_AHEAD_MS = 5 * 60 * 1000;
/** How old an event may be: a tablet offline longer than this should be checked by a lead first. */
export const MAX_CLIENT_AGE_MS = 30 * 24 * 60 * 60 * 1000;

/** Why one event was refused: the sentence goes back to the tablet as it is. */
class EventRefused extends Error {}

type Outcome = { status: 'accepted'; bagId: number; version: number } | { status: 'duplicate' } | { status: 'rejected'; error: string };

const isDuplicateKey = (err: unknown) => (err as { code?: string }).code === 'ER_DUP_ENTRY';
const isOutOfRange = (err: unknown) => (err as { code?: string }).code === 'ER_WARN_DATA_OUT_OF_RANGE';

function firstIssue(issues: { path: PropertyKey[]; message: string }[]): string {
  const issue = issues[0]!;
  return issue.path.length > 0 ? `${issue.path.join('.')}: ${issue.message}` : issue.message;
}

const countsOf = (bag: LockedBag, spoiledAt: Record<StationKind, number>): BagCounts => ({
  pieces: bag.pieces,
  cut: bag.qty_cut,
  weeded: bag.qty_weeded,
  pressed: bag.qty_pressed,
  packed: bag.qty_packed,
  spoiledAt,
});

/**
 * Station events: checks each event of a batch, stores it under its client UUID and moves the bag's
 * counts in the same transaction. Each event has its own transaction (a savepoint when the service
 * was given a transaction), in batch order, so a refused event never blocks the ones behind it.
 */
export class EventsService {
  private readonly repository: EventsRepository;

  /** `db` may be a Knex transaction; then pass no followers and tell the floor after your commit. */
  constructor(db: Db, private readonly followers?: EventFollowers) {
    this.repository = new EventsRepository(db);
  }

  /** Stores a batch in order and answers which events were accepted, already stored, or refused (with a sentence). */
  async ingest(principal: Principal, events: StationEvent[]): Promise<BatchReply> {
    const reply: BatchReply = { accepted: [], duplicates: [], rejected: [] };
    const changed = new Set<number>();
    let version = 0;
    const now = new Date();
    for (const [index, raw] of (events as unknown[]).entries()) {
      const outcome = await this.ingestOne(principal, raw, now);
      const id = typeof (raw as { id?: unknown })?.id === 'string' ? (raw as { id: string }).id : `event ${index + 1} of the batch`;
      if (outcome.status === 'accepted') {
        reply.accepted.push(id);
        changed.add(outcome.bagId);
        version = Math.max(version, outcome.version);
      } else if (outcome.status === 'duplicate') reply.duplicates.push(id);
      else reply.rejected.push({ id, error: outcome.error });
    }
    if (principal.station) await this.repository.markSynced(principal.station.id, now);
    // After the commit: an order whose last bag was packed becomes ready before the board is told.
    await this.followers?.readiness?.bagsChanged([...changed]);
    this.followers?.floor.bagsChanged([...changed], version);
    return reply;
  }

  private async ingestOne(principal: Principal, raw: unknown, now: Date): Promise<Outcome> {
    const parsed = stationEventSchema.safeParse(raw);
    if (!parsed.success) return { status: 'rejected', error: `This event is not valid (${firstIssue(parsed.error.issues)}).` };
    const payload = payloadSchemas[parsed.data.kind].safeParse(parsed.data.payload ?? {});
    if (!payload.success) return { status: 'rejected', error: `This ${parsed.data.kind} event's details are not valid (${firstIssue(payload.error.issues)}).` };
    const event = { ...parsed.data, payload: payload.data as Record<string, unknown> };

    try {
      return await this.repository.inTransaction(async (repository) => {
        // A replay answers "duplicate" even if the event would no longer pass (its order cancelled since).
        if (await repository.exists(event.id)) return { status: 'duplicate' } as const;
        this.checkWhoAndWhen(principal, event, now);
        const bag = await repository.lockBag(event.bagId);
        if (!bag) throw new EventRefused(`There is no bag ${event.bagId}. Scan the bag's label again; it may have been split again.`);
        if (bag.order_status === 'cancelled') throw new EventRefused(`Bag ${bag.code} belongs to a cancelled order. Put it aside and tell the lead.`);
        const spoilStage = event.kind === 'spoil' ? (event.payload['stage'] as StationKind) : undefined;
        if (spoilStage && !(await repository.activeReason(event.payload['reasonId'] as number))) {
          throw new EventRefused('That spoil reason is not on the list any more. Pick a reason from the current list.');
        }

        const before = countsOf(bag, await repository.spoiledByStage(bag.id));
        const after = applyEvent(before, event.kind, event.quantity, spoilStage);
        const problems = after === before ? [] : overCountProblems(after);
        const reason = problems.length > 0 ? await this.overCountReason(repository, bag, event, problems) : null;

        await repository.insertEvent({
          id: event.id,
          bag_id: bag.id,
          station_id: event.stationId,
          user_id: event.userId,
          kind: event.kind,
          quantity: event.quantity,
          client_at: new Date(event.clientAt),
          payload: event.payload,
          over_count_reason: reason,
        });
        if (spoilStage) {
          await repository.insertSpoil({
            event_id: event.id,
            bag_id: bag.id,
            stage: spoilStage,
            reason_id: event.payload['reasonId'] as number,
            quantity: event.quantity,
            note: event.payload['note'] as string,
          });
        }
        if (after === before) return { status: 'accepted', bagId: bag.id, version: Number(bag.version) } as const;
        const version = await repository.updateBag(bag.id, {
          qty_cut: after.cut,
          qty_weeded: after.weeded,
          qty_pressed: after.pressed,
          qty_packed: after.packed,
          // Every spoiled piece is one remake: it passes the stages before its spoil stage again.
          qty_spoiled: bag.qty_spoiled + (spoilStage ? event.quantity : 0),
          remake_count: bag.remake_count + (spoilStage ? event.quantity : 0),
          stage: stageOf(after),
          // The flag follows the counts: a late event from an offline tablet can make them consistent again.
          over_count: problems.length > 0,
        });
        return { status: 'accepted', bagId: bag.id, version } as const;
      });
    } catch (err) {
      if (err instanceof EventRefused) return { status: 'rejected', error: err.message };
      // Two pushes of the same event at once: the primary key decides, the loser is a duplicate.
      if (isDuplicateKey(err)) return { status: 'duplicate' };
      if (isOutOfRange(err)) return { status: 'rejected', error: 'This event would take a bag count past what the hub can store. Ask the lead to check the bag.' };
      throw err;
    }
  }

  private checkWhoAndWhen(principal: Principal, event: StationEvent, now: Date): void {
    const station = principal.station;
    if (principal.role !== 'operator' || !station) throw new EventRefused('Only a signed-in station can report station events. Sign in with your PIN on the station tablet.');
    if (event.stationId !== station.id) {
      throw new EventRefused(`This event is for station ${event.stationId}, but this tablet is signed in at ${station.name}. Events are reported from the station where the work happened.`);
    }
    if (event.userId !== principal.userId) throw new EventRefused(`This event was made by another operator (user ${event.userId}). Each operator signs in with their own PIN.`);
    if (!KINDS_FOR_STATION[station.kind].includes(event.kind)) {
      throw new EventRefused(`A ${station.kind} station cannot report ${event.kind}; it reports ${KINDS_FOR_STATION[station.kind].join(', ')}.`);
    }
    this.checkQuantity(event.kind, event.quantity);
    const at = new Date(event.clientAt).getTime();
    if (at > now.getTime() + MAX_CLIENT_AHEAD_MS) throw new EventRefused("This event's time is more than 5 minutes ahead of the hub's clock. Check the tablet's date and time.");
    if (at < now.getTime() - MAX_CLIENT_AGE_MS) throw new EventRefused('This event is more than 30 days old. A lead should check it and enter the counts by hand.');
  }

  private checkQuantity(kind: EventKind, quantity: number): void {
    if (kind === 'scan' && quantity !== 0) throw new EventRefused('A scan counts no pieces: send quantity 0.');
    if ((kind === 'spoil' || DONE_STAGE[kind]) && quantity < 1) throw new EventRefused(`A ${kind} event counts at least 1 piece.`);
  }

  private async overCountReason(repository: EventsRepository, bag: LockedBag, event: StationEvent, problems: string[]): Promise<string> {
    const others = await repository.otherReporters(bag.id, event.kind, event.stationId);
    const alsoBy = others.length > 0 ? ` ${others.join(', ')} also reported ${event.kind} on this bag.` : '';
    return `Over-count on bag ${bag.code}: ${problems.join(' ')}${alsoBy}`.slice(0, 400);
  }
}
