import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { of, switchMap } from 'rxjs';
import { Session } from '../auth/session';
import type { StationTicket } from '../../shared/events-contract';
import { STATION_KINDS, type StationKind } from '../../shared/names';
import { BagScan } from '../scan/bag-scan';
import { StationEvents } from '../sync/station-events';
import { TicketCache } from '../sync/ticket-cache';
import { KIND_DISPLAY } from '../stations/station-kinds';
import { SpoilReasons } from './spoil-reasons';

/** Longest note kept with a spoil. */
const NOTE_MAX = 500;

/** Spoil report: how many pieces, at which stage, why, an optional note and photo; works offline. */
@Component({
  selector: 'dw-spoil-report',
  imports: [BagScan, FormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './spoil-report.html',
  styleUrl: './spoil-report.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpoilReport {
  private readonly cache = inject(TicketCache);
  private readonly events = inject(StationEvents);
  private readonly reasonList = inject(SpoilReasons);
  private readonly session = inject(Session);
  private previewUrl: string | null = null;

  /** The bag from the address (`/spoil?bag=12`), when opened from another screen. */
  readonly bag = input<string>();

  protected readonly bagId = linkedSignal<number | null>(() => {
    const id = Number(this.bag());
    return Number.isInteger(id) && id > 0 ? id : null;
  });
  protected readonly ticket = toSignal(toObservable(this.bagId).pipe(switchMap((id) => (id ? this.cache.ticket(id) : of(undefined)))));
  protected readonly reasons = this.reasonList.reasons;
  protected readonly stages = STATION_KINDS.map((kind) => ({ kind, label: KIND_DISPLAY[kind].label }));

  protected readonly quantity = signal(0);
  protected readonly stage = signal<StationKind>(this.session.station()?.kind ?? 'weed');
  protected readonly reasonId = signal<number | null>(null);
  protected readonly note = signal('');
  protected readonly photo = signal<Blob | null>(null);
  protected readonly photoPreview = signal<string | null>(null);
  protected readonly saving = signal(false);
  protected readonly confirmation = signal<string | null>(null);
  protected readonly problem = signal<string | null>(null);

  protected readonly maxQuantity = computed(() => this.ticket()?.bag.pieces ?? 999);
  protected readonly noteTooLong = computed(() => this.note().length > NOTE_MAX);
  protected readonly canSave = computed(
    () => !!this.ticket() && this.quantity() > 0 && this.reasonId() !== null && !this.noteTooLong() && !this.saving(),
  );
  protected readonly noteMax = NOTE_MAX;

  constructor() {
    void this.reasonList.load();
    inject(DestroyRef).onDestroy(() => this.dropPreview());
  }

  protected bagScanned(result: StationTicket | string): void {
    if (typeof result === 'string') return;
    this.bagId.set(result.bag.id);
    this.confirmation.set(null);
  }

  protected step(by: number): void {
    this.quantity.update((q) => Math.min(this.maxQuantity(), Math.max(0, q + by)));
    this.confirmation.set(null);
  }

  protected chooseReason(id: number): void {
    this.reasonId.set(id);
    this.confirmation.set(null);
  }

  protected photoChosen(input: HTMLInputElement): void {
    const file = input.files?.[0] ?? null;
    input.value = '';
    if (!file) return;
    if (!file.type.startsWith('image/')) {
      this.problem.set('That file is not a photo. Take a photo with the tablet camera.');
      return;
    }
    this.problem.set(null);
    this.dropPreview();
    this.photo.set(file);
    this.previewUrl = URL.createObjectURL(file);
    this.photoPreview.set(this.previewUrl);
  }

  protected removePhoto(): void {
    this.dropPreview();
    this.photo.set(null);
  }

  /** Records the spoil (outbox and the bag's remake count together), then keeps the photo for upload. */
  protected async save(): Promise<void> {
    const ticket = this.ticket();
    const reasonId = this.reasonId();
    if (!ticket || reasonId === null || !this.canSave()) return;
    const quantity = this.quantity();
    const photo = this.photo();
    const reason = this.reasons().find((r) => r.id === reasonId)?.label ?? 'the chosen reason';
    this.saving.set(true);
    this.problem.set(null);
    try {
      await this.events.record('spoil', ticket.bag.id, quantity, {
        stage: this.stage(),
        reasonId,
        note: this.note().trim(),
        hasPhoto: photo !== null,
      }, photo ? { photo } : {});
      const owed = ticket.bag.remakeCount + quantity;
      this.confirmation.set(
        `Spoil logged: ${pieces(quantity)}, ${reason.charAt(0).toLowerCase()}${reason.slice(1)}. The bag owes ${owed} ${owed === 1 ? 'remake' : 'remakes'}.`,
      );
      this.quantity.set(0);
      this.reasonId.set(null);
      this.note.set('');
      this.removePhoto();
    } catch (error) {
      this.problem.set(error instanceof Error ? error.message : 'The spoil was not saved. Try again.');
    } finally {
      this.saving.set(false);
    }
  }

  private dropPreview(): void {
    if (this.previewUrl) URL.revokeObjectURL(this.previewUrl);
    this.previewUrl = null;
    this.photoPreview.set(null);
  }
}

function pieces(n: number): string {
  return `${n} ${n === 1 ? 'piece' : 'pieces'}`;
}
