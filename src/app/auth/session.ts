import { Injectable, computed, inject, signal } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { firstValueFrom } from 'rxjs';
import { hasStatus } from '../core/api-error';
import { BROWSER_STORAGE } from '../core/browser-storage';

import type { SessionReply, SessionUser, StationSummary } from '../../shared/auth-contract';
import type { Role, StationKind } from '../../shared/names';

export type { Role, SessionUser, StationKind };
/** The station a person is signed in at, or a tablet is paired with. */
export type SessionStation = StationSummary;
/** What the hub answers to /api/auth/me, /login and /pin. */
export type SessionResponse = SessionReply;

/** Storage key of the last session the hub confirmed, so an operator keeps working when the hub is out of reach. */
export const LAST_SESSION_KEY = 'dwell.lastSession';

/** Who is signed in on this tablet, and the calls that sign in and out. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly currentUser = signal<SessionUser | null>(null);
  private readonly currentStation = signal<SessionStation | null>(null);
  private readonly storage = inject(BROWSER_STORAGE);
  private readonly fromMemory = signal(false);

  readonly user = this.currentUser.asReadonly();
  readonly station = this.currentStation.asReadonly();
  readonly role = computed(() => this.currentUser()?.role ?? null);
  readonly signedIn = computed(() => this.currentUser() !== null);
  /** True while an operator works from the remembered session because the hub could not be asked. */
  readonly unconfirmed = this.fromMemory.asReadonly();

  /** Asks the hub who this browser's session belongs to; a 401 or no hub means signed out. */
  async load(): Promise<void> {
    try {
      this.adopt(await firstValueFrom(this.http.get<SessionResponse>('/api/auth/me')));
    } catch (error) {
      // An operator at a station keeps working offline; the hub is asked again when it answers.
      // No network shows as status 0, or as 502-504 from the service worker or a proxy in front of the hub.
      const remembered = hasStatus(error, 0, 502, 503, 504) ? this.remembered() : null;
      if (remembered) {
        this.currentUser.set(remembered.user);
        this.currentStation.set(remembered.station ?? null);
        this.fromMemory.set(true);
        return;
      }
      // Starting up must not fail: without an answer the person simply signs in.
      this.clear();
      if (!hasStatus(error, 0, 401, 502, 503, 504)) {
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

  /** Signs in a wall display with the device token from its display link. */
  async signInAsDisplay(deviceToken: string): Promise<SessionResponse> {
    const response = await firstValueFrom(this.http.post<SessionResponse>('/api/auth/display', { deviceToken }));
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
    this.fromMemory.set(false);
    this.storage.removeItem(LAST_SESSION_KEY);
  }

  private adopt(response: SessionResponse): void {
    this.currentUser.set(response.user);
    this.currentStation.set(response.station ?? null);
    this.fromMemory.set(false);
    this.storage.setItem(LAST_SESSION_KEY, JSON.stringify(response));
  }

  /** The last confirmed session, only for an operator at a station (others sign in again). */
  private remembered(): SessionResponse | null {
    try {
      const reply = JSON.parse(this.storage.getItem(LAST_SESSION_KEY) ?? 'null') as SessionResponse | null;
      return reply?.user?.role === 'operator' && reply.station ? reply : null;
    } catch {
      return null;
    }
  }
}
