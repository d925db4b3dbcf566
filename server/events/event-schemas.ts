import { z } from 'zod';
import { EVENT_KINDS, STATION_KINDS, type EventKind } from '../../src/shared/names';

/** The most events one push may carry; a tablet's outbox is sent in batches of this size or fewer. */
export const MAX_EVENTS_PER_BATCH = 500;

const whole = (what: string, max: number) =>
  z.number({ error: `${what} is a whole number.` }).int(`${what} is a whole number.`).min(0, `${what} is 0 or more.`).max(max, `${what} is at most ${max}.`);
const id = (what: string) => z.number({ error: `${what} is a whole number.` }).int(`${what} is a whole number.`).positive(`${what} is a positive whole number.`);

/** The fields every station event has; the payload is checked by kind afterwards. */
export const stationEventSchema = z.object({
  id: z.uuid('The event id must be a UUID made on the tablet.'),
  bagId: id('The bag id'),
  stationId: id('The station id'),
  userId: id('The user id'),
  kind: z.enum(EVENT_KINDS, `The kind must be one of ${EVENT_KINDS.join(', ')}.`),
  quantity: whole('The quantity', 500),
  clientAt: z.iso.datetime({ offset: true, error: 'The client time must be an ISO 8601 date and time, e.g. 2026-03-01T09:30:00.000Z.' }),
  payload: z.unknown(),
});

const optionalIds = z.array(id('A roster line id')).max(500).optional();

/** What each kind's payload must look like (see EventPayloads in the events contract). */
export const payloadSchemas: Record<EventKind, z.ZodType> = {
  scan: z.object({}),
  test_cut: z.object({
    cutterId: id('The cutter id'),
    filmTypeId: id('The film type id'),
    steps: z
      .array(z.object({ forceG: whole('A step force', 2000), cutClean: z.boolean(), weededClean: z.boolean() }))
      .min(1, 'A test cut tries at least one force.')
      .max(10, 'A test cut tries at most 10 forces.'),
    chosenForceG: whole('The chosen force', 2000).nullable(),
  }),
  cut_done: z.object({ cutterId: id('The cutter id').optional(), rollId: id('The roll id').optional(), lengthMm: whole('The length', 1_000_000).optional() }),
  weed_done: z.object({ rosterLineIds: optionalIds }),
  press_done: z.object({ pressId: id('The press id').optional(), temperatureC: whole('The temperature', 300).optional(), dwellS: whole('The dwell', 600).optional() }),
  spoil: z.object({
    stage: z.enum(STATION_KINDS, `The spoil stage must be one of ${STATION_KINDS.join(', ')}.`),
    reasonId: id('The spoil reason id'),
    note: z.string().max(500, 'The spoil note is at most 500 characters.'),
    hasPhoto: z.boolean(),
  }),
  pack_done: z.object({ sizes: z.record(z.string().max(8), whole('A size quantity', 500)).optional() }),
};

/** POST /api/events and events:push: a list; each event is checked on its own so one bad one does not stop the rest. */
export const eventBatchSchema = z.object({
  events: z.array(z.unknown()).max(MAX_EVENTS_PER_BATCH, `Send at most ${MAX_EVENTS_PER_BATCH} events at once.`),
});
