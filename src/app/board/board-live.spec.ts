import { TestBed } from '@angular/core/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { BoardLive } from './board-live';
import { BOARD_SOCKET } from './board-socket';
import { BOARD_TIMING } from './board-timing';
import { FakeBoardSocket, specBoard } from './board-testing';

describe('BoardLive', () => {
  let socket: FakeBoardSocket;
  let live: BoardLive;
  let http: HttpTestingController;

  function setUp(refreshMs = 60_000): void {
    socket = new FakeBoardSocket();
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        BoardLive,
        { provide: BOARD_SOCKET, useValue: () => socket },
        { provide: BOARD_TIMING, useValue: { refreshMs, cycleMs: 60_000, signInRetryMs: 60_000 } },
      ],
    });
    live = TestBed.inject(BoardLive);
    http = TestBed.inject(HttpTestingController);
  }

  const boardRequests = () => http.match({ method: 'GET', url: '/api/board' });

  /** Starts, answers the first fetch and the fetch the socket's connect asks for. */
  function startLive(): void {
    live.start();
    socket.open();
    http.expectOne('/api/board').flush(specBoard({ piecesDueToday: 1 }));
    http.expectOne('/api/board').flush(specBoard({ piecesDueToday: 2 }));
  }

  afterEach(() => {
    live.stop();
    http.verify();
  });

  it('fetches the board on start and is live once the socket connects', () => {
    setUp();
    live.start();
    expect(live.connection()).toBe('connecting');

    socket.open();
    expect(live.connection()).toBe('live');
    http.expectOne('/api/board').flush(specBoard());
    http.expectOne('/api/board').flush(specBoard({ piecesDueToday: 7 }));

    expect(live.board()?.piecesDueToday).toBe(7);
    expect(live.lastUpdatedAt()).toBeInstanceOf(Date);
  });

  it('coalesces a burst of board updates into one request in flight and one follow-up', () => {
    setUp();
    startLive();

    for (let i = 0; i < 5; i++) socket.fire('board:update', { bagIds: [i], at: '2030-05-14T10:31:00Z' });
    socket.fire('station:seen', { stationId: 12, lastSeenAt: '2030-05-14T10:31:01Z' });
    const first = boardRequests();
    expect(first).toHaveLength(1);

    // More news while the first is on its way: still only one follow-up.
    socket.fire('board:update', { bagIds: [9], at: '2030-05-14T10:31:02Z' });
    first[0]!.flush(specBoard({ piecesDueToday: 3 }));
    const followUp = boardRequests();
    expect(followUp).toHaveLength(1);
    followUp[0]!.flush(specBoard({ piecesDueToday: 4 }));

    expect(boardRequests()).toHaveLength(0);
    expect(live.board()?.piecesDueToday).toBe(4);
  });

  it('shows the connection as lost and keeps the last board when the socket drops', () => {
    setUp();
    startLive();

    socket.drop();

    expect(live.connection()).toBe('lost');
    expect(live.board()?.piecesDueToday).toBe(2);
  });

  it('refetches at once when the socket reconnects by itself', () => {
    setUp();
    startLive();
    socket.drop();

    socket.open();

    expect(live.connection()).toBe('live');
    http.expectOne('/api/board').flush(specBoard({ piecesDueToday: 5 }));
    expect(live.board()?.piecesDueToday).toBe(5);
  });

  it('keeps the last board and says why when a refresh fails', () => {
    setUp();
    startLive();

    socket.fire('board:update', { bagIds: [1], at: '2030-05-14T10:31:00Z' });
    http.expectOne('/api/board').flush({ error: 'The hub is restarting.' }, { status: 503, statusText: 'Service Unavailable' });

    expect(live.board()?.piecesDueToday).toBe(2);
    expect(live.error()).toBe('The hub is restarting.');

    socket.fire('board:update', { bagIds: [1], at: '2030-05-14T10:32:00Z' });
    http.expectOne('/api/board').flush(specBoard({ piecesDueToday: 6 }));
    expect(live.error()).toBeNull();
  });

  it('refetches on its own timer even when no news arrives', async () => {
    setUp(40);
    startLive();

    await new Promise((resolve) => setTimeout(resolve, 70));

    const timed = boardRequests();
    expect(timed.length).toBeGreaterThanOrEqual(1);
    timed.forEach((request) => request.flush(specBoard()));
  });

  it('reports a signed-out session when the hub refuses the socket', () => {
    setUp();
    startLive();
    expect(live.signedOut()).toBe(false);

    socket.refuse();

    expect(live.signedOut()).toBe(true);
    expect(live.connection()).toBe('lost');
  });

  it('reports a signed-out session when the board answers 401', () => {
    setUp();
    live.start();
    http.expectOne('/api/board').flush({ error: 'Sign in first.' }, { status: 401, statusText: 'Unauthorized' });

    expect(live.signedOut()).toBe(true);
  });
});
