import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { catchError, firstValueFrom, map, of, switchMap } from 'rxjs';
import type { Person, PersonCreate } from '../../shared/people-contract';
import { Session } from '../auth/session';
import { apiErrorSentence } from '../core/api-error';
import { PeopleApi } from './people-api';

type ListState = { status: 'loading' } | { status: 'loaded'; people: Person[] } | { status: 'failed'; sentence: string };

const ROLE_LABELS: Record<Person['role'], string> = { owner: 'Owner', lead: 'Lead', operator: 'Operator' };

/** Who works in the shop: the owner adds people and sets sign-ins; a lead can reset an operator's PIN. */
@Component({
  selector: 'dw-people-page',
  imports: [ReactiveFormsModule, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './people-page.html',
  styleUrl: './people-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PeoplePage {
  private readonly api = inject(PeopleApi);
  private readonly session = inject(Session);
  private readonly loads = signal(0);

  protected readonly roleLabels = ROLE_LABELS;
  protected readonly isOwner = computed(() => this.session.role() === 'owner');
  protected readonly state = toSignal(
    toObservable(this.loads).pipe(
      switchMap(() =>
        this.api.list().pipe(
          map((people): ListState => ({ status: 'loaded', people })),
          catchError((error: unknown) => of<ListState>({ status: 'failed', sentence: apiErrorSentence(error) })),
        ),
      ),
    ),
    { initialValue: { status: 'loading' } as ListState },
  );
  protected readonly people = computed(() => {
    const state = this.state();
    return state.status === 'loaded' ? state.people : [];
  });

  protected readonly adding = signal(false);
  protected readonly addProblem = signal<string | null>(null);
  protected readonly confirmation = signal<string | null>(null);
  protected readonly busy = signal(false);
  /** The person whose PIN or password is being set, and which. */
  protected readonly settingSecretFor = signal<{ person: Person; kind: 'pin' | 'password' } | null>(null);
  protected readonly secretProblem = signal<string | null>(null);

  protected readonly addForm = inject(FormBuilder).nonNullable.group({
    role: ['operator' as Person['role']],
    name: ['', [Validators.required, Validators.maxLength(120)]],
    pin: ['', [Validators.pattern(/^\d{4,6}$/)]],
    email: ['', [Validators.email]],
    password: ['', [Validators.minLength(10)]],
  });
  protected readonly secretForm = inject(FormBuilder).nonNullable.group({ secret: ['', Validators.required] });

  protected readonly addRole = toSignal(this.addForm.controls.role.valueChanges, { initialValue: 'operator' as Person['role'] });

  protected startAdding(): void {
    this.addForm.reset({ role: 'operator', name: '', pin: '', email: '', password: '' });
    this.addProblem.set(null);
    this.adding.set(true);
  }

  protected async addPerson(): Promise<void> {
    const value = this.addForm.getRawValue();
    const request: PersonCreate =
      value.role === 'operator'
        ? { role: 'operator', name: value.name.trim(), pin: value.pin }
        : { role: value.role, name: value.name.trim(), email: value.email.trim(), password: value.password };
    const missing = this.missingFor(request);
    if (missing) {
      this.addProblem.set(missing);
      return;
    }
    await this.run(async () => {
      const person = await firstValueFrom(this.api.create(request));
      this.adding.set(false);
      this.confirmation.set(
        person.role === 'operator'
          ? `${person.name} can now sign in at any station with their PIN.`
          : `${person.name} can now sign in with ${person.email}.`,
      );
    }, this.addProblem);
  }

  protected startSettingSecret(person: Person): void {
    this.secretForm.reset({ secret: '' });
    this.secretProblem.set(null);
    this.settingSecretFor.set({ person, kind: person.role === 'operator' ? 'pin' : 'password' });
  }

  protected async saveSecret(): Promise<void> {
    const target = this.settingSecretFor();
    if (!target) return;
    const secret = this.secretForm.getRawValue().secret;
    if (target.kind === 'pin' && !/^\d{4,6}$/.test(secret)) {
      this.secretProblem.set('A PIN is 4 to 6 digits.');
      return;
    }
    if (target.kind === 'password' && secret.length < 10) {
      this.secretProblem.set('A password needs at least 10 characters.');
      return;
    }
    await this.run(async () => {
      const call = target.kind === 'pin' ? this.api.setPin(target.person.id, secret) : this.api.setPassword(target.person.id, secret);
      await firstValueFrom(call);
      this.settingSecretFor.set(null);
      this.confirmation.set(`New ${target.kind === 'pin' ? 'PIN' : 'password'} saved for ${target.person.name}. Their old sessions have ended.`);
    }, this.secretProblem);
  }

  protected async toggleActive(person: Person): Promise<void> {
    await this.run(async () => {
      const changed = await firstValueFrom(this.api.update(person.id, { active: !person.active }));
      this.confirmation.set(changed.active ? `${changed.name} can sign in again.` : `${changed.name} can no longer sign in.`);
    }, this.addProblem);
  }

  private missingFor(request: PersonCreate): string | null {
    if (!request.name) return 'Enter the person\'s name.';
    if (request.role === 'operator') return /^\d{4,6}$/.test(request.pin) ? null : 'Give the operator a PIN of 4 to 6 digits.';
    if (!/^\S+@\S+\.\S+$/.test(request.email)) return 'Enter an e-mail address like name@shop.example.';
    return request.password.length >= 10 ? null : 'A password needs at least 10 characters.';
  }

  private async run(work: () => Promise<void>, problem: ReturnType<typeof signal<string | null>>): Promise<void> {
    this.busy.set(true);
    this.confirmation.set(null);
    problem.set(null);
    try {
      await work();
      this.loads.update((n) => n + 1);
    } catch (error) {
      problem.set(apiErrorSentence(error));
    } finally {
      this.busy.set(false);
    }
  }
}
