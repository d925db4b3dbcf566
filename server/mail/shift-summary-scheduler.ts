import type { Logger } from 'pino';
import type { BoardReply } from '../../src/shared/board-contract';
import { localDate, shiftWindow, worksOn } from '../../src/shared/floor/shift-window';
import type { MailSummary } from '../../src/shared/mail-contract';
import { parseWorkingDays } from '../../src/shared/shop-contract';
import type { Db } from '../db/tables';
import { conflict } from '../http/http-error';
import { closedDatesOf } from '../shop/shop-view';
import { toMailSummary } from './mail-log-view';
import type { MailOutbox } from './mail-outbox';
import { MailRepository } from './mail-repository';
import { shiftSummaryMessage } from './messages/shift-summary-message';

/** The floor numbers as they stood at a moment (the board's own computation). */
export type FloorNumbersAt = (now?: Date) => Promise<BoardReply>;

/** How often the scheduler looks whether the shift has ended. */
export const CHECK_EVERY_MS = 60_000;
/** A shift that ended longer ago than this gets no summary (the hub was off): a day-old summary helps nobody. */
export const LATE_SUMMARY_MS = 12 * 3_600_000;

/** The shift that ended most recently before `now` and not too long ago, or null. */
export function endedShift(now: Date, timeZone: string, shiftStart: string, shiftEnd: string): { shiftDate: string; endAt: Date } | null {
  // Today's shift, and the one a day earlier, which catches an overnight shift that ended this morning.
  const candidates = [shiftWindow(now, timeZone, shiftStart, shiftEnd), shiftWindow(new Date(now.getTime() - 86_400_000), timeZone, shiftStart, shiftEnd)]
    .map((shift) => ({ shiftDate: localDate(new Date(shift.startAt), timeZone), endAt: new Date(shift.endAt) }))
    .filter((shift) => shift.endAt.getTime() <= now.getTime() && now.getTime() - shift.endAt.getTime() <= LATE_SUMMARY_MS)
    .sort((a, b) => b.endAt.getTime() - a.endAt.getTime());
  return candidates[0] ?? null;
}

/** Whether the board shows anything done in its shift: good pieces at a station or a spoil reported. */
export function workRecorded(board: BoardReply): boolean {
  return board.stations.some((station) => station.shiftPieces > 0) || board.spoilReasons.length > 0;
}

/**
 * The owner's end-of-shift summary: each minute it looks whether the shop's shift has ended and no
 * summary for that shift exists yet, then queues one to every active owner. A shift on a day the shop
 * does not work gets one only when work was recorded in it (someone came in). A lead can also ask for
 * the shift so far at any time.
 */
export class ShiftSummaryScheduler {
  private readonly repository: MailRepository;
  private timer: NodeJS.Timeout | null = null;
  private checking: Promise<number> | null = null;
  /** The last ended shift on a day off found with no work: its events are stored, so it stays quiet. */
  private quietShift: string | null = null;

  constructor(
    private readonly db: Db,
    private readonly mail: MailOutbox,
    private readonly numbersAt: FloorNumbersAt,
    private readonly logger: Logger,
  ) {
    this.repository = new MailRepository(db);
  }

  /** Starts the minute timer (it does not keep the process alive). */
  start(): void {
    if (this.timer) return;
    this.timer = setInterval(() => void this.check().catch((error: unknown) => this.logger.error({ err: error }, 'The end-of-shift summary check failed; it runs again in a minute.')), CHECK_EVERY_MS);
    this.timer.unref();
  }

  /** Stops the timer. */
  stop(): void {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
  }

  /** Queues the end-of-shift summary if the shift has ended and none was queued for it; answers how many messages were queued. */
  check(now = new Date()): Promise<number> {
    // One check at a time, so a slow check and the next tick never both queue a summary.
    this.checking ??= this.checkOnce(now).finally(() => {
      this.checking = null;
    });
    return this.checking;
  }

  /** The summary of the shift so far, queued now to every active owner; answers the first message. */
  async sendNow(now = new Date()): Promise<MailSummary> {
    const shop = await this.repository.shop();
    const shift = shiftWindow(now, shop.time_zone, shop.shift_start, shop.shift_end);
    const ids = await this.queue(localDate(new Date(shift.startAt), shop.time_zone), false, await this.numbersAt(now));
    if (ids.length === 0) throw conflict('No active owner has an e-mail address to send the summary to. Add one on the People screen.');
    return toMailSummary((await this.repository.find(ids[0]!))!);
  }

  private async checkOnce(now: Date): Promise<number> {
    const shop = await this.repository.shop();
    const ended = endedShift(now, shop.time_zone, shop.shift_start, shop.shift_end);
    if (!ended || (await this.repository.hasShiftSummary(ended.shiftDate))) return 0;
    const workingDay = worksOn(parseWorkingDays(shop.working_days), closedDatesOf(shop))(ended.shiftDate);
    const key = `${ended.shiftDate} ${ended.endAt.toISOString()}`;
    if (!workingDay && this.quietShift === key) return 0;
    // The numbers as they stood a moment before the end, so the ended shift is still the board's shift.
    const board = await this.numbersAt(new Date(ended.endAt.getTime() - 1));
    if (!workingDay && !workRecorded(board)) {
      // Events are stamped when the hub stores them, so none can join a shift that has ended: no need to look again each minute.
      this.quietShift = key;
      return 0;
    }
    return (await this.queue(ended.shiftDate, true, board)).length;
  }

  private async queue(shiftDate: string, final: boolean, board: BoardReply): Promise<number[]> {
    const ids = await this.db.transaction(async (trx) => {
      const repository = new MailRepository(trx);
      // Holding the shop's row lets only one hub process queue an ended shift's summary; the next one finds it queued.
      const shop = await repository.shop({ lock: true });
      if (final && (await repository.hasShiftSummary(shiftDate))) return [];
      const content = shiftSummaryMessage({ shop: await repository.shopIdentity(), timeZone: shop.time_zone, shiftDate, final, board });
      const queued: number[] = [];
      for (const to of await repository.activeAddresses('owner')) {
        queued.push(await this.mail.enqueue(trx, { kind: 'shift_summary', to, related: { shiftDate, final }, ...content }));
      }
      return queued;
    });
    if (ids.length > 0) this.mail.kick();
    return ids;
  }
}
