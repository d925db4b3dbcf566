import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { RollMovement, RollView } from '../../shared/cutting/cut-plan-contract';
import type { FilmOption } from '../../shared/intake-contract';
import { Session } from '../auth/session';
import { apiErrorSentence } from '../core/api-error';
import { showRollLength, showWidth } from '../cutting/roll-lengths';
import { RollsApi } from './rolls-api';

/** Roll rack: every roll with what is left, low flags, adding a roll, measuring one, and its history. */
@Component({
  selector: 'dw-roll-rack',
  imports: [FormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule],
  templateUrl: './roll-rack.html',
  styleUrl: './roll-rack.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RollRack {
  private readonly api = inject(RollsApi);
  private readonly session = inject(Session);

  protected readonly rolls = signal<RollView[]>([]);
  protected readonly films = signal<FilmOption[]>([]);
  protected readonly chosen = signal<RollView | null>(null);
  protected readonly history = signal<RollMovement[]>([]);
  protected readonly problem = signal<string | null>(null);
  protected readonly formProblem = signal<string | null>(null);
  protected readonly measureProblem = signal<string | null>(null);
  protected readonly adding = signal(false);
  protected readonly mayAdd = computed(() => this.session.role() === 'owner' || this.session.role() === 'lead');

  protected readonly newRoll = { filmId: 0, label: '', widthMm: 381, lengthMm: 22860, remainingMm: null as number | null, reorderMm: 2743, rackSlot: '' };
  protected readonly measure = { remainingMm: null as number | null, note: '' };

  protected readonly showLength = showRollLength;
  protected readonly showWidth = showWidth;

  constructor() {
    void this.load();
  }

  /** Loads the rack and the films. */
  async load(): Promise<void> {
    try {
      const [rolls, films] = await Promise.all([firstValueFrom(this.api.rolls()), firstValueFrom(this.api.films())]);
      this.rolls.set(rolls);
      this.films.set(films);
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The roll rack could not be loaded. Try again.'));
    }
  }

  protected percentLeft(roll: RollView): number {
    return roll.lengthMm > 0 ? Math.min(100, Math.round((roll.remainingMm / roll.lengthMm) * 100)) : 0;
  }

  /** Opens a roll's measure form and history. */
  protected async rollChosen(roll: RollView): Promise<void> {
    this.chosen.set(roll);
    this.measure.remainingMm = roll.remainingMm;
    this.measure.note = '';
    this.measureProblem.set(null);
    try {
      this.history.set(await firstValueFrom(this.api.movements(roll.id)));
    } catch (error) {
      this.measureProblem.set(apiErrorSentence(error, 'The history could not be loaded.'));
    }
  }

  /** Saves a physical measure. */
  protected async measureSaved(): Promise<void> {
    const roll = this.chosen();
    if (!roll || this.measure.remainingMm === null) {
      this.measureProblem.set('Type what is left on the roll, in millimetres.');
      return;
    }
    try {
      const updated = await firstValueFrom(this.api.measure(roll.id, Number(this.measure.remainingMm), this.measure.note));
      this.rolls.update((list) => list.map((r) => (r.id === updated.id ? updated : r)));
      await this.rollChosen(updated);
    } catch (error) {
      this.measureProblem.set(apiErrorSentence(error, 'The measure could not be saved. Try again.'));
    }
  }

  /** Puts a new roll on the rack. */
  protected async rollAdded(): Promise<void> {
    this.formProblem.set(null);
    const r = this.newRoll;
    if (!r.filmId) {
      this.formProblem.set('Choose the film on the roll.');
      return;
    }
    try {
      const made = await firstValueFrom(
        this.api.create({
          filmId: r.filmId,
          label: r.label,
          widthMm: Number(r.widthMm),
          lengthMm: Number(r.lengthMm),
          remainingMm: r.remainingMm === null || (r.remainingMm as unknown) === '' ? undefined : Number(r.remainingMm),
          reorderMm: Number(r.reorderMm),
          rackSlot: r.rackSlot,
        }),
      );
      this.rolls.update((list) => [...list, made]);
      this.adding.set(false);
      r.label = '';
      r.rackSlot = '';
    } catch (error) {
      this.formProblem.set(apiErrorSentence(error, 'The roll could not be added. Try again.'));
    }
  }
}
