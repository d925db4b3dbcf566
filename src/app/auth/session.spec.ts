import { TestBed } from '@angular/core/testing';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { Session } from './session';

describe('Session', () => {
  let http: HttpTestingController;
  let session: Session;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    session = TestBed.inject(Session);
  });

  afterEach(() => http.verify());

  it('takes the person and station from /api/auth/me', async () => {
    const loaded = session.load();
    http.expectOne({ method: 'GET', url: '/api/auth/me' }).flush({
      user: { id: 11, name: 'Tam Okafor', email: '', role: 'operator' },
      station: { id: 4, name: 'Press 1', kind: 'press' },
    });
    await loaded;

    expect(session.role()).toBe('operator');
    expect(session.station()?.name).toBe('Press 1');
  });

  it('is signed out when /api/auth/me answers 401, without failing start-up', async () => {
    const loaded = session.load();
    http.expectOne('/api/auth/me').flush({ error: 'Not signed in.' }, { status: 401, statusText: 'Unauthorized' });

    await expect(loaded).resolves.toBeUndefined();
    expect(session.signedIn()).toBe(false);
  });

  it('forgets the person even when the hub cannot be reached on sign-out', async () => {
    const signedIn = session.signIn('lead@example.test', 'pw');
    http.expectOne('/api/auth/login').flush({
      user: { id: 2, name: 'Rosa Quill', email: 'lead@example.test', role: 'lead' },
      station: null,
    });
    await signedIn;

    const signedOut = session.signOut();
    http.expectOne('/api/auth/logout').error(new ProgressEvent('error'));

    await expect(signedOut).rejects.toBeTruthy();
    expect(session.signedIn()).toBe(false);
  });

  describe('offline at a station', () => {
    async function signInOperatorThenRestart(): Promise<Session> {
      const signedIn = session.signInWithPin('a-device-token-of-this-tablet', 7, '2468');
      http.expectOne('/api/auth/pin').flush({
        user: { id: 7, name: 'Tam Okafor', email: null, role: 'operator' },
        station: { id: 4, name: 'Weed 1', kind: 'weed' },
      });
      await signedIn;
      // A reload: a fresh Session over the same storage.
      return TestBed.runInInjectionContext(() => new Session());
    }

    it.each([
      ['no network at all', 0],
      ['the service worker answering 504 for the hub', 504],
    ])('keeps the remembered operator signed in when the hub cannot be reached (%s)', async (_case, status) => {
      const restarted = await signInOperatorThenRestart();
      const loaded = restarted.load();
      const call = http.expectOne('/api/auth/me');
      if (status === 0) call.error(new ProgressEvent('error'));
      else call.flush('', { status, statusText: 'Gateway Timeout' });
      await loaded;

      expect(restarted.role()).toBe('operator');
      expect(restarted.station()?.name).toBe('Weed 1');
      expect(restarted.unconfirmed()).toBe(true);
    });

    it('signs the remembered operator out when the hub answers 401', async () => {
      const restarted = await signInOperatorThenRestart();
      const loaded = restarted.load();
      http.expectOne('/api/auth/me').flush({ error: 'Sign in first.' }, { status: 401, statusText: 'Unauthorized' });
      await loaded;

      expect(restarted.signedIn()).toBe(false);
    });
  });
});
