import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { Session } from '../auth/session';
import { navEntriesFor } from '../shell/nav-entries';
import { STATION_CAUTIONS } from './station-cautions';
import { KIND_DISPLAY } from './station-kinds';

/** Where an operator lands after the PIN: this station, who is working it, and big buttons to its screens. */
@Component({
  selector: 'dw-station-home',
  imports: [RouterLink, MatButtonModule, MatIconModule],
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

  /** The same screens the top bar offers here, this kind's own first (its main screen leads), the shared ones after. */
  protected readonly screens = computed(() => {
    const kind = this.station()?.kind ?? null;
    const entries = navEntriesFor(this.session.role(), kind);
    const ownFirst = (entry: (typeof entries)[number]) => (entry.stationKinds?.length === 1 ? 0 : 1);
    return [...entries].sort((a, b) => ownFirst(a) - ownFirst(b));
  });

  protected readonly cautions = computed(() => {
    const kind = this.station()?.kind;
    return kind ? STATION_CAUTIONS[kind] : [];
  });
}
