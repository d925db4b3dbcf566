import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { BoardReply } from '../../shared/board-contract';
import type { BoardMode } from './board-charts';
import { FloorTiles } from './floor-tiles';
import { LowRolls } from './low-rolls';
import { OrdersAtRisk } from './orders-at-risk';
import { OverCountFlags } from './over-count-flags';
import { SpoilParetoChart } from './spoil-pareto-chart';
import { StageColumns } from './stage-columns';
import { StationRatesChart } from './station-rates-chart';
import { StationStatus } from './station-status';

/** Which part of the board to show: all of it, or one of the two halves a wall display turns between. */
export type BoardPart = 'all' | 'now' | 'trends';

/** Rows of the order table a wall display shows before "and N more" (seen to fit beside six station rows at 1280 x 800). */
const WALL_ORDER_ROWS = 6;

/** The floor board itself: stations, stages, orders, charts, quality tiles, low film and flags. */
@Component({
  selector: 'dw-board-view',
  imports: [FloorTiles, LowRolls, OrdersAtRisk, OverCountFlags, SpoilParetoChart, StageColumns, StationRatesChart, StationStatus],
  templateUrl: './board-view.html',
  styleUrl: './board-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class.wall]': 'mode() === "wall"' },
})
export class BoardView {
  readonly board = input.required<BoardReply>();
  readonly mode = input<BoardMode>('lead');
  readonly part = input<BoardPart>('all');

  protected readonly now = computed(() => new Date(this.board().generatedAt));
  protected readonly showsNow = computed(() => this.part() !== 'trends');
  protected readonly showsTrends = computed(() => this.part() !== 'now');
  protected readonly lead = computed(() => this.mode() === 'lead');
  protected readonly orderRows = computed(() => (this.lead() ? null : WALL_ORDER_ROWS));
}
