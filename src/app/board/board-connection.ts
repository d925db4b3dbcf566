import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { BoardLink } from './board-live';
import { clock } from './board-format';

/** Says whether the board is live; when the connection is lost, from when the board on screen is. */
@Component({
  selector: 'dw-board-connection',
  imports: [MatIconModule],
  template: `
    <p class="state" [class]="connection()" role="status" data-testid="board-connection">
      <mat-icon [svgIcon]="connection() === 'live' ? 'online' : 'offline'" aria-hidden="true" />
      {{ sentence() }}
    </p>
  `,
  styles: `
    .state {
      display: flex;
      align-items: center;
      gap: 0.4em;
      margin: 0;
      padding: 0.3em 0.8em;
      border-radius: 2em;
      font-weight: 700;
    }
    .mat-icon { width: 1.3em; height: 1.3em; }
    .live { background: var(--dw-board-live-bg, var(--mat-sys-primary-container)); color: var(--dw-board-live-ink, var(--mat-sys-on-primary-container)); }
    .connecting { background: var(--dw-board-card, var(--mat-sys-surface-container)); }
    .lost { background: var(--dw-board-alert-bg, var(--mat-sys-tertiary-container)); color: var(--dw-board-alert-ink, var(--mat-sys-on-tertiary-container)); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardConnection {
  readonly connection = input.required<BoardLink>();
  readonly lastUpdatedAt = input<Date | null>(null);

  protected readonly sentence = computed(() => {
    const updated = this.lastUpdatedAt();
    switch (this.connection()) {
      case 'live':
        return updated ? `Live · updated ${clock(updated.toISOString())}` : 'Live';
      case 'connecting':
        return 'Connecting to the hub…';
      case 'lost':
        return updated
          ? `Connection lost — showing the board from ${clock(updated.toISOString())}. It reconnects by itself.`
          : 'Connection lost. It reconnects by itself.';
    }
  });
}
