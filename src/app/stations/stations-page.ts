import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { DatePipe } from '@angular/common';
import { Router } from '@angular/router';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { catchError, map, of, switchMap } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { apiErrorSentence } from '../core/api-error';
import { DevicePairing } from '../auth/device-pairing';
import { Session } from '../auth/session';
import { KIND_DISPLAY } from './station-kinds';
import { StationListItem, StationsApi } from './stations-api';
import { WallDisplays } from './wall-displays';

type StationsState =
  | { status: 'loading' }
  | { status: 'loaded'; stations: StationListItem[] }
  | { status: 'failed'; sentence: string };

/** The shop's stations for an owner or lead, pairing this tablet with one of them, and the wall displays. */
@Component({
  selector: 'dw-stations-page',
  imports: [DatePipe, MatButtonModule, MatIconModule, WallDisplays],
  templateUrl: './stations-page.html',
  styleUrl: './stations-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationsPage {
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  protected readonly pairing = inject(DevicePairing);
  protected readonly kinds = KIND_DISPLAY;

  private readonly api = inject(StationsApi);
  private readonly loads = signal(0);

  protected readonly state = toSignal(
    toObservable(this.loads).pipe(
      switchMap(() =>
        this.api.list().pipe(
          map((stations): StationsState => ({ status: 'loaded', stations })),
          catchError((error: unknown) => of<StationsState>({ status: 'failed', sentence: apiErrorSentence(error) })),
        ),
      ),
    ),
    { initialValue: { status: 'loading' } as StationsState },
  );
  protected readonly stations = computed(() => {
    const state = this.state();
    return state.status === 'loaded' ? state.stations : null;
  });
  protected readonly failure = computed(() => {
    const state = this.state();
    return state.status === 'failed' ? state.sentence : null;
  });
  protected readonly confirmation = signal<string | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly pairingId = signal<number | null>(null);

  protected async pairThisTablet(station: StationListItem): Promise<void> {
    this.problem.set(null);
    this.confirmation.set(null);
    this.pairingId.set(station.id);
    try {
      const paired = await this.pairing.pairThisTablet(station.id);
      this.confirmation.set(
        `This tablet is now the ${paired.name} station. Operators sign in here with their PIN.`,
      );
      this.reload();
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'Pairing did not work. Try again.'));
    } finally {
      this.pairingId.set(null);
    }
  }

  protected async unpairThisTablet(): Promise<void> {
    this.problem.set(null);
    this.confirmation.set(null);
    try {
      await this.pairing.unpairThisTablet();
      this.confirmation.set('This tablet is no longer a station. Its operators have been signed out.');
      this.reload();
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'Unpairing did not work. Try again.'));
    }
  }

  private reload(): void {
    this.loads.update((n) => n + 1);
  }

  protected async handOverToOperators(): Promise<void> {
    await this.session.signOut();
    await this.router.navigateByUrl('/station');
  }
}
