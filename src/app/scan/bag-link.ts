import { ChangeDetectionStrategy, Component, OnInit, inject, input, signal } from '@angular/core';
import { Router, RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { Session } from '../auth/session';
import { apiErrorSentence, hasStatus } from '../core/api-error';
import type { StationKind } from '../../shared/names';
import { TicketCache } from '../sync/ticket-cache';
import { parseBagInput } from './bag-input';

/** The screen each station kind works a bag on. */
const SCREEN_BY_KIND: Record<StationKind, string> = { cut: '/cut-station', weed: '/weed', press: '/press', pack: '/pack' };

/** Opened from a bag label's QR code: finds the bag and sends the person to their screen for it. */
@Component({
  selector: 'dw-bag-link',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  template: `
    @if (problem(); as sentence) {
      <h1>Bag not opened</h1>
      <p class="dw-sentence-error" role="alert" data-testid="bag-link-problem"><mat-icon svgIcon="warning" aria-hidden="true" />{{ sentence }}</p>
      <a mat-flat-button class="dw-primary-action" routerLink="/">Back to my screen</a>
    } @else {
      <p>Opening the bag…</p>
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BagLink implements OnInit {
  private readonly cache = inject(TicketCache);
  private readonly session = inject(Session);
  private readonly router = inject(Router);

  /** The token from the QR code's address. */
  readonly token = input.required<string>();
  protected readonly problem = signal<string | null>(null);

  async ngOnInit(): Promise<void> {
    const reference = parseBagInput(this.token());
    if (!reference || !('token' in reference)) {
      this.problem.set('This address is not a bag label of this shop.');
      return;
    }
    try {
      const ticket = await this.cache.findByToken(reference.token);
      if (!ticket) {
        this.problem.set('This bag is not one of this shop\'s open bags.');
        return;
      }
      const kind = this.session.station()?.kind;
      const target = this.session.role() === 'operator' && kind ? SCREEN_BY_KIND[kind] : `/orders/${ticket.order.id}`;
      await this.router.navigate([target], target.startsWith('/orders') ? {} : { queryParams: { bag: ticket.bag.id } });
    } catch (error) {
      this.problem.set(hasStatus(error, 0, 504)
        ? 'This bag is not on this tablet yet and the hub cannot be reached. Try again when the Wi-Fi is back.'
        : apiErrorSentence(error, 'The bag could not be opened.'));
    }
  }
}
