import type { StationTicket, TicketsReply } from '../../src/shared/events-contract';
import type { BagTicket } from '../../src/shared/intake-contract';
import type { StationKind } from '../../src/shared/names';
import type { Principal } from '../auth/principal';
import { toBagSummary } from '../bags/bag-view';
import { BagsRepository } from '../bags/bags-repository';
import { BagsService } from '../bags/bags-service';
import type { Db, StationRow } from '../db/tables';
import { HttpError, notFound } from '../http/http-error';
import { toJobDetail } from '../jobs/job-view';
import { JobsRepository } from '../jobs/jobs-repository';
import { PressCardService } from '../press/press-card-service';
import { PressRepository } from '../press/press-repository';
import { stationNeedsBag } from './station-needs';
import { TicketsRepository, type VersionedBag } from './tickets-repository';

/**
 * How far back each pull reaches before `since`, in microseconds. A bag's version is taken inside
 * its event's transaction and becomes visible at commit; each event has its own short transaction,
 * so a version is never visible more than a few seconds after it was taken. Tickets pulled twice are
 * harmless: the tablet replaces them.
 */
export const PULL_OVERLAP_MICROS = 10_000_000;

const NO_PRESS = 'This press station has no press chosen, so there is no press card. Ask the lead to choose its press on the Stations screen.';

/** Station tickets: the open bags a station needs, with press cards for press stations. */
export class TicketsService {
  private readonly tickets: TicketsRepository;
  private readonly jobs: JobsRepository;
  private readonly bags: BagsService;
  private readonly bagRows: BagsRepository;
  private readonly cards: PressCardService;

  constructor(db: Db) {
    this.tickets = new TicketsRepository(db);
    this.jobs = new JobsRepository(db);
    this.bags = new BagsService(db);
    this.bagRows = new BagsRepository(db);
    this.cards = new PressCardService(new PressRepository(db));
  }

  /** The signed-in station's tickets changed after `since` (all of them for 0), and the bags that left its work. */
  async changedSince(principal: Principal, since: number): Promise<TicketsReply> {
    const station = await this.stationOf(principal);
    const version = await this.tickets.currentVersion();
    const changed = await this.tickets.changedBags(since > 0 ? since - PULL_OVERLAP_MICROS : null, since === 0);
    const open = changed.filter((bag) => stationNeedsBag(station.kind, bag));
    const closedBagIds = since === 0 ? [] : changed.filter((bag) => !stationNeedsBag(station.kind, bag)).map((bag) => bag.id);
    return { version, tickets: await this.stationTickets(open, station), closedBagIds };
  }

  /** One bag's ticket by the token on its label, with a press card when a press station asks. */
  async byToken(principal: Principal, token: string): Promise<StationTicket> {
    const ticket = await this.bags.ticket(token);
    const bag = await this.tickets.bag(ticket.bag.id);
    if (!bag) throw notFound('No bag has this code any more. Ask the lead for a fresh label.');
    const station = principal.station ? await this.tickets.station(principal.station.id) : undefined;
    return { ...ticket, version: Number(bag.effective_version), ...(await this.pressCardFor(bag.id, station)) };
  }

  private async stationOf(principal: Principal): Promise<StationRow> {
    const station = principal.station ? await this.tickets.station(principal.station.id) : undefined;
    if (!station) throw notFound('This tablet is not paired with a station any more. Ask the lead to pair it again.');
    return station;
  }

  private async stationTickets(bags: VersionedBag[], station: StationRow): Promise<StationTicket[]> {
    if (bags.length === 0) return [];
    const [records, orders, spoiledAt] = await Promise.all([
      this.jobs.records({ jobIds: [...new Set(bags.map((bag) => bag.job_id))] }),
      this.tickets.orders([...new Set(bags.map((bag) => bag.order_id))]),
      this.bagRows.spoiledAtByBag(bags.map((bag) => bag.id)),
    ]);
    const recordByJob = new Map(records.map((record) => [record.job.id, record]));
    const orderById = new Map(orders.map((order) => [order.id, order]));
    const out: StationTicket[] = [];
    for (const bag of bags) {
      const record = recordByJob.get(bag.job_id)!;
      const order = orderById.get(bag.order_id)!;
      const { rosterLines, ...job } = toJobDetail(record);
      const ticket: BagTicket = {
        bag: toBagSummary(bag, spoiledAt),
        order: { id: order.id, code: order.code, dueAt: order.due_at.toISOString(), customerName: order.customer_name },
        job,
        rosterLines: rosterLines.filter((line) => line.bagId === bag.id),
      };
      out.push({ ...ticket, version: Number(bag.effective_version), ...(await this.pressCardFor(bag.id, station)) });
    }
    return out;
  }

  /** The press card for a press station through the press-card service, or the sentence saying why there is none. */
  private async pressCardFor(bagId: number, station: StationRow | undefined): Promise<Pick<StationTicket, 'pressCard' | 'pressCardProblem'>> {
    if (!station || (station.kind as StationKind) !== 'press') return { pressCard: null, pressCardProblem: null };
    if (station.press_id === null) return { pressCard: null, pressCardProblem: NO_PRESS };
    try {
      return { pressCard: await this.cards.forBag(bagId, station.press_id), pressCardProblem: null };
    } catch (err) {
      if (err instanceof HttpError) return { pressCard: null, pressCardProblem: err.message };
      throw err;
    }
  }
}
