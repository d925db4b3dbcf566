import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { BoardStation } from '../../shared/board-contract';
import { KIND_DISPLAY } from '../stations/station-kinds';
import { clock, rate } from './board-format';

/** Each station: online or offline (in words and an icon), its rates, its last event and last sync. */
@Component({
  selector: 'dw-station-status',
  imports: [MatIconModule],
  templateUrl: './station-status.html',
  styleUrl: './station-status.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationStatus {
  readonly stations = input.required<readonly BoardStation[]>();

  protected readonly kinds = KIND_DISPLAY;
  protected readonly clock = clock;
  protected readonly rate = rate;
}
