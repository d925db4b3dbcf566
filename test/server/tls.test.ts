import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import https from 'node:https';
import os from 'node:os';
import path from 'node:path';
import { readEnv } from '../../server/config/env';
import { startHub } from '../../server/hub';

// A self-signed certificate made with Debian's openssl, as a shop would for its own network.
function selfSignedCertificate(): { cert: string; key: string } {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'dwell-tls-'));
  const cert = path.join(dir, 'hub.crt');
  const key = path.join(dir, 'hub.key');
  execFileSync('openssl', ['req', '-x509', '-newkey', 'rsa:2048', '-nodes', '-keyout', key, '-out', cert, '-days', '1', '-subj', '/CN=127.0.0.1'], { stdio: 'ignore' });
  return { cert, key };
}

function getJson(url: string): Promise<{ status: number; body: unknown }> {
  return new Promise((resolve, reject) => {
    https
      .get(url, { rejectUnauthorized: false }, (res) => {
        let text = '';
        res.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body: JSON.parse(text) }));
      })
      .on('error', reject);
  });
}

describe('serving HTTPS for tablets on the shop network', () => {
  it('answers over HTTPS when a certificate and key are given', async () => {
    const { cert, key } = selfSignedCertificate();
    const env = readEnv({ ...process.env, NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', LOG_LEVEL: 'silent', TLS_CERT_FILE: cert, TLS_KEY_FILE: key });
    const hub = await startHub(env, process.env['DATABASE_URL']!);
    try {
      expect(hub.url).toMatch(/^https:\/\//);
      await expect(getJson(`${hub.url}/api/health`)).resolves.toEqual({ status: 200, body: { ok: true } });
    } finally {
      await hub.close();
    }
  });

  it('refuses to start with a certificate but no key, saying what to set', async () => {
    const env = readEnv({ ...process.env, NODE_ENV: 'test', PORT: '0', LOG_LEVEL: 'silent', TLS_CERT_FILE: '/tmp/only-a-cert.pem' });
    await expect(startHub(env, process.env['DATABASE_URL']!)).rejects.toThrow(/Set both TLS_CERT_FILE and TLS_KEY_FILE/);
  });
});
