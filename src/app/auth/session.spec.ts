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
});
