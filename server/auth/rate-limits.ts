import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';

const WINDOW_MS = 15 * 60 * 1000;

function limiter(limit: number, message: string, keyOf: (req: Request) => string) {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit,
    // Only failed attempts count: a shop where everyone signs in at 7:00 from one Wi-Fi is not an attack.
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${keyOf(req)}`,
    handler: (_req, res) => {
      res.status(429).json({ error: message });
    },
  });
}

const field = (req: Request, name: string) => {
  const body: unknown = req.body;
  const value = body && typeof body === 'object' ? (body as Record<string, unknown>)[name] : undefined;
  return typeof value === 'string' ? value.toLowerCase().slice(0, 300) : '';
};

/** Failed e-mail sign-ins, per address and network address. */
export const loginLimiter = (limit: number) =>
  limiter(limit, 'Too many failed sign-ins for this e-mail. Wait 15 minutes, or ask the owner to reset the password.', (req) =>
    field(req, 'email'),
  );

/** Failed PIN entries, per tablet and network address. */
export const pinLimiter = (limit: number) =>
  limiter(limit, 'Too many wrong PINs on this tablet. Wait 15 minutes, or ask a lead to reset your PIN.', (req) =>
    field(req, 'deviceToken'),
  );

/** Failed device-token look-ups (a tablet or display presenting its token). */
export const deviceLimiter = (limit: number) =>
  limiter(limit, 'Too many tries with a device token that is not known. Wait 15 minutes, then ask a lead to pair this device again.', () => 'device');
