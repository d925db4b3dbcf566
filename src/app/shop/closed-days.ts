import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { format, parseISO } from 'date-fns';
import { SHOP_LIMITS, type ClosedDay } from '../../shared/shop-contract';
import { closedDayProblem, sortedClosedDays } from './shop-values';

/** The shop's closed days on Shop settings: the list with a Remove button on each, and a row to add one. */
@Component({
  selector: 'dw-closed-days',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './closed-days.html',
  styleUrl: './closed-days.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClosedDays {
  readonly days = input.required<readonly ClosedDay[]>();
  readonly disabled = input(false);
  /** The page's sentence about the whole list (from its own check or the hub's). */
  readonly problem = input<string | null | undefined>(null);
  /** The new list, in date order, after a day was added or removed. */
  readonly changed = output<ClosedDay[]>();

  protected readonly noteMax = SHOP_LIMITS.closedDayNoteMax;
  protected readonly newDate = signal('');
  protected readonly newNote = signal('');
  protected readonly addProblem = signal<string | null>(null);

  /** "Fri 25 Dec 2026": a closed day as people read it. */
  protected dayText(date: string): string {
    return format(parseISO(date), 'EEE d MMM yyyy');
  }

  protected addDay(): void {
    const problem = closedDayProblem(this.days(), this.newDate(), this.newNote());
    this.addProblem.set(problem);
    if (problem) return;
    this.changed.emit(sortedClosedDays([...this.days(), { date: this.newDate(), note: this.newNote() }]));
    this.newDate.set('');
    this.newNote.set('');
  }

  protected removeDay(date: string): void {
    this.changed.emit(this.days().filter((day) => day.date !== date));
  }
}
