import { TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { Location } from '@angular/common';
import { provideLocationMocks } from '@angular/common/testing';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideRouter } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { BROWSER_STORAGE } from '../core/browser-storage';
import { MemoryStorage } from '../core/memory-storage';
import { BOARD_SOCKET } from './board-socket';
import { BOARD_TIMING } from './board-timing';
import { FakeBoardSocket, specBoard } from './board-testing';
import { DISPLAY_TOKEN_KEY, WallDisplay } from './wall-display';

const TOKEN = 'spec-wall-token-0123456789abcdef';
const DISPLAY_REPLY = { user: { id: 3, name: 'Spec wall by the door', email: null, role: 'display' }, station: null };

describe('WallDisplay', () => {
  let http: HttpTestingController;
  let storage: MemoryStorage;
  let socket: FakeBoardSocket;
  let harness: RouterTestingHarness;

  beforeAll(() => {
    jest.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(null);
  });

  beforeEach(async () => {
    storage = new MemoryStorage();
    socket = new FakeBoardSocket();
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([{ path: 'display', component: WallDisplay }]),
        provideLocationMocks(),
        provideHttpClient(),
        provideHttpClientTesting(),
        importProvidersFrom(MatIconTestingModule),
        { provide: BROWSER_STORAGE, useValue: storage },
        { provide: BOARD_SOCKET, useValue: () => socket },
        { provide: BOARD_TIMING, useValue: { refreshMs: 60_000, cycleMs: 250, signInRetryMs: 40 } },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    harness = await RouterTestingHarness.create();
  });

  afterEach(() => {
    TestBed.resetTestingModule();
  });

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve));
    await harness.fixture.whenStable();
  }

  const page = () => harness.routeNativeElement as HTMLElement;
  const message = () => page().querySelector('[data-testid=wall-message]')?.textContent?.replace(/\s+/g, ' ').trim();

  /** Answers the sign-in and the board's first fetches. */
  async function signInAndShow(): Promise<void> {
    const signIn = http.expectOne({ method: 'POST', url: '/api/auth/display' });
    expect(signIn.request.body).toEqual({ deviceToken: TOKEN });
    signIn.flush(DISPLAY_REPLY);
    await settle();
    socket.open();
    http.match('/api/board').forEach((request) => request.flush(specBoard()));
    await settle();
  }

  it('signs in with the token from the link, keeps it, and takes it out of the address bar', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);

    await signInAndShow();

    expect(storage.getItem(DISPLAY_TOKEN_KEY)).toBe(TOKEN);
    expect(TestBed.inject(Location).path(true)).toBe('/display');
    expect(page().querySelector('dw-board-view.wall')).not.toBeNull();
    expect(page().querySelectorAll('a, button')).toHaveLength(0);
  });

  it('tells what to do when the hub refuses the token, and forgets it', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);

    http
      .expectOne('/api/auth/display')
      .flush({ error: 'This display is not known to the hub. Ask a lead to set it up again.' }, { status: 401, statusText: 'Unauthorized' });
    await settle();

    expect(message()).toBe(
      'This display link is not valid any more. Ask the lead for a new display link (Stations, Wall displays) and open it on this screen.',
    );
    expect(storage.getItem(DISPLAY_TOKEN_KEY)).toBeNull();
    expect(page().querySelector('dw-board-view')).toBeNull();
  });

  it('signs in again with the kept token after a restart, with no link in the address', async () => {
    storage.setItem(DISPLAY_TOKEN_KEY, TOKEN);
    await harness.navigateByUrl('/display');

    await signInAndShow();

    expect(page().querySelector('dw-board-view')).not.toBeNull();
  });

  it('asks for a display link when the screen has none', async () => {
    await harness.navigateByUrl('/display');
    await settle();

    expect(message()).toBe(
      'This screen has no display link yet. Ask the lead to add a wall display on the Stations page and open its link on this screen.',
    );
    http.expectNone('/api/auth/display');
  });

  it('tries again by itself when the hub cannot be reached for the sign-in', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);
    http.expectOne('/api/auth/display').error(new ProgressEvent('error'), { status: 0, statusText: 'Unknown Error' });
    await settle();
    expect(message()).toBe('The hub cannot be reached. Check the Wi-Fi and try again. This screen tries again by itself.');

    await new Promise((resolve) => setTimeout(resolve, 60));
    await signInAndShow();

    expect(page().querySelector('dw-board-view')).not.toBeNull();
    expect(storage.getItem(DISPLAY_TOKEN_KEY)).toBe(TOKEN);
  });

  it('says the connection is lost and from when the board on screen is', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);
    await signInAndShow();

    socket.drop();
    await settle();

    const connection = page().querySelector('[data-testid=board-connection]')?.textContent?.trim();
    expect(connection).toMatch(/^Connection lost — showing the board from \d\d:\d\d\./);
    expect(page().querySelector('dw-board-view')).not.toBeNull();
  });

  it('signs in again with its kept token when the hub has forgotten its session', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);
    await signInAndShow();

    socket.fire('board:update', { bagIds: [1], at: '2030-05-14T10:31:00' });
    http.expectOne('/api/board').flush({ error: 'Sign in first.' }, { status: 401, statusText: 'Unauthorized' });
    await settle();

    await signInAndShow();
    expect(page().querySelector('dw-board-view')).not.toBeNull();
  });

  it('shows the display\'s own name in its header, not over the board', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);
    await signInAndShow();

    expect(page().querySelector('header.top .name')?.textContent?.trim()).toBe('Spec wall by the door');
  });

  it('makes its type smaller until a view fits the screen, and larger again when there is room', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);
    await signInAndShow();
    // jsdom lays nothing out: the board's box and its sections (made anew as the views turn) get heights by hand.
    const box = page().querySelector('dw-board-view') as HTMLElement;
    let contentPx = 1400;
    Object.defineProperty(box, 'clientHeight', { configurable: true, get: () => 1000 });
    const layout = jest.spyOn(Element.prototype, 'getBoundingClientRect').mockImplementation(function (this: Element) {
      return { top: 0, bottom: this.tagName === 'SECTION' ? contentPx : 0 } as DOMRect;
    });
    const scaleNow = () => Number(page().style.getPropertyValue('--dw-wall-scale'));

    window.dispatchEvent(new Event('resize'));
    for (let waited = 0; scaleNow() > 0.7 && waited < 1000; waited += 5) await settle();
    expect(scaleNow()).toBe(0.7);

    contentPx = 500;
    window.dispatchEvent(new Event('resize'));
    for (let waited = 0; scaleNow() < 1 && waited < 1000; waited += 5) await settle();
    expect(scaleNow()).toBe(1);
    layout.mockRestore();
  });

  it('turns between the floor now and the shift so far on a screen too small for both', async () => {
    await harness.navigateByUrl(`/display#token=${TOKEN}`);
    await signInAndShow();
    const view = () => page().querySelector('[data-testid=wall-view]')?.textContent?.trim();
    expect(view()).toBe('The floor now');
    expect(page().querySelector('dw-stage-columns')).not.toBeNull();

    for (let waited = 0; view() === 'The floor now' && waited < 3000; waited += 5) {
      await new Promise((resolve) => setTimeout(resolve, 5));
      await settle();
    }

    expect(view()).toBe('The shift so far');
    expect(page().querySelector('dw-stage-columns')).toBeNull();
    expect(page().querySelector('dw-spoil-pareto-chart')).not.toBeNull();
  });
});
