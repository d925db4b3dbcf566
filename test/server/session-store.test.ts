import { readEnv } from '../../server/config/env';
import { startHub } from '../../server/hub';

describe('the hub\'s session store', () => {
  it('lets the hub close at once after starting, without an unhandled rejection ending the process', async () => {
    const rejections: unknown[] = [];
    const listener = (reason: unknown) => rejections.push(reason);
    process.on('unhandledRejection', listener);
    try {
      const env = readEnv({ ...process.env, NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', LOG_LEVEL: 'silent', SESSION_SECRET: 'x'.repeat(40) });
      const hub = await startHub(env, process.env['DATABASE_URL']!);
      await hub.close();
      // Give any rejected start-up check a turn of the event loop to surface.
      await new Promise((resolve) => setTimeout(resolve, 200));
      expect(rejections).toEqual([]);
    } finally {
      process.off('unhandledRejection', listener);
    }
  });
});
