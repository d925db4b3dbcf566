import { Router, type Request } from 'express';
import type { Env } from '../config/env';
import type { Db } from '../db/tables';
import { unauthorized } from '../http/http-error';
import { validate } from '../http/validate';
import { AuthRepository } from './auth-repository';
import { deviceBody, loginBody, pinBody } from './auth-schemas';
import { AuthService } from './auth-service';
import { publicRoute, signedIn } from './guards';
import { resolvePrincipal, sessionReply, type SessionPrincipal } from './principal';
import { deviceLimiter, loginLimiter, pinLimiter } from './rate-limits';

/** Starts a fresh session (new id, so a planted cookie cannot be reused) for the principal. */
async function beginSession(req: Request, principal: SessionPrincipal): Promise<void> {
  await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
  req.session.principal = principal;
  await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
}

/** /api/auth: sign in by password, PIN or display token; who am I; sign out. */
export function authRouter(db: Db, env: Env): Router {
  const router = Router();
  const service = new AuthService(new AuthRepository(db));
  const attempts = env.LOGIN_ATTEMPTS_PER_15_MIN;

  const answerWith = async (req: Request, principal: SessionPrincipal) => {
    await beginSession(req, principal);
    const resolved = await resolvePrincipal(db, principal);
    if (!resolved) throw unauthorized();
    return sessionReply(resolved);
  };

  router.post('/login', publicRoute('signing in'), loginLimiter(attempts), async (req, res) => {
    const { email, password } = validate(loginBody, req.body, 'sign-in');
    res.json(await answerWith(req, await service.checkPassword(email, password)));
  });

  router.post('/device', publicRoute('a paired tablet shows its station before anyone signs in'), deviceLimiter(attempts * 3), async (req, res) => {
    const { deviceToken } = validate(deviceBody, req.body, 'device check');
    res.json(await service.describeDevice(deviceToken));
  });

  router.post('/pin', publicRoute('signing in on a station tablet'), pinLimiter(attempts), async (req, res) => {
    const { deviceToken, pin, userId } = validate(pinBody, req.body, 'PIN sign-in');
    res.json(await answerWith(req, await service.checkPin(deviceToken, pin, userId)));
  });

  router.post('/display', publicRoute('a wall display signs in with its token'), deviceLimiter(attempts * 3), async (req, res) => {
    const { deviceToken } = validate(deviceBody, req.body, 'display sign-in');
    res.json(await answerWith(req, await service.checkDisplay(deviceToken)));
  });

  router.get('/me', signedIn(), (req, res) => {
    res.json(sessionReply(req.principal!));
  });

  router.post('/logout', publicRoute('signing out works even when the session has already ended'), async (req, res) => {
    await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
    res.clearCookie('dwell.sid', { path: '/' });
    res.status(204).end();
  });

  return router;
}
