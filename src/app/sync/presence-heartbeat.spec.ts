import { keepPresence, PRESENCE_PING_MS, type PresenceSocket } from './presence-heartbeat';

/** A socket stand-in that records what is emitted and fires connect and disconnect on demand. */
class PingRecorder {
  connected = false;
  readonly emitted: string[] = [];
  private readonly handlers = new Map<string, (() => void)[]>();

  on(event: string, handler: () => void): this {
    this.handlers.set(event, [...(this.handlers.get(event) ?? []), handler]);
    return this;
  }

  emit(event: string): this {
    this.emitted.push(event);
    return this;
  }

  fire(event: 'connect' | 'disconnect'): void {
    this.connected = event === 'connect';
    for (const handler of this.handlers.get(event) ?? []) handler();
  }
}

describe('keepPresence', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  const install = () => {
    const socket = new PingRecorder();
    keepPresence(socket as unknown as PresenceSocket);
    return socket;
  };

  it('pings the hub as soon as the socket connects, then every 20 seconds while connected', () => {
    const socket = install();
    expect(socket.emitted).toEqual([]);

    socket.fire('connect');
    expect(socket.emitted).toEqual(['presence:ping']);

    jest.advanceTimersByTime(PRESENCE_PING_MS - 1);
    expect(socket.emitted).toHaveLength(1);
    jest.advanceTimersByTime(1);
    expect(socket.emitted).toHaveLength(2);
    jest.advanceTimersByTime(2 * PRESENCE_PING_MS);
    expect(socket.emitted).toEqual(['presence:ping', 'presence:ping', 'presence:ping', 'presence:ping']);
    expect(PRESENCE_PING_MS).toBe(20_000);
  });

  it('stops pinging when the socket disconnects and starts again, once, on reconnect', () => {
    const socket = install();
    socket.fire('connect');
    socket.fire('disconnect');
    jest.advanceTimersByTime(5 * PRESENCE_PING_MS);
    expect(socket.emitted).toHaveLength(1);

    socket.fire('connect');
    socket.fire('connect');
    jest.advanceTimersByTime(PRESENCE_PING_MS);
    // Two connects ping twice at once but keep one timer, so one more ping after 20 s, not two.
    expect(socket.emitted).toHaveLength(4);
  });

  it('starts at once on a socket that is already connected', () => {
    const socket = new PingRecorder();
    socket.connected = true;
    keepPresence(socket as unknown as PresenceSocket);
    expect(socket.emitted).toEqual(['presence:ping']);
  });
});
