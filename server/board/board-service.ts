import { BOARD_ONLINE_SECONDS, type BoardFlag, type BoardHourly, type BoardLowRoll, type BoardOrder, type BoardReply, type BoardStation } from '../../src/shared/board-contract';
import { noSpoils } from '../../src/shared/events/bag-progress';
import { DONE_WORK } from '../../src/shared/floor/bag-counts';
import { floorNumbers, type FloorNumbers } from '../../src/shared/floor/floor-numbers';
import { shiftSoFarWindow } from '../../src/shared/floor/station-rate';
import { HOUR_MS, type FloorBag, type FloorEvent, type FloorShift } from '../../src/shared/floor/floor-types';
import { nextShift, shiftWindow } from '../../src/shared/floor/shift-window';
import { shiftWorkingHours, type AddWorkingHours } from '../../src/shared/floor/working-time';
import { parseWorkingDays } from '../../src/shared/shop-contract';
import { BagsRepository, type SpoiledAtByBag } from '../bags/bags-repository';
import type { Db, ShopSettingsRow, StationRow } from '../db/tables';
import { HttpError } from '../http/http-error';
import type { RollWithFilm } from '../rolls/roll-view';
import { BoardRepository, type BoardBagRow, type FlagRow, type OpenOrderRow, type ShiftEventRow } from './board-repository';
import { closedDatesOf, standardRatesOf } from '../shop/shop-view';

/** Millimetres in an inch, exactly (international inch, 1959). */
const MM_PER_INCH = 25.4;

/** The floor board: this shift's numbers from the stored events, bags, orders, rolls and stations. */
export class BoardService {
  private readonly repository: BoardRepository;
  private readonly bags: BagsRepository;

  constructor(db: Db) {
    this.repository = new BoardRepository(db);
    this.bags = new BagsRepository(db);
  }

  /** The board as it stands at `now`. */
  async board(now = new Date()): Promise<BoardReply> {
    const settings = await this.repository.settings();
    const { shift, planShift, addWorkingHours } = shopTime(now, settings);
    // The numbers need only this shift's events (from when it opened, so early work counts): rates, yield, spoils and the hourly chart are about the shift,
    // and each bag's counts (for work in progress and ETAs) are kept on the bag itself, not replayed from events.
    const from = new Date(shift.openedAt ?? shift.startAt);
    const [stations, lastEvents, events, bagRows, orders, rolls, flags] = await Promise.all([
      this.repository.stations(),
      this.repository.lastEventAt(),
      this.repository.eventsBetween(from, now),
      this.repository.boardBags(from, now),
      this.repository.openOrders(),
      this.repository.lowRolls(),
      this.repository.overCountFlags(),
    ]);
    const bagSpoils = await this.bags.spoiledAtByBag(bagRows.map((bag) => bag.id));

    const floorEvents = events.map(toFloorEvent);
    const numbers = floorNumbers({
      stations: stations.map(({ id, kind, name }) => ({ id, kind, name })),
      events: floorEvents,
      bags: toFloorBags(bagRows, bagSpoils),
      orders: orders.map((order) => ({ id: order.id, code: order.code, dueAt: order.due_at.toISOString() })),
      spoils: spoilsOf(events),
      shift,
      standardRates: standardRatesOf(settings),
      addWorkingHours,
      planShift,
    });

    return {
      generatedAt: now.toISOString(),
      shift: { startAt: shift.startAt, endAt: shift.endAt },
      stations: boardStations(stations, numbers, lastEvents, now),
      stages: numbers.workInProgress.byStage,
      orders: boardOrders(orders, numbers),
      firstPassYield: numbers.yield.firstPassYield,
      spoilRate: numbers.yield.spoilRate,
      spoilReasons: numbers.spoilReasons.map(({ reason, quantity, share, cumulativeShare }) => ({ reason, pieces: quantity, share, cumulativeShare })),
      taktS: numbers.takt.secondsPerPiece,
      piecesDueToday: numbers.takt.piecesDue,
      lowRolls: rolls.map(toLowRoll),
      flags: flags.map((flag) => toFlag(flag, now)),
      hourly: hourly(stations, floorEvents, shift),
    };
  }
}

/**
 * The shift on the floor (any day: work done on a day off still shows), the shift takt plans for (the next
 * working day's once it has ended), and the shop's working hours (the shifts of its working days that are not closed days).
 */
function shopTime(now: Date, settings: ShopSettingsRow): { shift: FloorShift; planShift: FloorShift; addWorkingHours: AddWorkingHours } {
  const { time_zone: zone, shift_start: start, shift_end: end } = settings;
  const workingDays = parseWorkingDays(settings.working_days);
  const closedDays = closedDatesOf(settings);
  try {
    const shift = shiftWindow(now, zone, start, end);
    return {
      shift,
      planShift: now.getTime() < Date.parse(shift.endAt) ? shift : nextShift(now, zone, start, end, workingDays, closedDays),
      addWorkingHours: shiftWorkingHours(zone, start, end, workingDays, closedDays),
    };
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    throw new HttpError(500, `The shop settings cannot place today's shift: ${error.message} The owner can correct it in the shop settings.`);
  }
}

function toFloorEvent(row: ShiftEventRow): FloorEvent {
  return {
    bagId: row.bag_id,
    stationId: row.station_id,
    stationKind: row.station_kind,
    kind: row.kind,
    quantity: row.quantity,
    at: row.server_at.toISOString(),
    recordedAt: row.client_at.toISOString(),
    ...(row.spoil_stage ? { spoilStage: row.spoil_stage } : {}),
  };
}

function toFloorBags(rows: BoardBagRow[], spoiledAt: SpoiledAtByBag): FloorBag[] {
  return rows.map((bag) => ({
    id: bag.id,
    orderId: bag.order_id,
    stage: bag.stage,
    pieces: bag.pieces,
    counts: { cut: bag.qty_cut, weeded: bag.qty_weeded, pressed: bag.qty_pressed, packed: bag.qty_packed, spoiledAt: spoiledAt.get(bag.id) ?? noSpoils() },
    queuedAt: bag.created_at.toISOString(),
  }));
}

function spoilsOf(events: ShiftEventRow[]) {
  return events.filter((e) => e.kind === 'spoil').map((e) => ({ reason: e.reason ?? 'No reason recorded', quantity: e.quantity }));
}

function boardStations(stations: StationRow[], numbers: FloorNumbers, lastEvents: Map<number, Date>, now: Date): BoardStation[] {
  const rates = new Map(numbers.stations.map((rate) => [rate.stationId, rate]));
  const onlineSince = now.getTime() - BOARD_ONLINE_SECONDS * 1000;
  return stations.map((station) => {
    const rate = rates.get(station.id);
    const heard = Math.max(station.last_seen_at?.getTime() ?? 0, station.last_sync_at?.getTime() ?? 0);
    return {
      id: station.id,
      name: station.name,
      kind: station.kind,
      piecesPerHour: rate?.rollingHourPiecesPerHour ?? null,
      shiftPieces: rate?.shiftPieces ?? 0,
      shiftPiecesPerHour: rate?.shiftPiecesPerHour ?? null,
      online: heard >= onlineSince,
      lastEventAt: lastEvents.get(station.id)?.toISOString() ?? null,
      lastSyncAt: station.last_sync_at?.toISOString() ?? null,
      lastSeenAt: station.last_seen_at?.toISOString() ?? null,
    };
  });
}

function boardOrders(orders: OpenOrderRow[], numbers: FloorNumbers): BoardOrder[] {
  const etas = new Map(numbers.orders.map((eta) => [eta.orderId, eta]));
  return orders.map((order) => {
    const eta = etas.get(order.id);
    return {
      id: order.id,
      code: order.code,
      customerName: order.customer_name,
      dueAt: order.due_at.toISOString(),
      etaAt: eta?.eta ?? null,
      atRisk: eta?.atRisk ?? false,
      remainingPieces: eta?.bottleneck ? eta.remaining[eta.bottleneck] : 0,
      bottleneck: eta?.bottleneck ?? null,
      rateSource: eta?.rateSource ?? null,
    };
  });
}

/** Inches to one decimal: the Roll rack's unit in an imperial shop, and fine enough to see a roll shrink. */
const inches = (mm: number) => Math.round((mm / MM_PER_INCH) * 10) / 10;

function toLowRoll(roll: RollWithFilm): BoardLowRoll {
  return {
    id: roll.id,
    label: roll.label,
    film: `${roll.film_type_name} ${roll.colour}`,
    rackSlot: roll.rack_slot,
    remainingIn: inches(roll.remaining_mm),
    reorderIn: inches(roll.reorder_mm),
  };
}

function toFlag(flag: FlagRow, now: Date): BoardFlag {
  return {
    kind: 'over_count',
    bagId: flag.bag_id,
    bagCode: flag.bag_code,
    orderCode: flag.order_code,
    message: flag.over_count_reason ?? `Bag ${flag.bag_code} has more pieces counted than it holds. Count the bag and correct it with the lead.`,
    at: (flag.server_at ?? now).toISOString(),
  };
}

/** Good pieces per station in each whole hour of the shift's working time so far; the last slot is the hour now runs in. */
function hourly(stations: StationRow[], events: FloorEvent[], shift: FloorShift): BoardHourly {
  // The chart's hours are the rates' hours: from the shift start, or from the hour early work began in.
  const startMs = shiftSoFarWindow(shift, events).fromMs;
  const nowMs = Date.parse(shift.now);
  const slots = nowMs > startMs ? Math.ceil((nowMs - startMs) / HOUR_MS) : 0;
  const hours = Array.from({ length: slots }, (_, i) => new Date(startMs + i * HOUR_MS).toISOString());
  const pieces = new Map(stations.map((station) => [station.id, new Array<number>(slots).fill(0)]));
  for (const event of events) {
    if (!DONE_WORK[event.kind]) continue;
    // Start excluded, end included, as the floor numbers' windows count.
    const slot = Math.ceil((Date.parse(event.at) - startMs) / HOUR_MS) - 1;
    const row = pieces.get(event.stationId);
    if (row && slot >= 0 && slot < slots) row[slot]! += event.quantity;
  }
  return { hours, stations: stations.map((station) => ({ id: station.id, name: station.name, pieces: pieces.get(station.id)! })) };
}
