import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatToolbarModule } from '@angular/material/toolbar';
import { Session } from '../auth/session';
import { navEntriesFor } from './nav-entries';

const ROLE_LABELS = { owner: 'Owner', lead: 'Lead', operator: 'Operator', display: 'Display' } as const;

/** The frame around every signed-in screen: wordmark, navigation for the role, who is signed in. */
@Component({
  selector: 'dw-shell',
  imports: [RouterOutlet, RouterLink, RouterLinkActive, MatButtonModule, MatIconModule, MatToolbarModule],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly session = inject(Session);
  private readonly router = inject(Router);

  protected readonly user = this.session.user;
  protected readonly entries = computed(() => navEntriesFor(this.session.role()));
  protected readonly roleLabel = computed(() => {
    const role = this.session.role();
    return role ? ROLE_LABELS[role] : '';
  });
  protected readonly signingOut = signal(false);

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
