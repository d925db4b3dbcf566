import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { Session } from '../auth/session';
import { KIND_DISPLAY } from './station-kinds';

/** Where an operator lands after the PIN: which station this is and who is working it. */
@Component({
  selector: 'dw-station-home',
  imports: [MatIconModule],
  templateUrl: './station-home.html',
  styleUrl: './station-home.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationHome {
  private readonly session = inject(Session);

  protected readonly user = this.session.user;
  protected readonly station = this.session.station;
  protected readonly kind = computed(() => {
    const station = this.station();
    return station ? KIND_DISPLAY[station.kind] : null;
  });
}
