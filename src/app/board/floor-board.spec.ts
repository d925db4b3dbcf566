import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { BOARD_SOCKET } from './board-socket';
import { BOARD_TIMING } from './board-timing';
import { FakeBoardSocket, specBoard } from './board-testing';
import { FloorBoard } from './floor-board';
import { screenTestProviders } from '../core/screen-testing';

describe('FloorBoard', () => {
  let fixture: ComponentFixture<FloorBoard>;
  let http: HttpTestingController;
  let socket: FakeBoardSocket;

  beforeAll(() => {
    jest.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(null);
  });

  beforeEach(async () => {
    socket = new FakeBoardSocket();
    TestBed.configureTestingModule({
      imports: [FloorBoard],
      providers: [
        ...screenTestProviders(),
        { provide: BOARD_SOCKET, useValue: () => socket },
        { provide: BOARD_TIMING, useValue: { refreshMs: 60_000, cycleMs: 60_000, signInRetryMs: 60_000 } },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(FloorBoard);
    await fixture.whenStable();
  });

  const page = () => fixture.nativeElement as HTMLElement;
  const connection = () => page().querySelector('[data-testid=board-connection]')?.textContent?.trim();

  it('shows the board live after the first fetch, in the light theme', async () => {
    expect(connection()).toBe('Connecting to the hub…');
    socket.open();
    http.match('/api/board').forEach((request) => request.flush(specBoard()));
    await fixture.whenStable();

    expect(connection()).toMatch(/^Live · updated \d\d:\d\d$/);
    expect(page().querySelector('dw-board-view')).not.toBeNull();
    expect(page().querySelector('dw-board-view.wall')).toBeNull();
    expect(page().querySelector('[data-testid=board-shift]')?.textContent?.trim()).toBe('Shift 07:00–15:30');
  });

  it('moves a number on the board when the hub announces an update, with no reload', async () => {
    socket.open();
    http.match('/api/board').forEach((request) => request.flush(specBoard()));
    await fixture.whenStable();
    const pressPieces = () =>
      page().querySelector('[data-testid=board-station][data-station-kind=press] [data-testid=station-shift-pieces]')?.textContent?.trim();
    expect(pressPieces()).toBe('153');

    socket.fire('board:update', { bagIds: [77], at: '2030-05-14T10:31:00' });
    const moved = specBoard();
    moved.stations[1] = { ...moved.stations[1]!, shiftPieces: 165 };
    http.expectOne('/api/board').flush(moved);
    await fixture.whenStable();

    expect(pressPieces()).toBe('165');
  });

  it('keeps the last board and says so when a refresh fails', async () => {
    socket.open();
    http.match('/api/board').forEach((request) => request.flush(specBoard()));
    await fixture.whenStable();

    socket.fire('board:update', { bagIds: [1], at: '2030-05-14T10:31:00' });
    http.expectOne('/api/board').flush(null, { status: 502, statusText: 'Bad Gateway' });
    await fixture.whenStable();

    expect(page().querySelector('[data-testid=board-error]')?.textContent?.trim()).toBe(
      'The hub had a problem. Try again in a moment; tell your lead if it keeps happening. The board below is the last one the hub sent.',
    );
    expect(page().querySelector('dw-board-view')).not.toBeNull();
  });
});
