import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { MatIconModule } from '@angular/material/icon';
import type { BoardLowRoll } from '../../shared/board-contract';
import { inchesToMm } from '../../shared/cutting/length-units';
import { showRollLength } from '../cutting/roll-lengths';

/** Rolls below their reorder length, with what is left and where they sit on the rack. */
@Component({
  selector: 'dw-low-rolls',
  imports: [RouterLink, MatIconModule],
  templateUrl: './low-rolls.html',
  styleUrl: './board-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LowRolls {
  readonly rolls = input.required<readonly BoardLowRoll[]>();
  /** Whether the list links to the Roll rack (the lead's screen). */
  readonly links = input(false);

  protected length(inches: number): string {
    return showRollLength(inchesToMm(inches)).main;
  }
}
