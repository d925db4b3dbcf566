import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { BoardStation } from '../../shared/board-contract';
import { KIND_DISPLAY } from '../stations/station-kinds';
import type { BoardMode } from './board-charts';
import { clock, rate } from './board-format';

/**
 * Each station: online or offline (in words and an icon), its rates, its last event and last sync.
 * Short cards on the lead's screen; one row per station on a wall, where room is scarcer than width.
 */
@Component({
  selector: 'dw-station-status',
  imports: [MatIconModule],
  templateUrl: './station-status.html',
  styleUrl: './station-status.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class.rows]': 'mode() === "wall"' },
})
export class StationStatus {
  readonly stations = input.required<readonly BoardStation[]>();
  readonly mode = input<BoardMode>('lead');

  protected readonly kinds = KIND_DISPLAY;
  protected readonly clock = clock;
  protected readonly rate = rate;
}
