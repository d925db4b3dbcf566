import type { BoardReply } from '../../shared/board-contract';

/** A made-up board for specs: numbers chosen to be easy to spot, not taken from any shop. */
export function specBoard(overrides: Partial<BoardReply> = {}): BoardReply {
  return {
    generatedAt: '2030-05-14T10:30:00',
    shift: { startAt: '2030-05-14T07:00:00', endAt: '2030-05-14T15:30:00' },
    stations: [
      {
        id: 11, name: 'Spec Cutter', kind: 'cut', piecesPerHour: 31, shiftPieces: 97, shiftPiecesPerHour: 27.7,
        online: true, lastEventAt: '2030-05-14T10:21:00', lastSyncAt: '2030-05-14T10:21:00', lastSeenAt: '2030-05-14T10:29:40',
      },
      {
        id: 12, name: 'Spec Press', kind: 'press', piecesPerHour: 44, shiftPieces: 153, shiftPiecesPerHour: 43.7,
        online: false, lastEventAt: '2030-05-14T09:58:00', lastSyncAt: '2030-05-14T09:59:00', lastSeenAt: '2030-05-14T10:02:00',
      },
    ],
    stages: {
      queued: { bags: 4, pieces: 120 },
      cut: { bags: 2, pieces: 36 },
      weeded: { bags: 3, pieces: 58 },
      pressed: { bags: 1, pieces: 17 },
      packed: { bags: 5, pieces: 140 },
    },
    orders: [
      {
        id: 901, code: 'SPEC-1', customerName: 'Quillfield Test Harriers', dueAt: '2030-05-14T14:00:00', etaAt: '2030-05-14T16:10:00',
        atRisk: true, remainingPieces: 88, bottleneck: 'press', rateSource: 'observed',
      },
      {
        id: 902, code: 'SPEC-2', customerName: 'Nobody Real Bowls Club', dueAt: '2030-05-15T12:00:00', etaAt: '2030-05-14T13:05:00',
        atRisk: false, remainingPieces: 24, bottleneck: 'weed', rateSource: 'standard',
      },
    ],
    firstPassYield: 0.962,
    spoilRate: 0.024,
    spoilReasons: [
      { reason: 'Lifted edge', pieces: 6, share: 0.6, cumulativeShare: 0.6 },
      { reason: 'Crooked placement', pieces: 3, share: 0.3, cumulativeShare: 0.9 },
      { reason: 'Scorch', pieces: 1, share: 0.1, cumulativeShare: 1 },
    ],
    taktS: 92,
    piecesDueToday: 240,
    lowRolls: [{ id: 31, label: 'R-SPEC-7', film: 'Matte white', rackSlot: 'B2', remainingIn: 90, reorderIn: 180 }],
    flags: [
      {
        kind: 'over_count', bagId: 77, bagCode: 'SPEC-1-C', orderCode: 'SPEC-1',
        message: 'Pressed 26 of 24 pieces.', at: '2030-05-14T10:12:00',
      },
    ],
    hourly: {
      hours: ['2030-05-14T07:00:00', '2030-05-14T08:00:00', '2030-05-14T09:00:00', '2030-05-14T10:00:00'],
      stations: [
        { id: 11, name: 'Spec Cutter', pieces: [20, 28, 30, 19] },
        { id: 12, name: 'Spec Press', pieces: [35, 41, 47, 30] },
      ],
    },
    ...overrides,
  };
}

/** A socket.io client stand-in for the board: the spec fires the hub's events by hand. */
export class FakeBoardSocket {
  connected = false;
  /** False after the hub refused the session; socket.io then stops retrying by itself. */
  active = false;
  connects = 0;
  private readonly handlers = new Map<string, ((...args: unknown[]) => void)[]>();

  on(event: string, handler: (...args: unknown[]) => void): this {
    this.handlers.set(event, [...(this.handlers.get(event) ?? []), handler]);
    return this;
  }

  connect(): this {
    this.connects += 1;
    this.active = true;
    return this;
  }

  disconnect(): this {
    this.active = false;
    if (this.connected) {
      this.connected = false;
      this.fire('disconnect', 'io client disconnect');
    }
    return this;
  }

  /** The hub answered the handshake. */
  open(): void {
    this.connected = true;
    this.fire('connect');
  }

  /** The network went away; socket.io keeps trying. */
  drop(): void {
    this.connected = false;
    this.fire('disconnect', 'transport close');
  }

  /** The hub refused the handshake ("Sign in first."): socket.io stops trying. */
  refuse(): void {
    this.active = false;
    this.fire('connect_error', new Error('Sign in first.'));
  }

  fire(event: string, ...args: unknown[]): void {
    for (const handler of this.handlers.get(event) ?? []) handler(...args);
  }
}
