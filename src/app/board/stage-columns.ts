import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { BoardStageLoad } from '../../shared/board-contract';
import { BAG_STAGES, type BagStage } from '../../shared/names';
import { STAGE_LABELS } from './board-format';

/** Bags and pieces sitting in each stage, in floor order, with the tallest column scaled to full height. */
@Component({
  selector: 'dw-stage-columns',
  templateUrl: './stage-columns.html',
  styleUrl: './stage-columns.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StageColumns {
  readonly stages = input.required<Record<BagStage, BoardStageLoad>>();

  protected readonly columns = computed(() => {
    const stages = this.stages();
    const most = Math.max(1, ...BAG_STAGES.map((stage) => stages[stage].pieces));
    return BAG_STAGES.map((stage) => ({
      stage,
      ...STAGE_LABELS[stage],
      ...stages[stage],
      // A sliver stays visible for a stage with pieces in it, however few.
      fill: stages[stage].pieces === 0 ? 0 : Math.max(4, Math.round((stages[stage].pieces / most) * 100)),
    }));
  });
}
