import { ChangeDetectionStrategy, Component, OnInit, computed, inject, signal } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { apiErrorSentence, hasStatus } from '../core/api-error';
import { KIND_DISPLAY } from '../stations/station-kinds';
import { DevicePairing } from './device-pairing';
import type { DeviceReply } from '../../shared/auth-contract';
import { Session, SessionStation } from './session';

/** An operator who may sign in at this station. */
export type StationOperator = DeviceReply['operators'][number];

/** Shortest and longest PIN the hub accepts. */
export const PIN_MIN = 4;
export const PIN_MAX = 6;

type Phase = 'loading' | 'never-paired' | 'unpaired' | 'unreachable' | 'ready';

/** The station tablet's sign-in: tap your name, then type your PIN on large keys. */
@Component({
  selector: 'dw-pin-pad',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  templateUrl: './pin-pad.html',
  styleUrl: './pin-pad.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(document:keydown)': 'typeKey($event)' },
})
export class PinPad implements OnInit {
  private readonly http = inject(HttpClient);
  private readonly session = inject(Session);
  private readonly pairing = inject(DevicePairing);
  private readonly router = inject(Router);

  protected readonly digits = ['1', '2', '3', '4', '5', '6', '7', '8', '9'] as const;
  protected readonly phase = signal<Phase>('loading');
  protected readonly station = signal<SessionStation | null>(null);
  protected readonly operators = signal<StationOperator[]>([]);
  protected readonly operator = signal<StationOperator | null>(null);
  protected readonly pin = signal('');
  protected readonly problem = signal<string | null>(null);
  protected readonly busy = signal(false);

  protected readonly kind = computed(() => {
    const station = this.station();
    return station ? KIND_DISPLAY[station.kind] : null;
  });
  protected readonly dots = computed(() =>
    Array.from({ length: PIN_MAX }, (_, index) => index < this.pin().length),
  );
  protected readonly canEnter = computed(
    () => this.pin().length >= PIN_MIN && this.operator() !== null && !this.busy(),
  );

  ngOnInit(): void {
    void this.loadStation();
  }

  protected async loadStation(): Promise<void> {
    const deviceToken = this.pairing.deviceToken();
    if (!deviceToken) {
      this.phase.set('never-paired');
      return;
    }
    this.phase.set('loading');
    try {
      const response = await firstValueFrom(
        this.http.post<DeviceReply>('/api/auth/device', { deviceToken }),
      );
      this.station.set(response.station);
      this.operators.set(response.operators);
      this.phase.set('ready');
    } catch (error) {
      if (hasStatus(error, 401, 404)) {
        // The hub no longer knows this token: keeping it would only lead back here.
        this.pairing.forget();
        this.phase.set('unpaired');
      } else {
        this.problem.set(apiErrorSentence(error));
        this.phase.set('unreachable');
      }
    }
  }

  protected chooseOperator(operator: StationOperator): void {
    this.operator.set(operator);
    this.pin.set('');
    this.problem.set(null);
  }

  protected chooseSomeoneElse(): void {
    this.operator.set(null);
    this.pin.set('');
    this.problem.set(null);
  }

  protected pressDigit(digit: string): void {
    if (this.busy() || this.pin().length >= PIN_MAX) {
      return;
    }
    this.pin.update((pin) => pin + digit);
  }

  protected eraseDigit(): void {
    this.pin.update((pin) => pin.slice(0, -1));
  }

  protected clearPin(): void {
    this.pin.set('');
  }

  protected typeKey(event: KeyboardEvent): void {
    if (this.phase() !== 'ready' || this.operator() === null) {
      return;
    }
    if (/^[0-9]$/.test(event.key)) {
      this.pressDigit(event.key);
    } else if (event.key === 'Backspace') {
      this.eraseDigit();
    } else if (event.key === 'Escape') {
      this.clearPin();
    } else if (event.key === 'Enter') {
      void this.enterPin();
    } else {
      return;
    }
    event.preventDefault();
  }

  protected async enterPin(): Promise<void> {
    const operator = this.operator();
    const deviceToken = this.pairing.deviceToken();
    if (!this.canEnter() || operator === null || deviceToken === null) {
      return;
    }
    this.busy.set(true);
    this.problem.set(null);
    try {
      await this.session.signInWithPin(deviceToken, operator.id, this.pin());
      await this.router.navigateByUrl('/');
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'That PIN did not work. Try again.'));
      this.pin.set('');
    } finally {
      this.busy.set(false);
    }
  }
}
