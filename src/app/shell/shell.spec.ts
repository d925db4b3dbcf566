import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { Router } from '@angular/router';
import { Role, Session } from '../auth/session';
import { Shell } from './shell';
import { navEntriesFor } from './nav-entries';
import { screenTestProviders } from '../core/screen-testing';

describe('Shell', () => {
  let fixture: ComponentFixture<Shell>;
  let http: HttpTestingController;
  let navigate: jest.SpyInstance;

  async function renderSignedInAs(role: Role): Promise<void> {
    TestBed.configureTestingModule({
      imports: [Shell],
      providers: [
        ...screenTestProviders(),
      ],
    });
    http = TestBed.inject(HttpTestingController);
    navigate = jest.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    const signedIn = TestBed.inject(Session).signIn('x@example.test', 'pw');
    http.expectOne('/api/auth/login').flush({
      user: { id: 5, name: 'Noor Bellweather', email: 'x@example.test', role },
      station: null,
    });
    await signedIn;
    fixture = TestBed.createComponent(Shell);
    await fixture.whenStable();
  }

  function navLabels(): string[] {
    const links = (fixture.nativeElement as HTMLElement).querySelectorAll('[data-testid=nav-entry]');
    return Array.from(links, (link) => link.textContent?.trim() ?? '');
  }

  afterEach(() => http.verify());

  it('offers a lead the office screens and not the station home', async () => {
    await renderSignedInAs('lead');

    expect(navLabels()).toEqual(['Floor board', 'Orders', 'Stations', 'Gang planner', 'Roll rack', 'Recipe book', 'People', 'Reports', 'Mail outbox']);
  });

  it('offers an owner the office screens, People and Shop settings included', async () => {
    await renderSignedInAs('owner');

    expect(navLabels()).toEqual(['Floor board', 'Orders', 'Stations', 'Gang planner', 'Roll rack', 'Recipe book', 'People', 'Shop settings', 'Reports', 'Mail outbox']);
  });

  it('offers the Cut station, Gang planner and Roll rack to an operator only at a cut station', () => {
    expect(navEntriesFor('operator', 'cut').map((entry) => entry.label)).toEqual(expect.arrayContaining(['Cut station', 'Gang planner', 'Roll rack']));
    expect(navEntriesFor('operator', 'weed').map((entry) => entry.label)).not.toEqual(expect.arrayContaining(['Cut station']));
    expect(navEntriesFor('operator', 'weed').map((entry) => entry.label)).not.toContain('Roll rack');
  });

  it('offers the Press card only to an operator at a press station', () => {
    expect(navEntriesFor('operator', 'press').map((entry) => entry.label)).toContain('Press card');
    expect(navEntriesFor('operator', 'weed').map((entry) => entry.label)).not.toContain('Press card');
    expect(navEntriesFor('lead', 'press').map((entry) => entry.label)).not.toContain('Press card');
  });

  it('offers an operator away from any station no screens', async () => {
    await renderSignedInAs('operator');

    expect(navLabels()).toEqual([]);
  });

  it('offers a press operator just the press card and the spoil report, so the bar stays one row', () => {
    expect(navEntriesFor('operator', 'press').map((entry) => entry.label)).toEqual(['Spoil report', 'Press card']);
    expect(navEntriesFor('operator', 'pack').map((entry) => entry.label)).toEqual(['Pack check', 'Spoil report']);
  });

  it('shows who is signed in and their role', async () => {
    await renderSignedInAs('lead');

    const person = (fixture.nativeElement as HTMLElement).querySelector('[data-testid=signed-in-person]');
    expect(person?.textContent).toContain('Noor Bellweather');
    expect(person?.textContent).toContain('Lead');
  });

  it('signs out on the hub and returns an operator to the PIN pad', async () => {
    await renderSignedInAs('operator');

    const signOut = Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('button')).find((b) =>
      b.textContent?.includes('Sign out'),
    )!;
    signOut.click();
    http.expectOne({ method: 'POST', url: '/api/auth/logout' }).flush(null, { status: 204, statusText: 'No Content' });
    await new Promise((resolve) => setTimeout(resolve));

    expect(TestBed.inject(Session).signedIn()).toBe(false);
    expect(navigate).toHaveBeenCalledWith('/station');
  });
});
