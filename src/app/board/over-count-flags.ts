import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { BoardFlag } from '../../shared/board-contract';
import { clock } from './board-format';

/** Over-counts the hub accepted from stations (two tablets on one bag while offline), for the lead to check. */
@Component({
  selector: 'dw-over-count-flags',
  imports: [MatIconModule],
  templateUrl: './over-count-flags.html',
  styleUrl: './board-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OverCountFlags {
  readonly flags = input.required<readonly BoardFlag[]>();

  protected readonly clock = clock;
}
