import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { percent, taktText } from './board-format';

/** The shift's quality and pace in three large numbers: first-pass yield, spoil rate, takt time. */
@Component({
  selector: 'dw-floor-tiles',
  imports: [MatIconModule],
  templateUrl: './floor-tiles.html',
  styleUrl: './floor-tiles.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FloorTiles {
  readonly firstPassYield = input.required<number | null>();
  readonly spoilRate = input.required<number | null>();
  readonly taktS = input.required<number | null>();
  readonly piecesDueToday = input.required<number>();

  protected readonly percent = percent;
  protected readonly taktText = taktText;
}
