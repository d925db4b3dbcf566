import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { Session } from '../auth/session';
import { AppUpdates } from '../core/app-updates';
import { DevicePairing } from '../auth/device-pairing';
import { SyncTray } from '../sync/sync-tray';
import { navEntriesFor } from './nav-entries';

const ROLE_LABELS = { owner: 'Owner', lead: 'Lead', operator: 'Operator', display: 'Display' } as const;

/** The frame around every signed-in screen: wordmark, navigation for the role, who is signed in. */
@Component({
  selector: 'dw-shell',
  imports: [NgTemplateOutlet, RouterOutlet, RouterLink, RouterLinkActive, MatButtonModule, MatIconModule, SyncTray],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  private readonly pairing = inject(DevicePairing);

  protected readonly user = this.session.user;
  protected readonly entries = computed(() => navEntriesFor(this.session.role(), this.session.station()?.kind ?? null));
  /** The sync tray shows on station tablets: for the operator, and for a lead who signs in there. */
  protected readonly stationTablet = computed(() => this.session.role() === 'operator' || (this.session.role() !== null && this.pairing.paired()));
  private readonly updates = inject(AppUpdates);
  protected readonly updateReady = this.updates.updateReady;
  // A station tablet has at most three screens, which fit beside the name; office roles have more.
  protected readonly oneRow = computed(() => this.entries().length <= 3);
  protected readonly roleLabel = computed(() => {
    const role = this.session.role();
    return role ? ROLE_LABELS[role] : '';
  });
  protected readonly signingOut = signal(false);

  protected useNewVersion(): void {
    this.updates.useNewVersion();
  }

  protected async signOut(): Promise<void> {
    const operatorAtStation = this.session.role() === 'operator';
    this.signingOut.set(true);
    try {
      await this.session.signOut();
    } finally {
      this.signingOut.set(false);
      // An operator hands the tablet to the next person: back to the PIN pad, not the e-mail form.
      await this.router.navigateByUrl(operatorAtStation ? '/station' : '/sign-in');
    }
  }
}
