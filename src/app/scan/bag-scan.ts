import { ChangeDetectionStrategy, Component, ElementRef, inject, output, signal, viewChild } from '@angular/core';
import { DOCUMENT } from '@angular/common';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { apiErrorSentence, hasStatus } from '../core/api-error';
import type { StationTicket } from '../../shared/events-contract';
import { TicketCache } from '../sync/ticket-cache';
import { BagCamera } from './bag-camera';
import { KeystrokeBurst, parseBagInput } from './bag-input';

/** Bag scan: finds a bag by camera, USB scanner or typed code; emits the ticket, or a sentence when it cannot. */
@Component({
  selector: 'dw-bag-scan',
  imports: [FormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, BagCamera],
  templateUrl: './bag-scan.html',
  styleUrl: './bag-scan.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(document:keydown)': 'keyPressed($event)' },
})
export class BagScan {
  private readonly cache = inject(TicketCache);
  private readonly document = inject(DOCUMENT);
  private readonly burst = new KeystrokeBurst();
  private readonly field = viewChild<ElementRef<HTMLInputElement>>('codeField');

  /** The bag found, or the sentence saying why none was. */
  readonly scanned = output<StationTicket | string>();

  protected readonly typed = signal('');
  protected readonly problem = signal<string | null>(null);
  protected readonly looking = signal(false);
  protected readonly cameraOn = signal(false);

  protected keyPressed(event: KeyboardEvent): void {
    if (event.target === this.field()?.nativeElement) return;
    const text = this.burst.key(event.key, event.timeStamp);
    if (text !== null) {
      event.preventDefault();
      void this.find(text);
    }
  }

  protected typedCodeSubmitted(): void {
    void this.find(this.typed());
  }

  protected toggleCamera(): void {
    this.cameraOn.update((on) => !on);
  }

  /** Resolves a scanned or typed text to a bag and emits it, or shows and emits the sentence. */
  async find(text: string): Promise<void> {
    const reference = parseBagInput(text, this.document.location?.origin);
    if (reference && 'refused' in reference) return this.fail(reference.refused);
    if (!reference) {
      return this.fail(text.trim()
        ? `"${text.trim().slice(0, 40)}" is not a bag code or a bag label. A bag code looks like 1043-B.`
        : 'Type the bag code from the label, for example 1043-B.');
    }
    this.looking.set(true);
    this.problem.set(null);
    try {
      const ticket = 'token' in reference ? await this.cache.findByToken(reference.token) : await this.cache.findByCode(reference.code);
      if (!ticket) {
        return this.fail('code' in reference
          ? `No open bag ${reference.code} for this station. Check the code on the label.`
          : 'This label is not one of this shop\'s open bags. Check it is a Dwell bag label from this shop.');
      }
      this.typed.set('');
      this.scanned.emit(ticket);
    } catch (error) {
      this.fail(hasStatus(error, 0, 504)
        ? 'This bag is not on this tablet yet and the hub cannot be reached. Scan it again when the Wi-Fi is back.'
        : apiErrorSentence(error, 'The bag could not be looked up. Try again.'));
    } finally {
      this.looking.set(false);
    }
  }

  private fail(sentence: string): void {
    this.problem.set(sentence);
    this.scanned.emit(sentence);
  }
}
