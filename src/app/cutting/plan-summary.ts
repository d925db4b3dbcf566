import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { CutPlanPreview } from '../../shared/cutting/cut-plan-contract';
import { showRollLength, showWidth } from './roll-lengths';

/** The layout at its real proportions with length, yield, the roll to take, the preset and the test-cut advice. */
@Component({
  selector: 'dw-plan-summary',
  imports: [MatIconModule],
  templateUrl: './plan-summary.html',
  styleUrl: './plan-summary.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanSummary {
  readonly preview = input.required<CutPlanPreview>();

  // A data: URL keeps the hub's SVG an image: nothing in it can run or reach the page.
  protected readonly imageUrl = computed(() => `data:image/svg+xml;charset=utf-8,${encodeURIComponent(this.preview().layout.previewSvg)}`);
  protected readonly length = computed(() => showRollLength(this.preview().layout.lengthUsedMm, this.preview().units));
  protected readonly yieldPercent = computed(() => Math.round(this.preview().layout.yield * 100));
  protected readonly perLength = computed(() => {
    const { layout, units } = this.preview();
    return units === 'imperial' ? `${layout.piecesPerYard.toFixed(1)} pieces per yard` : `${layout.piecesPerMetre.toFixed(1)} pieces per metre`;
  });
  protected readonly rollWidth = computed(() => showWidth(this.preview().settings.rollWidthMm, this.preview().units));
  protected readonly rollLeft = computed(() => {
    const roll = this.preview().roll;
    return roll ? showRollLength(roll.remainingMm, this.preview().units) : null;
  });
  protected readonly cutMinutes = computed(() => Math.max(1, Math.round(this.preview().estimate.cutTimeS / 60)));
  protected readonly pieces = computed(() => this.preview().layout.placements.length);
}
