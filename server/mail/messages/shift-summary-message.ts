import type { BoardReply } from '../../../src/shared/board-contract';
import type { MailContent, ShopIdentity } from './mail-content';
import { dataTable, heading, mailPage, paragraph } from './mail-html';
import { shopDay, shopTime } from './shop-time';

/** What the owner's shift summary reports on. */
export interface ShiftSummaryFacts {
  shop: ShopIdentity;
  timeZone: string;
  /** The shop calendar day the shift started on (YYYY-MM-DD). */
  shiftDate: string;
  /** True once the shift has ended; false for "the shift so far". */
  final: boolean;
  board: BoardReply;
}

/** How many spoil reasons the summary names. */
export const TOP_REASONS = 3;

const percent = (fraction: number | null) => (fraction === null ? 'nothing attempted yet' : `${(fraction * 100).toFixed(1)} %`);
const pieces = (n: number) => `${n} ${n === 1 ? 'piece' : 'pieces'}`;
const rate = (perHour: number | null) => (perHour === null ? '–' : perHour.toFixed(1));

/** The owner's end-of-shift (or shift-so-far) summary: pieces per station, spoils, first-pass yield, orders at risk. */
export function shiftSummaryMessage(facts: ShiftSummaryFacts): MailContent {
  const { board, shop, timeZone } = facts;
  const day = shopDay(facts.shiftDate);
  const subject = facts.final ? `End-of-shift summary for ${day}` : `Shift so far, ${day} (at ${shopTime(board.generatedAt, timeZone)})`;
  const span = `Shift ${shopTime(board.shift.startAt, timeZone)} to ${shopTime(board.shift.endAt, timeZone)}.`;
  const totalPieces = board.stations.filter((s) => s.kind === 'pack').reduce((sum, s) => sum + s.shiftPieces, 0);
  const stationRows = board.stations.map((s) => [s.name, s.kind, String(s.shiftPieces), rate(s.shiftPiecesPerHour)]);
  const spoiled = board.spoilReasons.reduce((sum, r) => sum + r.pieces, 0);
  const reasons = board.spoilReasons.slice(0, TOP_REASONS).map((r) => [r.reason, String(r.pieces), percent(r.share)]);
  const atRisk = board.orders.filter((o) => o.atRisk);
  const riskRows = atRisk.map((o) => [o.code, o.customerName, shopTime(o.dueAt, timeZone), o.etaAt ? shopTime(o.etaAt, timeZone) : 'no estimate', String(o.remainingPieces)]);

  const packedLine = `${pieces(totalPieces)} packed this shift.`;
  const spoilLine = spoiled > 0 ? `${pieces(spoiled)} spoiled; spoil rate ${percent(board.spoilRate)}.` : 'No spoils reported this shift.';
  const yieldLine = `First-pass yield: ${percent(board.firstPassYield)}.`;
  const riskLine = atRisk.length > 0 ? `${atRisk.length} open order(s) at risk of missing their due time:` : 'No open order is at risk of missing its due time.';

  const text = [
    subject,
    span,
    '',
    packedLine,
    '',
    'Pieces per station (this shift, per hour):',
    ...(stationRows.length > 0 ? stationRows.map(([name, kind, n, ph]) => `- ${name} (${kind}): ${pieces(Number(n))}, ${ph} per hour`) : ['- No station reported work.']),
    '',
    spoilLine,
    ...reasons.map(([reason, n, share]) => `- ${reason}: ${pieces(Number(n))} (${share})`),
    yieldLine,
    '',
    riskLine,
    ...riskRows.map(([code, customer, due, eta, left]) => `- ${code} for ${customer}: due ${due}, expected ${eta}, ${pieces(Number(left))} to go`),
    '',
    `Dwell at ${shop.name}`,
  ].join('\n');

  const html = mailPage(
    shop.name,
    subject,
    [
      paragraph(span),
      paragraph(packedLine),
      heading('Pieces per station'),
      stationRows.length > 0 ? dataTable(['Station', 'Work', 'Pieces', 'Per hour'], stationRows, [2, 3]) : paragraph('No station reported work.'),
      heading('Spoils'),
      paragraph(spoilLine),
      ...(reasons.length > 0 ? [dataTable(['Reason', 'Pieces', 'Share'], reasons, [1, 2])] : []),
      paragraph(yieldLine),
      heading('Orders at risk'),
      paragraph(riskLine),
      ...(riskRows.length > 0 ? [dataTable(['Order', 'Customer', 'Due', 'Expected', 'Pieces to go'], riskRows, [4])] : []),
    ],
    `Sent by Dwell at ${shop.name} to the owner.`,
  );
  return { subject, text, html };
}
