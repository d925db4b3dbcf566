import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { clock } from './board-format';
import { BoardConnection } from './board-connection';
import { BoardLive } from './board-live';
import { BoardView } from './board-view';

/** The lead's Floor board: the live board, its connection, links to orders and the Roll rack. */
@Component({
  selector: 'dw-floor-board',
  imports: [MatIconModule, BoardConnection, BoardView],
  providers: [BoardLive],
  templateUrl: './floor-board.html',
  styleUrl: './floor-board.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FloorBoard {
  protected readonly live = inject(BoardLive);
  protected readonly clock = clock;

  constructor() {
    this.live.start();
  }
}
