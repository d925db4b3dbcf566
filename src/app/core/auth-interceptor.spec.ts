import { TestBed } from '@angular/core/testing';
import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { Router, provideRouter } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { Session } from '../auth/session';
import { authInterceptor } from './auth-interceptor';

describe('authInterceptor', () => {
  let http: HttpTestingController;
  let client: HttpClient;
  let session: Session;
  let navigate: jest.SpyInstance;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    http = TestBed.inject(HttpTestingController);
    client = TestBed.inject(HttpClient);
    session = TestBed.inject(Session);
    navigate = jest.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);

    const signedIn = session.signIn('lead@example.test', 'pw');
    http.expectOne('/api/auth/login').flush({
      user: { id: 1, name: 'Rosa Quill', email: 'lead@example.test', role: 'lead' },
      station: null,
    });
    await signedIn;
  });

  afterEach(() => http.verify());

  it('signs out and goes to sign-in when a data call answers 401', async () => {
    const call = firstValueFrom(client.get('/api/stations'));
    http.expectOne('/api/stations').flush({ error: 'Your session has ended.' }, { status: 401, statusText: 'Unauthorized' });

    await expect(call).rejects.toMatchObject({ status: 401 });
    expect(session.signedIn()).toBe(false);
    expect(navigate).toHaveBeenCalledWith('/sign-in');
  });

  it('leaves a 401 from /api/auth/login to the sign-in screen', async () => {
    const call = firstValueFrom(client.post('/api/auth/login', { email: 'x@example.test', password: 'no' }));
    http.expectOne('/api/auth/login').flush({ error: 'Wrong password.' }, { status: 401, statusText: 'Unauthorized' });

    await expect(call).rejects.toMatchObject({ status: 401 });
    expect(session.signedIn()).toBe(true);
    expect(navigate).not.toHaveBeenCalled();
  });

  it('leaves a wall display on its page when its session ends, so the page can sign in again with its token', async () => {
    const displayIn = session.signInAsDisplay('spec-display-token-000000000000');
    http.expectOne('/api/auth/display').flush({ user: { id: 4, name: 'Spec wall', email: null, role: 'display' }, station: null });
    await displayIn;

    const call = firstValueFrom(client.get('/api/board'));
    http.expectOne('/api/board').flush({ error: 'Sign in first.' }, { status: 401, statusText: 'Unauthorized' });

    await expect(call).rejects.toMatchObject({ status: 401 });
    expect(session.signedIn()).toBe(false);
    expect(navigate).not.toHaveBeenCalled();
  });

  it('does not sign out on other failures of data calls', async () => {
    const call = firstValueFrom(client.get('/api/stations'));
    http.expectOne('/api/stations').flush({ error: 'Only a lead can see this.' }, { status: 403, statusText: 'Forbidden' });

    await expect(call).rejects.toMatchObject({ status: 403 });
    expect(session.signedIn()).toBe(true);
    expect(navigate).not.toHaveBeenCalled();
  });
});
