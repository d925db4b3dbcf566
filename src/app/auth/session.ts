import { Injectable, computed, inject, signal } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { firstValueFrom } from 'rxjs';
import { hasStatus } from '../core/api-error';

import type { SessionReply, SessionUser, StationSummary } from '../../shared/auth-contract';
import type { Role, StationKind } from '../../shared/names';

export type { Role, SessionUser, StationKind };
/** The station a person is signed in at, or a tablet is paired with. */
export type SessionStation = StationSummary;
/** What the hub answers to /api/auth/me, /login and /pin. */
export type SessionResponse = SessionReply;

/** Who is signed in on this tablet, and the calls that sign in and out. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly currentUser = signal<SessionUser | null>(null);
  private readonly currentStation = signal<SessionStation | null>(null);

  readonly user = this.currentUser.asReadonly();
  readonly station = this.currentStation.asReadonly();
  readonly role = computed(() => this.currentUser()?.role ?? null);
  readonly signedIn = computed(() => this.currentUser() !== null);

  /** Asks the hub who this browser's session belongs to; a 401 or no hub means signed out. */
  async load(): Promise<void> {
    try {
      this.adopt(await firstValueFrom(this.http.get<SessionResponse>('/api/auth/me')));
    } catch (error) {
      // Starting up must not fail: without an answer the person simply signs in.
      this.clear();
      if (!hasStatus(error, 0, 401)) {
        console.warn('Could not load the session', error);
      }
    }
  }

  /** Signs in an owner or lead with e-mail and password. */
  async signIn(email: string, password: string): Promise<SessionResponse> {
    const response = await firstValueFrom(
      this.http.post<SessionResponse>('/api/auth/login', { email, password }),
    );
    this.adopt(response);
    return response;
  }

  /** Signs in an operator at the station this tablet is paired with. */
  async signInWithPin(deviceToken: string, userId: number, pin: string): Promise<SessionResponse> {
    const response = await firstValueFrom(
      this.http.post<SessionResponse>('/api/auth/pin', { deviceToken, pin, userId }),
    );
    this.adopt(response);
    return response;
  }

  /** Ends the session on the hub and here; here even when the hub cannot be reached. */
  async signOut(): Promise<void> {
    try {
      await firstValueFrom(this.http.post<void>('/api/auth/logout', null));
    } finally {
      this.clear();
    }
  }

  /** Forgets the session locally (the hub already ended it). */
  clear(): void {
    this.currentUser.set(null);
    this.currentStation.set(null);
  }

  private adopt(response: SessionResponse): void {
    this.currentUser.set(response.user);
    this.currentStation.set(response.station ?? null);
  }
}
