import { ChangeDetectionStrategy, Component, DOCUMENT, computed, inject, signal } from '@angular/core';
import { DatePipe } from '@angular/common';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { Clipboard } from '@angular/cdk/clipboard';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { catchError, firstValueFrom, map, of, switchMap } from 'rxjs';
import { apiErrorSentence } from '../core/api-error';
import { BagQr } from '../orders/bag-qr';
import { DisplaysApi, type WallDisplayItem } from './displays-api';

type ListState = { status: 'loading' } | { status: 'loaded'; displays: WallDisplayItem[] } | { status: 'failed'; sentence: string };

const NAME_NEEDED = 'Give the display a name, e.g. "Wall by the presses".';

/** Wall displays on the Stations page: add one and show its link once (with a QR code), or revoke one. */
@Component({
  selector: 'dw-wall-displays',
  imports: [DatePipe, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, BagQr],
  templateUrl: './wall-displays.html',
  styleUrl: './wall-displays.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WallDisplays {
  private readonly api = inject(DisplaysApi);
  private readonly clipboard = inject(Clipboard);
  private readonly origin = inject(DOCUMENT).location.origin;
  private readonly loads = signal(0);

  protected readonly state = toSignal(
    toObservable(this.loads).pipe(
      switchMap(() =>
        this.api.list().pipe(
          map((displays): ListState => ({ status: 'loaded', displays })),
          catchError((error: unknown) => of<ListState>({ status: 'failed', sentence: apiErrorSentence(error) })),
        ),
      ),
    ),
    { initialValue: { status: 'loading' } as ListState },
  );
  protected readonly displays = computed(() => {
    const state = this.state();
    return state.status === 'loaded' ? state.displays : [];
  });

  protected readonly addForm = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(80)] }),
  });
  protected readonly nameProblem = signal<string | null>(null);
  protected readonly busy = signal(false);
  /** The link of the display just added: shown this once, never fetched again. */
  protected readonly newLink = signal<{ name: string; link: string } | null>(null);
  protected readonly copied = signal(false);
  protected readonly confirmingRevoke = signal<number | null>(null);
  protected readonly confirmation = signal<string | null>(null);
  protected readonly problem = signal<string | null>(null);

  protected async addDisplay(): Promise<void> {
    const name = this.addForm.controls.name.value.trim();
    if (!name) {
      this.nameProblem.set(NAME_NEEDED);
      return;
    }
    if (name.length > 80) {
      this.nameProblem.set('Keep the name to 80 characters or fewer.');
      return;
    }
    this.nameProblem.set(null);
    this.confirmation.set(null);
    this.problem.set(null);
    this.busy.set(true);
    try {
      const added = await firstValueFrom(this.api.add(name));
      this.newLink.set({ name: added.name, link: `${this.origin}/display#token=${encodeURIComponent(added.deviceToken)}` });
      this.copied.set(false);
      this.addForm.reset({ name: '' });
      this.reload();
    } catch (error) {
      this.nameProblem.set(apiErrorSentence(error, 'The display could not be added. Try again.'));
    } finally {
      this.busy.set(false);
    }
  }

  protected copyLink(link: string): void {
    this.copied.set(this.clipboard.copy(link));
    if (!this.copied()) this.problem.set('This browser did not copy the link. Select it and copy it by hand, or scan the QR code.');
  }

  protected closeNewLink(): void {
    this.newLink.set(null);
    this.copied.set(false);
  }

  protected async revoke(display: WallDisplayItem): Promise<void> {
    this.problem.set(null);
    this.confirmation.set(null);
    this.busy.set(true);
    try {
      await firstValueFrom(this.api.revoke(display.id));
      this.confirmation.set(`${display.name} no longer shows the floor board. Its link does not work any more.`);
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The display could not be revoked. Try again.'));
    } finally {
      this.busy.set(false);
      this.confirmingRevoke.set(null);
      this.reload();
    }
  }

  private reload(): void {
    this.loads.update((n) => n + 1);
  }
}
