import { TestBed } from '@angular/core/testing';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { ActivatedRouteSnapshot, Router, RouterStateSnapshot, UrlTree, provideRouter } from '@angular/router';
import { roleGuard, signedInGuard } from './auth-guard';
import { Role, Session } from './session';

describe('auth guards', () => {
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
  });

  async function signInAs(role: Role): Promise<void> {
    const done = TestBed.inject(Session).signIn('someone@example.test', 'pw');
    http.expectOne('/api/auth/login').flush({
      user: { id: 3, name: 'Ivo Marsh', email: 'someone@example.test', role },
      station: null,
    });
    await done;
  }

  function runRoleGuard(roles: Role[]): boolean | UrlTree {
    const route = { data: { roles } } as unknown as ActivatedRouteSnapshot;
    return TestBed.runInInjectionContext(() => roleGuard(route, {} as RouterStateSnapshot)) as boolean | UrlTree;
  }

  function serialize(result: boolean | UrlTree): string | boolean {
    return result instanceof UrlTree ? TestBed.inject(Router).serializeUrl(result) : result;
  }

  it('refuses an operator on a lead route and sends them home', async () => {
    await signInAs('operator');

    expect(serialize(runRoleGuard(['owner', 'lead']))).toBe('/');
  });

  it('lets a lead onto a lead route', async () => {
    await signInAs('lead');

    expect(runRoleGuard(['owner', 'lead'])).toBe(true);
  });

  it('sends a signed-out visitor to sign-in', () => {
    const result = TestBed.runInInjectionContext(() =>
      signedInGuard({} as ActivatedRouteSnapshot, {} as RouterStateSnapshot),
    ) as boolean | UrlTree;

    expect(serialize(result)).toBe('/sign-in');
  });
});
