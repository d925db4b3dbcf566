import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { TestCutRung } from '../../shared/cutting/test-cut';

/** The test-cut ladder: three big tiles (a step lighter, the preset, a step heavier); tap the one that cut and weeded clean. */
@Component({
  selector: 'dw-test-cut-ladder',
  imports: [MatButtonModule],
  templateUrl: './test-cut-ladder.html',
  styleUrl: './test-cut-ladder.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TestCutLadder {
  /** The three forces in grams, lightest first. */
  readonly forces = input.required<readonly number[]>();
  readonly presetG = input.required<number>();
  readonly disabled = input(false);
  /** The rungs as tried: every force lighter than the tapped one did not come clean; the tapped one did. */
  readonly recorded = output<TestCutRung[]>();

  protected readonly captions = ['One step lighter', 'Preset', 'One step heavier'];

  /** The operator tapped the lightest force that cut and weeded clean. */
  protected cleanTapped(forceG: number): void {
    const rungs = this.forces()
      .filter((f) => f <= forceG)
      .map((f) => ({ forceG: f, cutClean: f === forceG, weededClean: f === forceG }));
    this.recorded.emit(rungs);
  }

  /** None of the three came clean. */
  protected noneTapped(): void {
    this.recorded.emit(this.forces().map((f) => ({ forceG: f, cutClean: false, weededClean: false })));
  }
}
