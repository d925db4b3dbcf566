import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { Router, RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { apiErrorSentence } from '../core/api-error';
import { DevicePairing } from './device-pairing';
import { Session } from './session';

/** E-mail and password sign-in for owners and leads, with the way to the PIN pad on a station. */
@Component({
  selector: 'dw-sign-in',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './sign-in.html',
  styleUrl: './sign-in.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  protected readonly pairing = inject(DevicePairing);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    password: ['', Validators.required],
  });
  protected readonly problem = signal<string | null>(null);
  protected readonly busy = signal(false);

  protected async signIn(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.problem.set(null);
    this.busy.set(true);
    const { email, password } = this.form.getRawValue();
    try {
      await this.session.signIn(email.trim(), password);
      await this.router.navigateByUrl('/');
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'Signing in did not work. Try again.'));
    } finally {
      this.busy.set(false);
    }
  }
}
